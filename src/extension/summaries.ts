/**
 * The summaries on screen: one per document, tagged with the document version it was made from,
 * and which one the panel shows. Only bookkeeping; showing them is editor-view.ts and the panel.
 */
import * as vscode from 'vscode';
import type { DocumentFormat, Span, Summary } from '../core/index';

export type Scope = 'document' | 'selection';

/** A summary on screen for one document version. */
export interface ShownSummary {
  readonly id: number;
  readonly key: string;
  readonly uri: vscode.Uri;
  /** Moves on with the document only through Insert Summary's own edit (summary-actions.ts). */
  version: number;
  readonly scope: Scope;
  readonly selection: Span | null;
  readonly format: DocumentFormat;
  readonly documentName: string;
  summary: Summary;
  highlighted: boolean;
}

export type NewSummary = Omit<ShownSummary, 'id' | 'highlighted'>;

export class SummaryStore {
  private readonly byDocument = new Map<string, ShownSummary>();
  private nextId = 1;
  /** Document key of the summary the panel shows. */
  panelKey: string | undefined;

  add(entry: NewSummary): ShownSummary {
    const shown: ShownSummary = { ...entry, id: this.nextId++, highlighted: true };
    this.byDocument.set(shown.key, shown);
    return shown;
  }

  get(key: string): ShownSummary | undefined {
    return this.byDocument.get(key);
  }

  has(key: string): boolean {
    return this.byDocument.has(key);
  }

  delete(key: string): void {
    this.byDocument.delete(key);
  }

  all(): IterableIterator<ShownSummary> {
    return this.byDocument.values();
  }

  keys(): IterableIterator<string> {
    return this.byDocument.keys();
  }

  byId(summaryId: number): ShownSummary | undefined {
    for (const shown of this.byDocument.values()) if (shown.id === summaryId) return shown;
    return undefined;
  }

  /** The summary the panel shows, if any. */
  inPanel(): ShownSummary | undefined {
    return this.panelKey ? this.byDocument.get(this.panelKey) : undefined;
  }
}

/** Whether the summary still matches its open document, version for version. */
export function isCurrent(shown: ShownSummary): boolean {
  const document = vscode.workspace.textDocuments.find((d) => d.uri.toString() === shown.key);
  return document !== undefined && !document.isClosed && document.version === shown.version;
}

/** Output panes, git views and the like are not documents people write. */
export function isSummarizable(document: vscode.TextDocument): boolean {
  return ['file', 'untitled', 'vscode-remote', 'vscode-userdata'].includes(document.uri.scheme);
}
