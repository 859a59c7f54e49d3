/**
 * Markdown rendering of a summary, shared by the command line (`--format markdown`), Copy Summary
 * and Insert Summary. Sentence text is escaped so that quoted prose cannot turn into markup.
 */
import type { Summary } from '../types';

export interface MarkdownOptions {
  /** Group sentences under their section headings (default true). */
  readonly grouped?: boolean;
  /** Level of the section headings inside the block (default 3). */
  readonly headingLevel?: number;
  /** First line of the block; the default names it as an extractive summary. */
  readonly caption?: string;
}

/** Characters that would start markup at the beginning or inside a line of prose. */
export function escapeMarkdown(text: string): string {
  return text
    .replace(/[\\`*_[\]<>#|~]/g, (c) => `\\${c}`)
    .replace(/^(\s*)([-+])(\s)/, '$1\\$2$3')
    .replace(/^(\s*\d+)([.)])(\s)/, '$1\\$2$3');
}

export function summaryToMarkdown(summary: Summary, options: MarkdownOptions = {}): string {
  const grouped = options.grouped ?? true;
  const level = Math.min(6, Math.max(1, options.headingLevel ?? 3));
  const { stats } = summary;
  const caption =
    options.caption ??
    `**Summary** — ${stats.sentencesOut} sentences quoted from the text (${stats.wordsOut} of ${stats.wordsIn} words); extractive, so some context may be missing.`;
  const lines: string[] = [caption, ''];
  let currentPath = '';
  for (const picked of summary.sentences) {
    const path = picked.sectionPath.join(' › ');
    if (grouped && path !== currentPath) {
      if (path) lines.push(`${'#'.repeat(level)} ${escapeMarkdown(path)}`, '');
      currentPath = path;
    }
    lines.push(`- ${escapeMarkdown(picked.text)}${picked.edited ? ' *(edited: ' + picked.edited.reason + ')*' : ''}`);
  }
  return lines.join('\n').replace(/\n+$/, '') + '\n';
}
