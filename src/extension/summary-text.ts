/**
 * Text that leaves the panel: the Markdown for Copy Summary and the single edit Insert Summary
 * makes, at the cursor or under a heading the user picked. Pure; the command only applies the
 * returned edit.
 */
import type { DocumentFormat, Summary } from '../core/index';
import { summaryMarkdown } from './summary-markdown';
import { ENGLISH, type Wording } from './wording';

export function summaryForClipboard(summary: Summary, documentText: string | null, format: DocumentFormat, documentName?: string, wording: Wording = ENGLISH): string {
  return summaryMarkdown(summary, documentText, format, { grouped: true, documentName, wording });
}

function plainSummary(summary: Summary, eol: string, wording: Wording): string {
  const { stats } = summary;
  const lines = [wording.t('Summary (extractive: {0} sentences quoted from the text, {1} of {2} words):', wording.count(stats.sentencesOut), wording.count(stats.wordsOut), wording.count(stats.wordsIn))];
  for (const pick of summary.sentences) lines.push(`- ${pick.text.replace(/\s*[\r\n]+\s*/g, ' ')}`);
  return lines.join(eol);
}

export type InsertTarget = { readonly kind: 'cursor'; readonly offset: number } | { readonly kind: 'heading'; readonly section: number };

export interface PlannedInsertion {
  /** Where the text goes (UTF-16 offset into the document). */
  readonly offset: number;
  readonly text: string;
  readonly placement: 'underHeading' | 'atCursor';
}

function endOfLine(text: string, from: number): number {
  let i = Math.max(0, Math.min(from, text.length));
  while (i < text.length && text[i] !== '\n' && text[i] !== '\r') i++;
  return i;
}

/** The block for a format: clean CommonMark for Markdown, a plain list otherwise. Line endings follow the document. */
export function insertionBlock(summary: Summary, documentText: string, format: DocumentFormat, wording: Wording = ENGLISH): string {
  const eol = documentText.includes('\r\n') ? '\r\n' : '\n';
  return format === 'markdown' ? summaryMarkdown(summary, documentText, format, { grouped: false, wording }).replace(/\n$/, '').replace(/\n/g, eol) : plainSummary(summary, eol, wording);
}

export function planInsertion(summary: Summary, documentText: string, format: DocumentFormat, target: InsertTarget, wording: Wording = ENGLISH): PlannedInsertion {
  const eol = documentText.includes('\r\n') ? '\r\n' : '\n';
  const block = insertionBlock(summary, documentText, format, wording);
  const heading = target.kind === 'heading' ? summary.document.sections[target.section]?.headingSpan : undefined;
  if (heading) {
    // A setext heading spans two lines; its span ends on the underline, so "end of line" is right for both kinds.
    const offset = endOfLine(documentText, Math.max(heading.start, heading.end - 1));
    const rest = documentText.slice(offset);
    const blankAfter = /^(\r?\n|\r)[ \t]*(\r?\n|\r)/.test(rest) || rest.length === 0;
    return { offset, text: eol + eol + block + (blankAfter ? '' : eol), placement: 'underHeading' };
  }
  const cursor = target.kind === 'cursor' ? target.offset : 0;
  const offset = Math.max(0, Math.min(cursor, documentText.length));
  const atLineStart = offset === 0 || documentText[offset - 1] === '\n' || documentText[offset - 1] === '\r';
  return { offset, text: (atLineStart ? '' : eol + eol) + block + eol + (offset < documentText.length ? eol : ''), placement: 'atCursor' };
}
