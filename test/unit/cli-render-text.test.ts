import assert from 'node:assert/strict';
import { summarize, type StandAloneWarning, type Summary } from '../../src/core/index';
import { renderText } from '../../src/cli/render-summary';

const plain = { bold: (t: string) => t, dim: (t: string) => t, accent: (t: string) => t, warn: (t: string) => t };

describe('CLI text rendering', () => {
  it('names a context line once when two context sentences share it', () => {
    // Invented demo text: the first two sentences share line 3.
    const text = '# Pier schedule\n\nThe east pier closes at night. The west pier stays open.\n\nBecause of this, crews on the late crossing dock at the west pier and walk riders to the bus stop.\n';
    const summary = summarize(text, { budget: { unit: 'sentences', value: 3 } });
    const [first, second] = summary.document.sentences;
    assert.ok(first && second, 'the demo text has two sentences on line 3');
    const last = summary.document.sentences.length - 1;
    const warning: StandAloneWarning = {
      sentence: last,
      trigger: 'connective' as StandAloneWarning['trigger'],
      words: 'Because of this',
      span: summary.document.sentences[last]!.span,
      context: [0, 1],
      message: '“Because of this” points back to text the summary leaves out.',
      repairs: [],
    };
    const out = renderText('pier.md', { ...summary, warnings: [warning] } as Summary, plain);
    const line = out.split('\n').find((l) => l.includes('context at'));
    assert.ok(line, out);
    assert.match(line, /context at line 3$/);
  });
});
