import assert from 'node:assert/strict';
import fc from 'fast-check';
import { fromMarkdown } from 'mdast-util-from-markdown';
import type { Node as MdNode, Parent } from 'mdast';
import { LineIndex } from '../../src/core/index';
import { checkedSpan, spanAt } from '../../src/extension/ranges';

/** Reference conversion from the ECMAScript string methods: split on the three line breaks the editor knows. */
function naivePosition(text: string, offset: number): { line: number; character: number } {
  const before = text.slice(0, offset);
  const lines = before.split(/\r\n|\r|\n/);
  return { line: lines.length - 1, character: lines[lines.length - 1]!.length };
}

function walk(node: MdNode, visit: (node: MdNode) => void): void {
  visit(node);
  for (const child of (node as Parent).children ?? []) walk(child, visit);
}

describe('extension ranges: offsets to line/character', () => {
  it('converts offsets on LF, CRLF and lone CR lines', () => {
    const text = 'ab\ncd\r\nef\rgh';
    const index = new LineIndex(text);
    assert.equal(index.lineCount, 4);
    assert.deepEqual(index.positionAt(0), { line: 0, character: 0 });
    assert.deepEqual(index.positionAt(3), { line: 1, character: 0 });
    assert.deepEqual(index.positionAt(5), { line: 1, character: 2 });
    // Inside the CRLF pair the position stays at the end of the line, as in the editor.
    assert.deepEqual(index.positionAt(6), { line: 1, character: 2 });
    assert.deepEqual(index.positionAt(7), { line: 2, character: 0 });
    assert.deepEqual(index.positionAt(10), { line: 3, character: 0 });
    assert.deepEqual(index.positionAt(999), { line: 3, character: 2 });
    assert.deepEqual(index.positionAt(-5), { line: 0, character: 0 });
  });

  it('agrees with micromark/mdast positions (1-based line and column) for every node of a CRLF document', () => {
    // External reference: mdast-util-from-markdown documents points as 1-based line/column with
    // 0-based offsets, and a CRLF counted as one line break (its README, "Position").
    const text = '# Title\r\n\r\nFirst para with *emph*.\r\nSecond line.\r\n\r\n## Part two\r\n\r\n- item one\r\n- item 😀 two\r\n';
    const tree = fromMarkdown(text);
    const index = new LineIndex(text);
    let checked = 0;
    walk(tree, (node) => {
      for (const point of [node.position?.start, node.position?.end]) {
        if (!point || point.offset === undefined) continue;
        assert.deepEqual(index.positionAt(point.offset), { line: point.line - 1, character: point.column - 1 }, `offset ${point.offset}`);
        checked++;
      }
    });
    assert.ok(checked > 20, `checked ${checked} points`);
  });

  it('matches a split-based reference and round-trips for any text (property)', () => {
    const alphabet = fc.constantFrom('a', 'b', ' ', '\n', '\r', '\r\n', '😀', 'é');
    fc.assert(
      fc.property(fc.array(alphabet, { maxLength: 60 }).map((parts) => parts.join('')), fc.nat(), (text, seed) => {
        const index = new LineIndex(text);
        const offset = text.length === 0 ? 0 : seed % (text.length + 1);
        const inCrlf = offset > 0 && text[offset - 1] === '\r' && text[offset] === '\n';
        if (!inCrlf) {
          assert.deepEqual(index.positionAt(offset), naivePosition(text, offset));
          assert.equal(index.offsetAt(index.positionAt(offset)), offset);
        }
      }),
      { numRuns: 2000 },
    );
  });
});

describe('extension ranges: checking spans before showing them', () => {
  it('rejects spans outside the text, empty or reversed, and non-integers', () => {
    const text = 'hello world';
    assert.equal(checkedSpan({ start: -1, end: 3 }, text), null);
    assert.equal(checkedSpan({ start: 3, end: 12 }, text), null);
    assert.equal(checkedSpan({ start: 4, end: 4 }, text), null);
    assert.equal(checkedSpan({ start: 5, end: 2 }, text), null);
    assert.equal(checkedSpan({ start: 1.5, end: 3 }, text), null);
    assert.deepEqual(checkedSpan({ start: 0, end: 5 }, text), { start: 0, end: 5 });
  });

  it('widens a span that would split a surrogate pair', () => {
    const text = 'a😀b😀c'; // each emoji is two UTF-16 code units
    assert.deepEqual(checkedSpan({ start: 2, end: 4 }, text), { start: 1, end: 4 });
    assert.deepEqual(checkedSpan({ start: 3, end: 5 }, text), { start: 3, end: 6 });
  });

  it('finds the span containing an offset (start inclusive, end exclusive)', () => {
    const spans = [
      { start: 0, end: 5 },
      { start: 10, end: 20 },
      { start: 30, end: 31 },
    ];
    assert.equal(spanAt(spans, 0), 0);
    assert.equal(spanAt(spans, 5), -1);
    assert.equal(spanAt(spans, 19), 1);
    assert.equal(spanAt(spans, 30), 2);
    assert.equal(spanAt(spans, 31), -1);
    assert.equal(spanAt([], 3), -1);
  });
});
