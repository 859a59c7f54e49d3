/**
 * reStructuredText → ParsedDocument.
 *
 * Pipeline: source lines (tabs expanded, offsets kept) → body elements, region by region (the
 * specification's indentation rules) → section levels and document title → the shared document
 * builder. Every sentence keeps the exact UTF-16 range of its source; inline markup is stripped
 * from the sentence text only. The text is never changed.
 */
import { DocumentBuilder } from '../../parse/document-builder';
import type { ParsedDocument } from '../../types';
import { BodyParser } from './body-parser';
import { Region, SourceLines } from './source-lines';
import { planTitles } from './titles';
import { ROOT_CONTEXT, RstWalker } from './walker';

export interface RestructuredTextOptions {
  /** Offset of `text` in the whole document (for a selection); every span includes it. */
  readonly baseOffset: number;
  /** Read table cells as paragraphs instead of skipping tables. */
  readonly includeTables: boolean;
  /** Read footnote and citation bodies as paragraphs instead of skipping them. Default false. */
  readonly includeFootnotes?: boolean;
}

export function parseRestructuredText(text: string, options: RestructuredTextOptions): ParsedDocument {
  // A byte order mark is not text; offsets still count it, so they index the original string.
  const from = text.charCodeAt(0) === 0xfeff ? 1 : 0;
  const source = new SourceLines(text, from);
  const region = new Region(source, source.lines.map((_, line) => ({ line, col: 0 })));
  const parser = new BodyParser({ includeTables: options.includeTables, includeFootnotes: options.includeFootnotes ?? false });
  const blocks = parser.parse(region, true);
  const doc = new DocumentBuilder(text, options.baseOffset, 'restructuredtext');
  new RstWalker(doc, planTitles(blocks)).walk(blocks, ROOT_CONTEXT);
  return doc.build();
}
