/**
 * How summaries follow the editor: an edit takes a summary off its document (or, in live mode,
 * summarizes again after a pause), switching editors shows that document's summary (live mode
 * makes one at once), closing a document forgets it, and a changed setting refreshes the panel.
 * Every listener is registered with the context as its owner.
 */
import * as vscode from 'vscode';
import type { TerselyContext } from './context';
import { SETTINGS_SECTION } from './settings-access';
import { isCurrent, isSummarizable } from './summaries';
import { shiftSpans } from './span-shift';

const SETTINGS_REFRESH_DELAY_MS = 50;

export function watchEditors(context: TerselyContext): void {
  const { debouncer, disposables, editorView, panel, store, summarizer } = context;

  vscode.workspace.onDidChangeTextDocument(
    (event) => {
      if (event.contentChanges.length === 0 || !isSummarizable(event.document)) return;
      const key = event.document.uri.toString();
      const insert = context.actions.pendingInsert;
      const shownHere = store.get(key);
      if (insert && insert.key === key && shownHere && event.contentChanges.length === 1 && event.contentChanges[0]!.rangeOffset === insert.offset && event.contentChanges[0]!.text.length === insert.length && event.contentChanges[0]!.rangeLength === 0) {
        // Insert Summary's own edit: the summary moves with the text and stays on screen.
        shownHere.summary = shiftSpans(shownHere.summary, insert.offset, insert.length);
        shownHere.version = event.document.version;
        summarizer.display(shownHere);
        return;
      }
      context.abstractCheck.markStale(event.document);
      if (context.live.on && vscode.window.activeTextEditor?.document === event.document) {
        debouncer.schedule(key, context.settings.read().host.liveDelay, () => {
          const editor = vscode.window.visibleTextEditors.find((e) => e.document === event.document);
          if (editor) void summarizer.summarize(editor, 'document', 'live');
        });
        return;
      }
      const shown = store.get(key);
      if (shown?.highlighted) {
        editorView.unhighlight(shown);
        if (store.panelKey === key) panel.post({ type: 'notice', kind: 'stale', text: 'The document changed since this summary. Summarize again to refresh it.' });
        editorView.updateStatus();
      }
    },
    undefined,
    disposables,
  );

  vscode.window.onDidChangeActiveTextEditor(
    (editor) => {
      if (!editor || !isSummarizable(editor.document)) return;
      const shown = store.get(editor.document.uri.toString());
      if (context.live.on) {
        // Switching editors follows at once; only typing waits for a pause.
        if (!shown || !isCurrent(shown) || shown.scope !== 'document') void summarizer.summarize(editor, 'document', 'switch');
        else summarizer.display(shown);
        return;
      }
      if (shown && isCurrent(shown)) summarizer.display(shown);
      editorView.updateStatus();
    },
    undefined,
    disposables,
  );

  vscode.window.onDidChangeVisibleTextEditors(
    () => {
      for (const shown of store.all()) if (shown.highlighted) editorView.apply(shown);
    },
    undefined,
    disposables,
  );

  vscode.workspace.onDidCloseTextDocument(
    (document) => {
      const key = document.uri.toString();
      debouncer.cancel(key);
      summarizer.cancelFor(key);
      if (store.has(key)) summarizer.forget(document);
      context.abstractCheck.forget(document);
    },
    undefined,
    disposables,
  );

  vscode.workspace.onDidChangeConfiguration(
    (event) => {
      if (!event.affectsConfiguration(SETTINGS_SECTION)) return;
      context.abstractCheck.settingsChanged();
      editorView.settingsChanged();
      panel.post({ type: 'controls', controls: context.controls() });
      debouncer.schedule('settings', SETTINGS_REFRESH_DELAY_MS, () => void summarizer.refresh());
    },
    undefined,
    disposables,
  );

  vscode.workspace.onDidGrantWorkspaceTrust(() => void summarizer.refresh(), undefined, disposables);
}
