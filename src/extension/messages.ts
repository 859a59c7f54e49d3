/**
 * Messages between the extension and its side panel, as discriminated unions. Anything arriving
 * from the webview is untrusted until `parsePanelMessage` (from-panel.ts) accepts it; the webview
 * accepts only what `isToPanel` (to-panel.ts) checks field by field. No editor API here: the
 * webview bundle imports these types too. Every user-visible string arrives already worded and
 * localized by the extension (panel-text.ts holds the panel's own labels).
 */
import type { RankerName } from '../core/index';
import type { EngineStage } from './engine-protocol';
import type { PanelText } from './panel-text';

export { parsePanelMessage, PANEL_COMMANDS } from './from-panel';
export type { PanelCommand, ParseResult } from './from-panel';
export { isToPanel } from './to-panel';

// ---------- what the panel shows (extension → webview) ----------

export interface PanelRepair {
  /** Index into the warning's repairs. */
  readonly index: number;
  readonly label: string;
}

export interface PanelWarning {
  /** Index into the summary's warnings (what `applyRepair` sends back). */
  readonly index: number;
  readonly message: string;
  readonly repairs: readonly PanelRepair[];
}

export interface PanelSentence {
  /** Index into the document's sentences (what `reveal` and `applyRepair` send back). */
  readonly sentence: number;
  readonly text: string;
  /** 1 = best; 0 = added by a repair, not ranked. */
  readonly rank: number;
  /** Headings below the group's heading, when the sentence sits in a sub-section. */
  readonly subPath: readonly string[];
  /** Why the shown text differs from the source, when it does. */
  readonly edited: string | null;
  readonly warnings: readonly PanelWarning[];
  /** Picked now but not in the previous summary of the same document (after an edit). */
  readonly isNew: boolean;
  /** Why it was picked, in words. */
  readonly why: string;
  /** The numbers behind `why`, one line each (shown behind a toggle). */
  readonly whyNumbers: readonly string[];
}

export interface PanelGroup {
  readonly heading: string;
  /** "40% of the summary", worded. */
  readonly share: string;
  readonly sentences: readonly PanelSentence[];
}

export interface PanelShare {
  readonly heading: string;
  readonly documentShare: number;
  readonly summaryShare: number;
  /** "12% of the document, 20% of the summary", worded. */
  readonly label: string;
}

/** The summary's figures, worded and formatted for the display language. */
export interface PanelFigures {
  /** "151 of 2,444 words" */
  readonly words: string;
  /** "reads in about 1 min (document about 40 min)" */
  readonly reading: string;
  /** "covers 5 of 7 sections" */
  readonly sections: string;
  /** "6 of 72 sentences" */
  readonly sentences: string;
}

export interface PanelSummary {
  /** Identifies this summary; messages about a replaced summary are ignored. */
  readonly id: number;
  readonly documentName: string;
  readonly scope: 'document' | 'selection';
  /** The method, described by what it does. */
  readonly method: string;
  readonly language: string;
  readonly groups: readonly PanelGroup[];
  readonly shares: readonly PanelShare[];
  readonly figures: PanelFigures;
  readonly notices: readonly string[];
  /** How many picks are new since the previous summary of the same document (0 for a first one). */
  readonly changed: number;
  /** Sections with content the engine left out, and why (one line each). */
  readonly leftOut: readonly string[];
  /** The document's key phrases, best first (a few). */
  readonly keyPhrases: readonly string[];
  /** The focus this summary was ranked towards; empty for a general summary. */
  readonly focus: string;
}

/** A place the panel can ask the extension to show: an index into the check's own list of places. */
export interface PanelLink {
  readonly label: string;
  readonly target: number;
}

export interface PanelCheckItem {
  readonly severity: 'ok' | 'warning' | 'information';
  readonly text: string;
  /** The item's own place in the document (the abstract sentence, the section heading), or null. */
  readonly target: number | null;
  /** Further places: the body lines that support a claim. */
  readonly links: readonly PanelLink[];
}

export interface PanelAbstractCheck {
  readonly id: number;
  readonly documentName: string;
  /** The document changed since the check; its places may have moved. */
  readonly stale: boolean;
  readonly headline: string;
  readonly items: readonly PanelCheckItem[];
}

/** A sentence of a digest: its text and line, clickable; `alsoIn` are its near-duplicates in other documents. */
export interface PanelDigestLine {
  readonly text: string;
  /** "line 12", worded. */
  readonly line: string;
  /** Index into the digest's own list of places (what `revealDigest` sends back). */
  readonly target: number;
  /** "also in: b.md line 4", each a place of its own. */
  readonly alsoIn: readonly PanelLink[];
}

export interface PanelDigestSection {
  /** The section's headings joined; empty before the first heading. */
  readonly heading: string;
  readonly lines: readonly PanelDigestLine[];
}

export interface PanelDigestDocument {
  readonly file: string;
  /** "2 of 40 sentences", worded; or why the document was left out. */
  readonly figures: string;
  readonly sections: readonly PanelDigestSection[];
}

export interface PanelDigest {
  readonly id: number;
  /** "Digest of 3 documents: 6 sentences, 120 of 2,400 words", worded. */
  readonly headline: string;
  readonly documents: readonly PanelDigestDocument[];
  readonly notices: readonly string[];
}

export interface PanelMethodChoice {
  readonly value: RankerName;
  readonly label: string;
  readonly detail: string;
}

export interface PanelControls {
  /** In the length grammar: "15%", "120w", "6s". */
  readonly length: string;
  readonly method: RankerName;
  readonly methods: readonly PanelMethodChoice[];
  readonly balance: boolean;
  readonly live: boolean;
  /** The focus of the next summaries (empty: general) and the recent ones, newest first. */
  readonly focus: string;
  readonly recentFocuses: readonly string[];
}

export type NoticeKind = 'info' | 'stale' | 'tooLarge' | 'error';

/** `waiting`: the job is sent and the engine host has not begun it yet (it may still be starting). */
export type ProgressStage = 'waiting' | EngineStage | 'checkingAbstract';

export interface PanelProgress {
  readonly task: 'summarize' | 'checkAbstract';
  readonly stage: ProgressStage;
  /** The stage in words, localized ("Summarizing: ranking sentences (step 2 of 3)…"). */
  readonly label: string;
  /** Each summary stage's name, localized, in order. */
  readonly stages: readonly string[];
}

/** The stages a summary goes through, in order, with the words the panel and status area show. */
export const SUMMARY_STAGES: readonly { readonly stage: EngineStage; readonly label: string }[] = [
  { stage: 'reading', label: 'Reading the document' },
  { stage: 'ranking', label: 'Ranking sentences' },
  { stage: 'checking', label: 'Picking and checking sentences' },
];

/** A stage in words; `t` localizes (the English text is the key), English when absent. */
export function progressLabel(
  progress: { readonly task: PanelProgress['task']; readonly stage: ProgressStage },
  t: (message: string, ...args: (string | number)[]) => string = (message, ...args) => message.replace(/\{(\d+)\}/g, (_, i: string) => String(args[Number(i)])),
): string {
  if (progress.task === 'checkAbstract') return t('Checking the abstract…');
  const step = SUMMARY_STAGES.findIndex((entry) => entry.stage === progress.stage);
  if (step < 0) return t('Summarizing: waiting for the engine…');
  return t('Summarizing: {0} (step {1} of {2})…', t(SUMMARY_STAGES[step]!.label).toLowerCase(), step + 1, SUMMARY_STAGES.length);
}

export type ToPanel =
  | { readonly type: 'summary'; readonly summary: PanelSummary }
  | { readonly type: 'controls'; readonly controls: PanelControls }
  | { readonly type: 'text'; readonly text: PanelText }
  /** null: nothing is running (or it is quick enough not to show). */
  | { readonly type: 'progress'; readonly progress: PanelProgress | null }
  | { readonly type: 'notice'; readonly kind: NoticeKind; readonly text: string }
  | { readonly type: 'abstractCheck'; readonly check: PanelAbstractCheck | null }
  | { readonly type: 'digest'; readonly digest: PanelDigest | null }
  /** An announcement for screen readers ("Summary ready: 6 sentences"). */
  | { readonly type: 'announce'; readonly text: string }
  /** Move the keyboard focus to the summary list (the panel was shown on purpose). */
  | { readonly type: 'focus' }
  | { readonly type: 'clear' };

// ---------- what the panel asks for (webview → extension) ----------

export type FromPanel =
  | { readonly type: 'ready' }
  | { readonly type: 'reveal'; readonly summaryId: number; readonly sentence: number }
  | { readonly type: 'revealCheck'; readonly checkId: number; readonly target: number }
  | { readonly type: 'dismissCheck' }
  | { readonly type: 'revealDigest'; readonly digestId: number; readonly target: number }
  /** The digest's dismiss button: the extension forgets the digest and its highlights. */
  | { readonly type: 'dismissDigest' }
  | { readonly type: 'applyRepair'; readonly summaryId: number; readonly warning: number; readonly repair: number }
  | { readonly type: 'setLength'; readonly length: string }
  | { readonly type: 'setMethod'; readonly method: RankerName }
  | { readonly type: 'setBalance'; readonly enabled: boolean }
  /** Empty: back to a general summary. */
  | { readonly type: 'setFocus'; readonly focus: string }
  | { readonly type: 'command'; readonly command: import('./from-panel').PanelCommand };
