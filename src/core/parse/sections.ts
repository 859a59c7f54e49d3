/**
 * Builds the section tree from headings met in document order.
 *
 * Section 0 is the root (depth 0). A heading opens a section whose parent is the nearest open
 * section of smaller depth; its span runs to the next heading of the same or smaller depth.
 */

import type { Section, Span } from '../types';

interface OpenSection {
  index: number;
  heading: string;
  depth: number;
  headingSpan: Span | null;
  start: number;
  end: number;
  parent: number | null;
}

export class SectionTreeBuilder {
  private readonly sections: OpenSection[];
  /** Path from the root to the current section (indices), by increasing depth. */
  private readonly stack: number[] = [0];

  constructor(private readonly documentSpan: Span) {
    this.sections = [
      { index: 0, heading: '', depth: 0, headingSpan: null, start: documentSpan.start, end: documentSpan.end, parent: null },
    ];
  }

  /** The section new content belongs to. */
  get current(): number {
    return this.stack[this.stack.length - 1]!;
  }

  /** Opens a section for a heading of `depth` (1-6) and returns its index. */
  addHeading(heading: string, depth: number, headingSpan: Span): number {
    while (this.sections[this.current]!.depth >= depth) {
      const closed = this.stack.pop()!;
      this.sections[closed]!.end = headingSpan.start;
    }
    const index = this.sections.length;
    this.sections.push({
      index,
      heading,
      depth,
      headingSpan,
      start: headingSpan.start,
      end: this.documentSpan.end,
      parent: this.current,
    });
    this.stack.push(index);
    return index;
  }

  build(): Section[] {
    return this.sections.map((s) => ({
      index: s.index,
      heading: s.heading,
      depth: s.depth,
      headingSpan: s.headingSpan,
      span: { start: s.start, end: s.end },
      parent: s.parent,
    }));
  }
}
