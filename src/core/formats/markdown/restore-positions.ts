/**
 * Gives back source positions that the GFM autolink-literal transform leaves out.
 *
 * micromark finds most bare URLs while tokenizing, with positions. The ones it cannot see there
 * (for example `[https://example.org]`, a URL inside brackets) are found afterwards by a tree
 * transform that splits the text node and creates new text and link nodes WITHOUT positions.
 * Text without a position cannot be mapped back to the source, so its words would be lost — a
 * whole paragraph can vanish. Each such node lies between its positioned neighbours (or its
 * parent's edges), in order, so aligning its value from where the previous sibling ended
 * recovers its range.
 */
import type { Nodes, Root } from 'mdast';
import type { Point, Position } from 'unist';
import { alignValue } from './source-align';

/** Fills in missing positions below `tree`; `text` is the string the tree was parsed from. */
export function restoreMissingPositions(tree: Root, text: string): void {
  const points = new PointFactory(text);
  const visit = (parent: Nodes, from: number, to: number): void => {
    if (!('children' in parent)) return;
    const children = parent.children as Nodes[];
    // Where the next positioned sibling starts, for each child (its search must stop there).
    const limits = new Array<number>(children.length);
    let nextStart = to;
    for (let i = children.length - 1; i >= 0; i--) {
      limits[i] = nextStart;
      nextStart = children[i]!.position?.start.offset ?? nextStart;
    }
    let cursor = from;
    children.forEach((child, i) => {
      if (child.position?.start.offset !== undefined && child.position.end.offset !== undefined) {
        visit(child, child.position.start.offset, child.position.end.offset);
        cursor = child.position.end.offset;
        return;
      }
      const range = locate(child, cursor, Math.max(cursor, limits[i]!));
      child.position = { start: points.at(range.start), end: points.at(range.end) } satisfies Position;
      cursor = range.end;
    });
  };

  /** The source range of a node without a position, searched in `[from, to)`. */
  const locate = (node: Nodes, from: number, to: number): { start: number; end: number } => {
    if ('value' in node && typeof node.value === 'string' && node.value.length > 0 && !('children' in node)) {
      const { starts, ends } = alignValue(node.value, text, from, to);
      return { start: starts[0]!, end: Math.max(starts[0]!, ends[ends.length - 1]!) };
    }
    if ('children' in node && node.children.length > 0) {
      visit(node, from, to);
      const children = node.children as Nodes[];
      return { start: children[0]!.position!.start.offset!, end: children[children.length - 1]!.position!.end.offset! };
    }
    return { start: from, end: from };
  };

  const { position } = tree;
  visit(tree, position?.start.offset ?? 0, position?.end.offset ?? text.length);
}

/** Line and column for an offset (1-based, as mdast counts them), from a table of line starts. */
class PointFactory {
  private lineStarts: number[] | null = null;

  constructor(private readonly text: string) {}

  at(offset: number): Point {
    const starts = (this.lineStarts ??= this.findLineStarts());
    let low = 0;
    let high = starts.length - 1;
    while (low < high) {
      const mid = (low + high + 1) >> 1;
      if (starts[mid]! <= offset) low = mid;
      else high = mid - 1;
    }
    return { line: low + 1, column: offset - starts[low]! + 1, offset };
  }

  private findLineStarts(): number[] {
    const starts = [0];
    for (let i = 0; i < this.text.length; i++) {
      const c = this.text.charCodeAt(i);
      if (c === 10 || (c === 13 && this.text.charCodeAt(i + 1) !== 10)) starts.push(i + 1);
    }
    return starts;
  }
}
