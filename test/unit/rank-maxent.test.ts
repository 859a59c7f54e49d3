/**
 * The maximum-entropy ranker (Osborne 2002): its features, its model file and its scores. The
 * scoring rule is the published one (log-odds b + Σ w·x, worked by hand below); the fitting is
 * checked against outside results in rank-logistic-regression.test.ts.
 */
import assert from 'node:assert/strict';
import { analyze } from '../../src/core/analyze';
import { parseDocument } from '../../src/core/formats/registry';
import { resolveOptions } from '../../src/core/options/resolve';
import { CONTINUOUS_NAMES, MAXENT_FEATURES, maxentFeatures } from '../../src/core/rank/trained/maxent-features';
import { defaultMaxentModel, rankMaxent, validateMaxentModel } from '../../src/core/rank/trained/maxent-model';
import { ModelError } from '../../src/core/rank/trained/model-checks';
import { defaultModel, MODEL_LIMITS } from '../../src/core/rank/trained/model';
import { firstContentSection, intentCue, isLinkOnly, isPlaceholder } from '../../src/core/rank/trained/sentence-cues';
import { loadModel, modelMismatch } from '../../src/core/rank/trained/sentence-model';
import { exampleFromDocument, trainMaxentModel, type TrainingExample } from '../../src/core/rank/trained/train-model';
import { summarize } from '../../src/core/summarize';

// Invented proposal (a community orchard's watering rota).
const PROPOSAL = `# Watering rota for the orchard

## Status

Draft.

## Motivation

This proposal adds a weekly watering rota so that young trees get water during dry summers.
Last summer four young apple trees died because nobody watered them in August.

## Design

Each member signs up for one evening a month on a shared sheet.
A reminder goes out the day before.

## Open questions

None.

See https://orchard.example/rota for the sheet.
`;

const analyzed = () => {
  const doc = parseDocument(PROPOSAL, { format: 'markdown' });
  return analyze(doc, 'en');
};

const sentenceIndex = (pattern: RegExp) => analyzed().doc.sentences.findIndex((s) => pattern.test(s.text));

describe('rank: maximum-entropy features', () => {
  it('gives every sentence a value within each feature’s arity, with a description per value', () => {
    const a = analyzed();
    const m = maxentFeatures(a);
    for (const feature of MAXENT_FEATURES) {
      assert.equal(feature.values.length, feature.arity, feature.name);
      assert.equal(m[feature.name]!.length, a.doc.sentences.length, feature.name);
      // A continuous feature holds a score scaled to [0, 1]; the others a value index.
      if (CONTINUOUS_NAMES.has(feature.name)) assert.ok(m[feature.name]!.every((v) => v >= 0 && v <= 1), feature.name);
      else assert.ok(m[feature.name]!.every((v) => Number.isInteger(v) && v < feature.arity), feature.name);
    }
  });

  it('finds intent cues, placeholders, pointers and the first content section', () => {
    const a = analyzed();
    const m = maxentFeatures(a);
    const adds = sentenceIndex(/This proposal adds/);
    const none = sentenceIndex(/^None\.$/);
    const see = sentenceIndex(/^See /);
    assert.equal(m.intentCue![adds], 1, '"This proposal adds" opens the sentence');
    assert.equal(m.placeholder![none], 1);
    assert.equal(m.linkOnly![see], 1);
    // "Status" holds one short line: the first content section is Motivation.
    const motivation = a.doc.sections.findIndex((s) => s.heading === 'Motivation');
    assert.equal(firstContentSection(a), motivation);
    assert.equal(m.firstContentSection![adds], 1);
    assert.equal(m.firstContentSection![sentenceIndex(/^Draft/)], 0);
    assert.equal(m.sectionClass![adds], 1 + ['abstract', 'introduction'].indexOf('introduction'));
    assert.equal(intentCue(['the', 'trees', 'we', 'propose', 'to', 'plant', 'are', 'apples']), 1);
    assert.equal(intentCue(['in', 'the', 'long', 'run', 'after', 'the', 'winter', 'we', 'propose', 'pears']), 2);
    assert.equal(intentCue(['trees', 'need', 'water']), 0);
    for (const text of ['N/A', 'TBD.', 'Etc.', 'None so far.']) assert.ok(isPlaceholder(text), text);
    assert.ok(!isPlaceholder('None of the trees survived.'));
    assert.ok(isLinkOnly('https://orchard.example/rota', []));
    assert.ok(!isLinkOnly('The sheet at https://orchard.example/rota lists every evening of the month.', ['the', 'sheet', 'at', 'lists', 'every', 'evening', 'of', 'the', 'month']));
  });
});

describe('rank: the maximum-entropy model file and scores', () => {
  const model = {
    format: 'tersely-sentence-model',
    version: 1,
    kind: 'maximum-entropy',
    regularization: 1,
    bias: -2,
    weights: { placeholder: [0.5, -3], intentCue: [0, 1.25, 0.25] },
  };

  it('scores a sentence by its log-odds b + Σ w (by hand)', () => {
    const a = analyzed();
    const ranked = rankMaxent(a, validateMaxentModel(model));
    // "This proposal adds…": not a placeholder (+0.5), intent cue first (+1.25): −2 + 0.5 + 1.25.
    assert.equal(ranked.scores[sentenceIndex(/This proposal adds/)], -0.25);
    // "None.": placeholder (−3), no cue (0): −2 − 3.
    assert.equal(ranked.scores[sentenceIndex(/^None\.$/)], -5);
    // Each feature's share is given against the document's average sentence (explain.ts), so the
    // shares of a sentence add up to its score minus the mean score (Lundberg & Lee 2017, linear models; from memory).
    const i = sentenceIndex(/This proposal adds/);
    const mean = (values: ArrayLike<number>) => Array.from(values).reduce((x, y) => x + y, 0) / values.length;
    const raw = Array.from(ranked.featureValues!.bins['intentCue']!, (value) => model.weights.intentCue[value]!);
    assert.equal(raw[i], 1.25);
    assert.ok(Math.abs(ranked.features!.intentCue![i]! - (1.25 - mean(raw))) < 1e-12);
    const shares = Object.values(ranked.features!).reduce((sum, column) => sum + column[i]!, 0);
    assert.ok(Math.abs(shares - (ranked.scores[i]! - mean(ranked.scores))) < 1e-9, `${shares} vs ${ranked.scores[i]! - mean(ranked.scores)}`);
    for (const column of Object.values(ranked.features!)) assert.ok(Math.abs(mean(column)) < 1e-9);
  });

  it('refuses malformed models, naming what is wrong', () => {
    const cases: [Record<string, unknown>, RegExp][] = [
      [{ ...model, bias: Number.NaN }, /"bias" must be a number/],
      [{ ...model, bias: MODEL_LIMITS.maxWeight * 2 }, /"bias" must be a number from −1000 to 1000/],
      [{ ...model, weights: { placeholder: [1] } }, /weights.placeholder has 1 weights; this version of the feature has 2/],
      [{ ...model, weights: { colour: [1, 2] } }, /unknown feature "colour"/],
      [{ ...model, weights: {} }, /no features/],
      [{ ...model, weights: { placeholder: [0, '1'] } }, /weights.placeholder\[1\] must be a number/],
      [{ ...model, regularization: -1 }, /"regularization" must be a number from 0/],
      [{ ...model, extra: 1 }, /unknown field "extra"/],
    ];
    for (const [json, message] of cases) {
      assert.throws(() => validateMaxentModel(json), (e: unknown) => e instanceof ModelError && message.test(e.message), String(message));
      assert.equal(loadModel(json).ok, false);
    }
    assert.equal(loadModel(model).ok, true);
  });

  it('is refused, with the reason, by a method that needs the other kind of model', () => {
    const maxent = validateMaxentModel(model);
    assert.match(modelMismatch('bayes', maxent)!, /needs a naive Bayes model .*this file holds a maximum-entropy model/);
    assert.match(modelMismatch('maxent', defaultModel())!, /needs a maximum-entropy model/);
    assert.equal(modelMismatch('lexrank', maxent), null);
    assert.throws(() => resolveOptions({ method: 'blend', model }), /model: the "blend" method needs a naive Bayes model/);
    const summary = summarize(PROPOSAL, { method: 'maxent', model, budget: { unit: 'sentences', value: 1 } });
    assert.equal(summary.sentences.length, 1);
  });

  it('ships a model that validates, records how it was made, and stays within the limits', () => {
    const shipped = defaultMaxentModel();
    assert.equal(shipped.kind, 'maximum-entropy');
    assert.match(String(shipped.trainedOn?.command), /^tersely train --files bench\/training-files.txt --kind maximum-entropy .*--out media\/models\/maxent-model.json/);
    assert.deepEqual(Object.keys(shipped.weights), MAXENT_FEATURES.map((f) => f.name));
    assert.ok(JSON.stringify(shipped).length < MODEL_LIMITS.maxFileBytes);
    // A placeholder answer and a long-winded sentence count against a sentence in the shipped model.
    assert.ok(shipped.weights.placeholder![1]! < shipped.weights.placeholder![0]!);
  });

  it('trains on documents with their summaries (a sentence like the summary ranks first)', () => {
    const docs = ['a drill', 'a ladder', 'a saw', 'a hammer', 'a sander'].map((tool) =>
      exampleFromDocument(
        `# Lending ${tool}\n\n## Summary\n\nThe library will lend ${tool} to members for a week.\n\n## Motivation\n\nThis proposal lets the library lend ${tool} to members for a week at a time.\nMembers asked for ${tool} last spring.\nThe shed is small.\nStorage costs nothing extra.\n`,
        { referenceHeading: 'Summary', language: 'en' },
      ),
    ) as TrainingExample[];
    const trained = trainMaxentModel(docs, { regularization: 0.1 });
    const ranked = rankMaxent(docs[0]!.analyzed, trained);
    const best = ranked.scores.indexOf(Math.max(...ranked.scores));
    assert.match(docs[0]!.analyzed.doc.sentences[best]!.text, /^This proposal lets the library lend/);
    assert.throws(() => trainMaxentModel([]), /nothing to learn from/);
  });
});
