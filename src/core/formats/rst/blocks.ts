/**
 * The block structure the reStructuredText parser produces: what the walker turns into sections,
 * paragraphs and skipped stretches. Offsets are local (into the parsed string); text is kept as
 * region lines so that inline parsing can map every unit back to the source.
 */
import type { SkipReason } from '../../types';
import type { Region } from './source-lines';

export interface Spanned {
  readonly start: number;
  readonly end: number;
}

/** Inline text: the lines of a region joined by line breaks, minus `cut` units at the end (a closing `::`). */
export interface TextLines {
  readonly region: Region;
  readonly cut: number;
}

export interface TitleBlock extends Spanned {
  readonly kind: 'title';
  /** The adornment style: the underline character, or overline + underline characters. */
  readonly style: string;
  readonly text: TextLines;
}

export interface ParagraphBlock extends Spanned {
  readonly kind: 'paragraph';
  readonly text: TextLines;
}

export interface ListBlock extends Spanned {
  readonly kind: 'list';
  readonly items: readonly (readonly Block[])[];
}

export interface DefinitionItem {
  readonly term: TextLines;
  readonly termSpan: Spanned;
  readonly body: readonly Block[];
}

export interface DefinitionListBlock extends Spanned {
  readonly kind: 'definitionList';
  readonly items: readonly DefinitionItem[];
}

/** Prose inside a container: block quotes, admonitions, topics, figure captions and the like. */
export interface ContainerBlock extends Spanned {
  readonly kind: 'container';
  /** 'quote' for block quotes (their paragraphs are quotes), 'prose' for everything else. */
  readonly role: 'quote' | 'prose';
  readonly body: readonly Block[];
  /** Parts that are not prose (a directive's marker line, title, options; a quote's attribution). */
  readonly skipped: readonly SkipBlock[];
}

/** One table cell's body (only parsed when tables are read). */
export interface TableBlock extends Spanned {
  readonly kind: 'table';
  /** Body rows' cells, each parsed as blocks; header rows are left out. */
  readonly cells: readonly (readonly Block[])[];
  /** Where the header rows are (labels, not statements), or null. */
  readonly header: Spanned | null;
}

export interface SkipBlock extends Spanned {
  readonly kind: 'skip';
  readonly reason: SkipReason;
  /**
   * May come before the document title without stopping it from being the title: comments,
   * targets, substitution definitions, markup the reference parser reports as an error.
   */
  readonly preamble?: boolean;
}

export type Block = TitleBlock | ParagraphBlock | ListBlock | DefinitionListBlock | ContainerBlock | TableBlock | SkipBlock;

export interface ParseSettings {
  readonly includeTables: boolean;
  readonly includeFootnotes: boolean;
}
