/**
 * The side panel's own labels, in English. The extension sends them through the editor's
 * localization API (`vscode.l10n.t`, keyed by the English text, translations in l10n/) before the
 * first render; the webview starts from these until then. No editor API here.
 */
export const PANEL_TEXT = {
  note: 'Extractive summary: sentences quoted from the document. They can lose the context around them; check the source before relying on one.',
  summaryHeading: 'Summary',
  summaryList: 'Summary sentences. Arrow keys move between them, Enter shows one in the editor.',
  emptyTitle: 'No summary yet',
  emptyBody: 'Open a Markdown, reStructuredText or text document, then choose Summarize.',
  summarize: 'Summarize',
  summarizeTitle: 'Summarize the active document',
  copy: 'Copy',
  copyTitle: 'Copy the summary as Markdown',
  insert: 'Insert…',
  insertTitle: 'Insert the summary into the document, at the cursor or under a heading you pick (one undoable edit)',
  live: 'Live',
  liveTitle: 'Follow edits and the active editor',
  liveOn: 'Live ●',
  liveOff: 'Live',
  settings: 'Length and method',
  length: 'Length',
  lengthHelp: 'For example 15%, 120w or 6s',
  method: 'Method',
  balance: 'Spread over the sections',
  details: 'Figures and sections',
  sharesHeading: 'Where the summary comes from',
  legendDocument: 'share of the document',
  legendSummary: 'share of the summary',
  why: 'Why this sentence',
  numbers: 'Show the numbers',
  newPick: 'new',
  newPickLabel: 'New since the last summary',
  addedByRepair: 'added by a repair',
  mayNotStandAlone: 'May not stand alone:',
  edited: 'edited:',
  checkHeading: 'Abstract check',
  checkStale: 'The document changed since this check; run it again to update the lines.',
  checkRun: 'Check abstract…',
  checkRunTitle: 'Compare the document’s abstract (or the selected text) with its body',
  dismiss: 'Dismiss',
  stale: 'The document changed since this summary.',
  busy: 'Working…',
} as const;

export type PanelTextKey = keyof typeof PANEL_TEXT;
export type PanelText = { readonly [K in PanelTextKey]: string };
