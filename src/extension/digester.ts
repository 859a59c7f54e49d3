/**
 * Digests in the editor: of the open Markdown / reStructuredText / text documents, or of files
 * and folders picked in the explorer (read through `workspace.fs`, each bounded by
 * tersely.maxDocumentSize). The digest runs in the engine host on a lane of its own (so a live
 * summary never cancels it), with per-document progress and cancellation in a notification. The
 * result has its own place in the panel: every line opens its file with the sentence selected.
 */
import * as vscode from 'vscode';
import type { DigestRequest, DocumentFormat, Span } from '../core/index';
import type { TerselyContext } from './context';
import { SummaryHighlights } from './decorations';
import { collectDigestFiles, isDigestLanguage, type DigestFileSystem, type Skipped } from './digest-files';
import { digestView, uniqueNames } from './digest-view';
import { rangeOf } from './editor-ranges';
import type { EngineDigestDocument } from './engine-protocol';
import type { PanelDigest } from './messages';
import { checkedSpan } from './ranges';
import { formatFor, settingKeyOf } from './settings';
import { isSummarizable } from './summaries';
import { CancelledError, type EngineClient } from './worker-client';

interface Source {
  readonly uri: vscode.Uri;
  readonly text: string;
  readonly format: DocumentFormat;
}

interface ShownPlace {
  readonly uri: vscode.Uri;
  /** Null when the engine's span did not fit the text it was given (a bug): a reveal says so. */
  readonly span: Span | null;
  /** The source text at the span when digested: a reveal checks the file still has it there. */
  readonly expected: string;
}

/** The digest shown, as the in-editor tests see it (URIs as strings). */
export interface ShownDigestView {
  readonly id: number;
  readonly highlighted: boolean;
  readonly places: readonly { readonly uri: string; readonly span: Span | null }[];
  readonly picked: readonly { readonly uri: string; readonly span: Span | null }[];
}

export interface DigestOutcome {
  readonly kind: 'shown' | 'empty' | 'cancelled' | 'failed';
  readonly id?: number;
  readonly documents?: number;
  readonly sentences?: number;
}

const kindOf = (type: vscode.FileType): 'file' | 'folder' | 'other' =>
  type & vscode.FileType.Directory ? 'folder' : type & vscode.FileType.File ? 'file' : 'other';

/** The editor's file system as digest-files.ts sees it. */
const editorFs: DigestFileSystem<vscode.Uri> = {
  stat: async (uri) => {
    const stat = await vscode.workspace.fs.stat(uri);
    return { kind: kindOf(stat.type), size: stat.size, ctime: stat.ctime, mtime: stat.mtime };
  },
  list: async (uri) =>
    (await vscode.workspace.fs.readDirectory(uri)).map(([name, type]) => ({ uri: vscode.Uri.joinPath(uri, name), name, kind: kindOf(type), link: (type & vscode.FileType.SymbolicLink) !== 0 })),
  name: (uri) => uri.path.slice(uri.path.lastIndexOf('/') + 1),
};

interface ShownDigest {
  readonly id: number;
  readonly places: readonly ShownPlace[];
  /** The places the digest's own lines point to (not its "also in" links): what the editor highlights. */
  readonly picked: readonly ShownPlace[];
  highlighted: boolean;
}

export class Digester {
  private shown: ShownDigest | undefined;
  private nextId = 1;
  /** The single-summary look (decorations.ts), in decoration types of its own so neither clears the other. */
  private readonly highlights: SummaryHighlights;

  constructor(
    private readonly context: TerselyContext,
    private readonly engine: EngineClient,
  ) {
    this.highlights = context.own(new SummaryHighlights());
    context.own(vscode.window.onDidChangeVisibleTextEditors(() => this.applyHighlights()));
    context.own(
      vscode.workspace.onDidChangeTextDocument((event) => {
        if (event.contentChanges.length > 0 && this.shown?.picked.some((p) => p.uri.toString() === event.document.uri.toString())) this.applyHighlights();
      }),
    );
  }

  /**
   * Highlights the digest's sentences in every visible editor of a digested file, each only while
   * the file still has the digested text at its place (an edit before it takes it off).
   */
  private applyHighlights(): void {
    const shown = this.shown;
    for (const editor of vscode.window.visibleTextEditors) {
      const key = editor.document.uri.toString();
      const ranges =
        shown?.highlighted === true
          ? shown.picked.flatMap((place) => {
              if (place.span === null || place.uri.toString() !== key) return [];
              const range = rangeOf(editor.document, place.span);
              return editor.document.getText(range) === place.expected ? [range] : [];
            })
          : [];
      this.highlights.show(editor, ranges, []);
    }
  }

  /** Tersely: Clear Highlights takes the digest's highlights off too (its lines stay in the panel). */
  clearHighlights(): void {
    if (this.shown) this.shown.highlighted = false;
    this.applyHighlights();
  }

  /** The panel's dismiss button: the digest leaves the panel and the editor. */
  dismiss(): void {
    this.shown = undefined;
    this.applyHighlights();
    this.context.panel.post({ type: 'digest', digest: null });
  }

  /** Tersely: Digest Open Documents. */
  async digestOpenDocuments(): Promise<DigestOutcome> {
    const { t } = this.context.wording;
    const maxChars = this.context.settings.read().summary.maxChars;
    const open = (await openEditorDocuments((line) => this.context.log.warn(line))).filter((d) => isDigestLanguage(d.languageId));
    const sources = open.filter((d) => d.getText().length <= maxChars).map((d) => ({ uri: d.uri, text: d.getText(), format: formatFor(d.languageId, d.fileName) }));
    this.tellSkipped(open.length - sources.length, maxChars);
    if (sources.length === 0) {
      void vscode.window.showInformationMessage(t('Open Markdown, reStructuredText or text documents first: Tersely digests the open documents.'));
      return { kind: 'empty' };
    }
    return this.digest(sources);
  }

  /** Tersely: Digest Files…: the explorer's selection (`uris`), else a folder dialog. */
  async digestFiles(clicked?: unknown, selected?: unknown): Promise<DigestOutcome> {
    const { t } = this.context.wording;
    // The explorer passes the clicked item and the whole selection; tests and keybindings may pass either.
    const given: unknown[] = Array.isArray(selected) && selected.length > 0 ? selected : Array.isArray(clicked) ? clicked : clicked ? [clicked] : [];
    let picked = given.filter((value): value is vscode.Uri => value instanceof vscode.Uri);
    if (picked.length === 0) {
      const chosen = await vscode.window.showOpenDialog({ canSelectFiles: true, canSelectFolders: true, canSelectMany: true, title: t('Files and folders to digest'), openLabel: t('Digest') });
      if (!chosen || chosen.length === 0) return { kind: 'cancelled' };
      picked = chosen;
    }
    const maxChars = this.context.settings.read().summary.maxChars;
    // A UTF-8 file of more than 4 bytes per allowed character cannot fit; the exact check is on the decoded text.
    const collected = await collectDigestFiles(editorFs, picked, maxChars * 4, undefined, (uri) => uri.toString());
    const openByUri = new Map(vscode.workspace.textDocuments.map((d) => [d.uri.toString(), d]));
    const sources: Source[] = [];
    let tooLarge = collected.skipped.filter((s) => s.reason === 'tooLarge').length;
    const unread: vscode.Uri[] = collected.skipped.filter((s: Skipped<vscode.Uri>) => s.reason !== 'tooLarge').map((s) => s.uri);
    const decoder = new TextDecoder('utf-8');
    for (const file of collected.files) {
      // An open document is read as the editor shows it (unsaved edits included), so its lines match on reveal.
      const open = openByUri.get(file.uri.toString());
      let text: string;
      try {
        text = open ? open.getText() : decoder.decode(await vscode.workspace.fs.readFile(file.uri));
      } catch (error) {
        this.context.log.warn(`Digest: could not read ${file.uri.toString()}: ${error instanceof Error ? error.message : String(error)}`);
        unread.push(file.uri);
        continue;
      }
      if (text.length > maxChars) tooLarge++;
      else sources.push({ uri: file.uri, text, format: open ? formatFor(open.languageId, open.fileName) : file.format });
    }
    this.tellSkipped(tooLarge, maxChars);
    if (unread.length > 0) {
      const names = unread.slice(0, 3).map((uri) => vscode.workspace.asRelativePath(uri, false)).join(', ');
      void vscode.window.showWarningMessage(t('Tersely could not read {0} of the picked files or folders ({1}); the digest leaves them out.', this.context.wording.count(unread.length), unread.length > 3 ? `${names}, …` : names));
    }
    if (collected.truncated) void vscode.window.showWarningMessage(t('Tersely digests at most {0} files at once; the rest were left out.', this.context.wording.count(collected.files.length)));
    if (sources.length === 0) {
      void vscode.window.showInformationMessage(t('No Markdown, reStructuredText or text files to digest there.'));
      return { kind: 'empty' };
    }
    return this.digest(sources);
  }

  private tellSkipped(count: number, maxChars: number): void {
    if (count === 0) return;
    const { t, count: n } = this.context.wording;
    void vscode.window.showInformationMessage(t('{0} documents are larger than the {1} characters set in tersely.{2} and were left out of the digest.', n(count), n(maxChars), settingKeyOf('maxChars')!));
  }

  private async digest(sources: readonly Source[]): Promise<DigestOutcome> {
    const { panel, wording, settings } = this.context;
    const { t } = wording;
    const names = uniqueNames(sources.map((s) => vscode.workspace.asRelativePath(s.uri, false)));
    const documents: EngineDigestDocument[] = sources.map((s, k) => ({ file: names[k]!, text: s.text, format: s.format }));
    const { summary, host } = settings.read();
    // The team's model and templates apply as they do to one document's summary.
    this.engine.useModel(await this.context.models.load(host.modelFile));
    const { templates, problems } = await this.context.templates.read(host.templateFiles, sources[0]!.uri);
    for (const problem of problems) this.context.summarizer.tellTemplateProblem(problem);
    // The digest's own length (a few sentences per document) rather than the single-document length setting.
    const options: DigestRequest = { method: summary.method, language: summary.language, maxChars: summary.maxChars, ...(templates.length > 0 ? { templates } : {}) };
    let result;
    try {
      result = await vscode.window.withProgress(
        { location: vscode.ProgressLocation.Notification, title: t('Tersely: digesting {0} documents', wording.count(documents.length)), cancellable: true },
        async (progress, token) => {
          const abort = new AbortController();
          const listener = token.onCancellationRequested(() => abort.abort());
          let reported = 0;
          try {
            return await this.engine.run(
              { kind: 'digest', documents, options },
              {
                signal: abort.signal,
                onProgress: (done, total) => {
                  progress.report({ message: t('{0} of {1}: {2}', wording.count(done), wording.count(total), documents[done - 1]?.file ?? ''), increment: ((done - reported) / total) * 100 });
                  reported = done;
                },
              },
            );
          } finally {
            listener.dispose();
          }
        },
      );
    } catch (error) {
      if (error instanceof CancelledError) return { kind: 'cancelled' };
      void vscode.window.showErrorMessage(t('Tersely could not make the digest: {0}', error instanceof Error ? error.message : String(error)));
      return { kind: 'failed' };
    }
    if (result.kind !== 'digest') {
      void vscode.window.showErrorMessage(t('Tersely could not make the digest: {0}', `the engine answered a ${result.kind} job`));
      return { kind: 'failed' };
    }
    if (result.modelProblem) this.context.models.reportProblem(host.modelFile, result.modelProblem);
    const view = digestView(result.digest, wording);
    const places = view.places.map((p): ShownPlace => {
      const text = sources[p.document]!.text;
      const span = checkedSpan(p.span, text);
      if (!span) this.context.log.error(`Digest: the engine gave span ${p.span.start}-${p.span.end} outside ${sources[p.document]!.uri.toString()}`);
      return { uri: sources[p.document]!.uri, span, expected: span ? text.slice(span.start, span.end) : '' };
    });
    const lineTargets = view.panel.documents.flatMap((d) => d.sections.flatMap((s) => s.lines.map((l) => l.target)));
    const id = this.nextId++;
    this.shown = { id, places, picked: lineTargets.map((target) => places[target]!), highlighted: true };
    this.applyHighlights();
    const shown: PanelDigest = { id, ...view.panel };
    panel.post({ type: 'digest', digest: shown });
    panel.post({ type: 'announce', text: t('Digest ready: {0} sentences from {1} documents.', wording.count(result.digest.stats.sentencesOut), wording.count(documents.length)) });
    void panel.show();
    return { kind: 'shown', id, documents: documents.length, sentences: result.digest.sentences.length };
  }

  /** Shows a place of the digest in its file, the sentence selected (the panel's clickable lines). */
  async reveal(digestId: number, target: number): Promise<boolean> {
    const { t } = this.context.wording;
    const place = this.shown?.id === digestId ? this.shown.places[target] : undefined;
    if (!place) {
      this.context.log.warn(`The panel asked for place ${target} of digest ${digestId}, which is not shown.`);
      return false;
    }
    const name = vscode.workspace.asRelativePath(place.uri, false);
    if (place.span === null) {
      void vscode.window.showErrorMessage(t('Tersely cannot show this line of the digest in {0}: its place in the file is not known.', name));
      return false;
    }
    let document: vscode.TextDocument;
    try {
      document = await vscode.workspace.openTextDocument(place.uri);
    } catch (error) {
      void vscode.window.showErrorMessage(t('Tersely could not open {0}: {1}', name, error instanceof Error ? error.message : String(error)));
      return false;
    }
    const range = rangeOf(document, place.span);
    if (document.getText(range) !== place.expected) {
      void vscode.window.showInformationMessage(t('{0} changed since the digest; make the digest again to update its lines.', name));
      return false;
    }
    const column = vscode.window.visibleTextEditors.find((e) => e.document === document)?.viewColumn;
    const editor = await vscode.window.showTextDocument(document, { viewColumn: column, selection: range, preserveFocus: false, preview: false });
    editor.revealRange(range, vscode.TextEditorRevealType.InCenterIfOutsideViewport);
    return true;
  }

  /** The digest shown (the in-editor tests check reveals and highlights against it). */
  get shownDigest(): ShownDigestView | undefined {
    const shown = this.shown;
    if (!shown) return undefined;
    const plain = (p: ShownPlace) => ({ uri: p.uri.toString(), span: p.span });
    return { id: shown.id, highlighted: shown.highlighted, places: shown.places.map(plain), picked: shown.picked.map(plain) };
  }
}

/**
 * The text documents of the open editor tabs, each once, in tab order (not
 * `workspace.textDocuments`, which also holds documents other extensions loaded and ones whose
 * tab was closed); output panes, git views and the like are left out.
 */
async function openEditorDocuments(log: (line: string) => void): Promise<vscode.TextDocument[]> {
  const seen = new Set<string>();
  const documents: vscode.TextDocument[] = [];
  for (const tab of vscode.window.tabGroups.all.flatMap((group) => group.tabs)) {
    if (!(tab.input instanceof vscode.TabInputText)) continue;
    const { uri } = tab.input;
    if (seen.has(uri.toString())) continue;
    seen.add(uri.toString());
    const loaded = vscode.workspace.textDocuments.find((d) => d.uri.toString() === uri.toString());
    // A tab restored from an earlier session may not be loaded yet.
    const document =
      loaded ??
      (await vscode.workspace.openTextDocument(uri).then(
        (d) => d,
        (error: unknown) => log(`Digest: the tab of ${uri.toString()} has no readable document: ${error instanceof Error ? error.message : String(error)}`),
      ));
    if (document && isSummarizable(document)) documents.push(document);
  }
  return documents;
}
