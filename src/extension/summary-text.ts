/**
 * Text that leaves the panel: the Markdown for Copy Summary and the single edit Insert Summary
 * makes. Pure; the command only applies the returned edit.
 */
import { summaryToMarkdown } from '../core/index';
import type { DocumentFormat, Summary } from '../core/index';

export function summaryForClipboard(summary: Summary): string {
  return summaryToMarkdown(summary, { grouped: true });
}

function plainSummary(summary: Summary, eol: string): string {
  const { stats } = summary;
  const lines = [`Summary (extractive: ${stats.sentencesOut} sentences quoted from the text, ${stats.wordsOut} of ${stats.wordsIn} words):`];
  for (const pick of summary.sentences) lines.push(`- ${pick.text.replace(/\s*[\r\n]+\s*/g, ' ')}`);
  return lines.join(eol);
}

export interface PlannedInsertion {
  /** Where the text goes (UTF-16 offset into the document). */
  readonly offset: number;
  readonly text: string;
  readonly placement: 'underTitle' | 'atCursor';
}

function endOfLine(text: string, from: number): number {
  let i = Math.max(0, Math.min(from, text.length));
  while (i < text.length && text[i] !== '\n' && text[i] !== '\r') i++;
  return i;
}

/**
 * Markdown documents get the summary as a short block right under their title (after the H1's
 * line); otherwise, and for selections, it goes at the cursor. Line endings follow the document.
 */
export function planInsertion(summary: Summary, documentText: string, format: DocumentFormat, cursorOffset: number, scope: 'document' | 'selection'): PlannedInsertion {
  const eol = documentText.includes('\r\n') ? '\r\n' : '\n';
  if (format === 'markdown') {
    const block = summaryToMarkdown(summary, { grouped: false }).replace(/\n$/, '').replace(/\n/g, eol);
    const title = scope === 'document' ? summary.document.sections.find((s) => s.depth === 1 && s.headingSpan !== null) : undefined;
    if (title?.headingSpan && summary.document.title !== null) {
      // A setext title spans two lines; its span ends on the underline, so "end of line" is right for both kinds.
      const offset = endOfLine(documentText, Math.max(title.headingSpan.start, title.headingSpan.end - 1));
      return { offset, text: eol + eol + block, placement: 'underTitle' };
    }
    return atCursor(documentText, cursorOffset, block, eol);
  }
  return atCursor(documentText, cursorOffset, plainSummary(summary, eol), eol);
}

function atCursor(documentText: string, cursorOffset: number, block: string, eol: string): PlannedInsertion {
  const offset = Math.max(0, Math.min(cursorOffset, documentText.length));
  const atLineStart = offset === 0 || documentText[offset - 1] === '\n' || documentText[offset - 1] === '\r';
  return { offset, text: (atLineStart ? '' : eol + eol) + block + eol + (offset < documentText.length ? eol : ''), placement: 'atCursor' };
}
