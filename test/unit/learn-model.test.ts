import assert from 'node:assert/strict';
import fc from 'fast-check';
import { analyze } from '../../src/core/analyze';
import { FEATURES, rankBins, sentenceFeatures } from '../../src/core/rank/trained/features';
import { labelSentences, termOverlapF1 } from '../../src/core/rank/trained/labels';
import { defaultModel, rankBayes, validateModel, ModelError } from '../../src/core/rank/trained/model';
import { loadModel } from '../../src/core/rank/trained/sentence-model';
import { exampleFromDocument, trainModel, type TrainingExample } from '../../src/core/rank/trained/train-model';
import { parseDocument } from '../../src/core/formats/registry';

// Invented documents (a neighbourhood tool-lending library), each with its own Summary section.
const DOCS = [
  `# Tool library opening hours

## Summary

The tool library will open on Saturday mornings so that members who work weekdays can borrow drills and ladders.

## Motivation

Members who work weekdays cannot reach the tool library during its current opening hours.
Most requests for drills and ladders arrive on weekends, when the shed is closed.
Saturday mornings are when most repairs in the neighbourhood get done.

## Drawbacks

Volunteers would give up part of their weekend.
The shed has no lighting for the early winter months.
`,
  `# Deposit for power tools

## Summary

Borrowers of power tools will leave a small refundable deposit, which pays for blades and batteries that wear out.

## Motivation

Blades and batteries of power tools wear out quickly and the library pays to replace them.
A refundable deposit returns to careful borrowers and pays for blades and batteries otherwise.
Other lending libraries in the region already ask for a deposit.

## Alternatives

A yearly membership fee was considered.
It would charge members who never borrow power tools.
`,
];

function examples(): TrainingExample[] {
  return DOCS.map((text) => exampleFromDocument(text, { referenceHeading: 'Summary', language: 'en' })).filter((e): e is TrainingExample => !('skipped' in e));
}

describe('training examples and labels', () => {
  it('cuts the Summary section out of the body and keeps it as the reference', () => {
    const [first] = examples();
    assert.ok(first);
    assert.equal(first.reference.length, 1);
    assert.match(first.reference[0]!, /open on Saturday mornings/);
    assert.ok(first.analyzed.doc.sentences.every((s) => !/will open on Saturday/.test(s.text)));
  });

  it('says why a document cannot be an example', () => {
    const result = exampleFromDocument('# Notes\n\nJust one paragraph here.\n', { referenceHeading: 'Summary' });
    assert.deepEqual(result, { skipped: 'no "Summary" section' });
  });

  it('term-overlap F1 is computed on clipped counts', () => {
    // 2 shared of 3 and 4 terms: P = 2/3, R = 2/4, F1 = 2PR/(P+R) = 4/7.
    assert.ok(Math.abs(termOverlapF1(['a', 'b', 'c'], ['a', 'b', 'd', 'e']) - 4 / 7) < 1e-12);
    assert.equal(termOverlapF1(['a', 'a'], ['a']), 2 / 3);
    assert.equal(termOverlapF1([], ['a']), 0);
  });

  it('labels the best-matching body sentence of each reference sentence', () => {
    const [first, second] = examples();
    const labels = labelSentences(first!.analyzed, first!.reference);
    const positives = [...labels.keys()].filter((i) => labels[i] === 1).map((i) => first!.analyzed.doc.sentences[i]!.text);
    // The reference speaks of weekday workers, drills and ladders: the first Motivation sentence
    // shares "members", "work", "weekdays", "tool", "library"; the second "drills", "ladders".
    assert.equal(positives.length, 1);
    assert.match(positives[0]!, /Members who work weekdays/);
    const labels2 = labelSentences(second!.analyzed, second!.reference);
    assert.equal([...labels2].filter((l) => l === 1).length, 1);
  });
});

describe('features', () => {
  it('gives every sentence a value within each feature’s arity', () => {
    const [first] = examples();
    const matrix = sentenceFeatures(first!.analyzed);
    for (const feature of FEATURES) {
      const values = matrix[feature.name];
      assert.equal(values.length, first!.analyzed.doc.sentences.length);
      assert.ok(values.every((v) => v < feature.arity), feature.name);
      assert.equal(feature.values.length, feature.arity, feature.name);
    }
    // Kupiec's length cut-off: "It would charge..." has more than 5 words, the heading-free sentences vary.
    const drawbacks = first!.analyzed.doc.sentences.findIndex((s) => /Volunteers would give up/.test(s.text));
    assert.equal(matrix.headingPrior[drawbacks], 0, 'a Drawbacks sentence falls in the lowest prior bin');
  });

  it('bins ranks by share of the document (top 10%, 10-25%, 25-50%, rest)', () => {
    const scores = Float64Array.from([10, 9, 8, 7, 6, 5, 4, 3, 2, 1]);
    assert.deepEqual([...rankBins(scores)], [0, 1, 1, 2, 2, 3, 3, 3, 3, 3]);
  });

  it('ranks a sentence by the number of higher scores, so ties share the better rank', () => {
    // The definition, counted pair by pair, against rankBins on tie-heavy scores (zeros of both signs included).
    const bin = (share: number) => (share < 0.1 ? 0 : share < 0.25 ? 1 : share < 0.5 ? 2 : 3);
    fc.assert(
      fc.property(fc.array(fc.constantFrom(0, -0, 0.25, 0.5, 1, 1e-300, 3, -2), { maxLength: 40 }), (values) => {
        const scores = Float64Array.from(values);
        const n = scores.length;
        const expected = [...scores].map((score) => bin(n <= 1 ? 0 : [...scores].filter((other) => other > score).length / n));
        assert.deepEqual([...rankBins(scores)], expected);
      }),
      { numRuns: 500 },
    );
    assert.deepEqual([...rankBins(Float64Array.from([2, 2, 1, 1, 1, 1, 1, 1, 1, 1]))], [0, 0, 1, 1, 1, 1, 1, 1, 1, 1]);
  });
});

describe('model file validation', () => {
  const model = trainModel(examples(), { trainedOn: { command: 'test' } });

  it('trains a model that validates and survives a JSON round trip', () => {
    assert.equal(model.classes.positive, 2);
    const again = validateModel(JSON.parse(JSON.stringify(model)));
    assert.deepEqual(again.features, model.features);
    assert.equal(again.trainedOn?.documents, 2);
  });

  const broken: [string, (m: Record<string, unknown>) => void, RegExp][] = [
    ['wrong format', (m) => (m.format = 'something-else'), /format/],
    ['future version', (m) => (m.version = 2), /version 2/],
    ['zero smoothing', (m) => (m.smoothing = 0), /smoothing/],
    ['no positives', (m) => (m.classes = { positive: 0, negative: 5 }), /classes.positive/],
    ['unknown feature', (m) => ((m.features as Record<string, unknown>).colour = { positive: [1], negative: [1] }), /unknown feature "colour"/],
    ['wrong arity', (m) => ((m.features as Record<string, { positive: number[] }>).length!.positive = [1, 1]), /features.length.positive has 2 counts/],
    ['negative count', (m) => ((m.features as Record<string, { negative: number[] }>).cue!.negative[0] = -1), /features.cue.negative\[0\]/],
    ['counts that do not add up', (m) => ((m.features as Record<string, { positive: number[] }>).ending!.positive[0]! += 1), /sums to/],
  ];
  for (const [name, spoil, message] of broken) {
    it(`refuses a model with ${name}, saying what is wrong`, () => {
      const copy = JSON.parse(JSON.stringify(model)) as Record<string, unknown>;
      spoil(copy);
      assert.throws(() => validateModel(copy), (error: unknown) => error instanceof ModelError && message.test(error.message));
      const loaded = loadModel(copy);
      assert.equal(loaded.ok, false);
      if (!loaded.ok) assert.match(loaded.error, /^invalid sentence model: /);
    });
  }

  it('refuses things that are not models at all', () => {
    for (const value of [null, 42, 'model', [], {}]) assert.equal(loadModel(value).ok, false);
  });

  it('ships a valid default model trained by the project’s own command on the train half', () => {
    const shipped = defaultModel();
    assert.ok(shipped.classes.positive > 100);
    assert.match(String(shipped.trainedOn?.command), /^tersely train \S+ --reference-heading Summary --match /);
  });

  it('ranks a document with a model: one finite score per sentence, contributions per feature', () => {
    const text = DOCS[0]!;
    const analyzed = analyze(parseDocument(text, { format: 'markdown' }), 'en');
    const ranked = rankBayes(analyzed, model);
    assert.equal(ranked.scores.length, analyzed.doc.sentences.length);
    assert.ok([...ranked.scores].every(Number.isFinite));
    assert.ok(ranked.features && 'headingPrior' in ranked.features);
  });
});
