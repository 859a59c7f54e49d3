/**
 * The one conversion from an engine span (0-based UTF-16 offsets, half-open `[start, end)`, in
 * whole-document coordinates) to an editor range. Every highlight, hover, diagnostic and
 * selection goes through it; spans are checked first (`checkedSpan` in ranges.ts).
 */
import * as vscode from 'vscode';
import type { Span } from '../core/index';

export function rangeOf(document: Pick<vscode.TextDocument, 'positionAt'>, span: Span): vscode.Range {
  return new vscode.Range(document.positionAt(span.start), document.positionAt(span.end));
}
