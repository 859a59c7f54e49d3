/**
 * The Markdown that leaves the editor (Copy Summary, Insert Summary): clean CommonMark that
 * parses back to the summary's sentences. A Markdown sentence keeps its own source (inline code,
 * emphasis, links as written) when that source stands alone inline; otherwise, and for other
 * formats, the sentence text is escaped only where a character would start markup (so `#2231`
 * and `thumbs_state` stay as they are). A caption paragraph says it is extractive; groups, when
 * asked for, get a heading each with blank lines around every block.
 */
import type { DocumentFormat, PickedSentence, Summary } from '../core/index';
import { ENGLISH, type Wording } from './wording';

/** Escapes what would start inline markup in CommonMark, and nothing else. */
export function escapeInline(text: string): string {
  let out = text
    .replace(/\\(?=[!-/:-@[-`{-~])/g, '\\\\')
    .replace(/`/g, '\\`')
    // `*` and `_` open or close emphasis only next to non-space (and `_` never inside a word).
    .replace(/\*(?=\S)|(?<=\S)\*/g, '\\*')
    .replace(/(?<![\p{L}\p{N}])_|_(?![\p{L}\p{N}])/gu, '\\_')
    .replace(/\[(?=[^\]]*\])/g, '\\[')
    .replace(/<(?=[A-Za-z/!?])/g, '\\<')
    .replace(/&(?=#?\w+;)/g, '\\&')
    .replace(/!(?=\\\[)/g, '\\!');
  // At the start of a list item's text these would begin a block of their own.
  out = out.replace(/^(#{1,6})(?=\s|$)/, '\\$1').replace(/^([-+>=])(?=\s|$)/, '\\$1').replace(/^(\d{1,9})([.)])(?=\s|$)/, '$1\\$2');
  return out;
}

/** Source that cannot stand alone inline: HTML, reference links or footnotes whose definitions stay behind, line-start blocks. */
const NOT_STANDALONE = /<[A-Za-z/!?]|\]\s*\[|\[\^|^\s*(?:#{1,6}\s|[-+*>]\s|\d{1,9}[.)]\s|\||```|~~~)/;

export function sentenceMarkdown(pick: PickedSentence, documentText: string | null, format: DocumentFormat): string {
  if (format === 'markdown' && !pick.edited && documentText !== null) {
    const source = documentText.slice(pick.span.start, pick.span.end).replace(/\s*(?:\r\n|\r|\n)\s*/g, ' ').trim();
    if (source.length > 0 && !NOT_STANDALONE.test(source) && !/\\$/.test(source)) return source;
  }
  return escapeInline(pick.text.replace(/\s+/g, ' ').trim());
}

export interface SummaryMarkdownOptions {
  /** Group sentences under their section headings (Copy). */
  readonly grouped: boolean;
  readonly documentName?: string;
  /** Heading level of the groups (default 3). */
  readonly headingLevel?: number;
  readonly wording?: Wording;
}

export function summaryMarkdown(summary: Summary, documentText: string | null, format: DocumentFormat, options: SummaryMarkdownOptions): string {
  const wording = options.wording ?? ENGLISH;
  const { stats } = summary;
  const of = options.documentName ? wording.t('Summary of {0}', escapeInline(options.documentName)) : wording.t('Summary');
  const caption = wording.t('{0} — extractive: {1} sentences quoted from the text ({2} of {3} words); some context may be missing.', of, wording.count(stats.sentencesOut), wording.count(stats.wordsOut), wording.count(stats.wordsIn));
  const blocks: string[] = [caption];
  const level = Math.min(6, Math.max(1, options.headingLevel ?? 3));
  let list: string[] = [];
  let currentPath: string | null = null;
  const flush = (): void => {
    if (list.length > 0) blocks.push(list.join('\n'));
    list = [];
  };
  for (const pick of summary.sentences) {
    const path = pick.sectionPath.join(' › ');
    if (options.grouped && path !== currentPath) {
      flush();
      if (path) blocks.push(`${'#'.repeat(level)} ${escapeInline(path)}`);
      currentPath = path;
    }
    const edited = pick.edited ? ` ${wording.t('(edited: {0})', escapeInline(pick.edited.reason))}` : '';
    list.push(`- ${sentenceMarkdown(pick, documentText, format)}${edited}`);
  }
  flush();
  return blocks.join('\n\n') + '\n';
}
