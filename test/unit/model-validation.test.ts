/**
 * A sentence model file is data from outside: validation reads own properties only, refuses
 * anything it does not know, and keeps every number a finite count within MODEL_LIMITS, so a
 * model can never make a score NaN or Infinity or reach Object.prototype.
 */
import assert from 'node:assert/strict';
import { statSync } from 'node:fs';
import defaultModelJson from '../../media/models/default-model.json';
import { analyze } from '../../src/core/analyze';
import { parseDocument } from '../../src/core/formats/registry';
import { OptionsError } from '../../src/core/options/resolve';
import { MODEL_LIMITS, ModelError, rankBayes, validateModel } from '../../src/core/rank/trained/model';
import { loadModel } from '../../src/core/rank/trained/sentence-model';
import { summarize } from '../../src/core/summarize';

type Json = Record<string, unknown>;
/** A fresh copy of the shipped model, as JSON.parse makes it. */
const base = (): Json => JSON.parse(JSON.stringify(defaultModelJson)) as Json;
const features = (model: Json) => model.features as Record<string, { positive: number[]; negative: number[] }>;

function refusal(model: unknown): string {
  try {
    validateModel(model);
  } catch (error) {
    assert.ok(error instanceof ModelError, String(error));
    return error.message;
  }
  assert.fail('the model was accepted');
}

describe('sentence model validation', () => {
  it('accepts the shipped model, under the file-size cap', () => {
    assert.equal(validateModel(base()).kind, 'naive-bayes');
    // 1,979 bytes: the cap leaves more than a hundred times that for provenance.
    assert.ok(statSync('media/models/default-model.json').size * 100 < MODEL_LIMITS.maxFileBytes);
  });

  it('refuses a feature named __proto__, constructor or toString (JSON.parse makes them own properties)', () => {
    for (const name of ['__proto__', 'constructor', 'toString', 'hasOwnProperty']) {
      const text = JSON.stringify(base()).replace('"features":{', `"features":{"${name}":{"positive":[1],"negative":[1]},`);
      const model = JSON.parse(text) as unknown;
      assert.match(refusal(model), new RegExp(`^unknown feature "${name}"; known features: length, `));
    }
  });

  it('reads only own properties: a model whose fields come from its prototype is refused', () => {
    const inherited = Object.create(base()) as Json;
    assert.match(refusal(inherited), /a model file must hold a JSON object/);
    const classes = Object.create({ positive: 867, negative: 27034 }) as Json;
    assert.match(refusal({ ...base(), classes }), /"classes" must give the positive and negative sentence counts/);
  });

  it('refuses counts that are not finite whole numbers within bounds (1e308, Infinity, 2.5, -1, "7")', () => {
    for (const bad of [1e308, 2 ** 53, 2.5, -1, '7', null]) {
      const model = base();
      (model.classes as Json).positive = bad;
      assert.match(refusal(model), /"classes\.positive" must be a whole number from 1 to 9007199254740991/);
      const counts = base();
      features(counts).length!.positive[0] = bad as number;
      assert.match(refusal(counts), /features\.length\.positive\[0\] must be a whole number from 0 to 9007199254740991/);
    }
    // JSON has no Infinity; a program may still pass one.
    const infinite = base();
    (infinite.classes as Json).negative = Infinity;
    assert.match(refusal(infinite), /"classes\.negative" must be a whole number/);
  });

  it('refuses class counts whose sum leaves the exact range, and lists that do not sum to their class', () => {
    const huge = base();
    (huge.classes as Json).positive = MODEL_LIMITS.maxCount;
    assert.match(refusal(huge), /the class counts add up to more than 9007199254740991/);
    const off = base();
    features(off).cue!.negative[0]! += 1;
    const negatives = (off.classes as Json).negative as number;
    assert.match(refusal(off), new RegExp(`features\\.cue\\.negative sums to ${negatives + 1}, but classes\\.negative is ${negatives}`));
  });

  it('refuses smoothing outside (0, 1,000,000], a wrong version or kind, and unknown fields', () => {
    for (const smoothing of [0, -1, 1e7, Number.NaN, '1']) assert.match(refusal({ ...base(), smoothing }), /"smoothing" must be a number above 0 and at most 1,000,000/);
    assert.match(refusal({ ...base(), version: 7 }), /model version 7 is not supported \(expected 1\)/);
    assert.match(refusal({ ...base(), kind: 'maximum-entropy' }), /model kind "maximum-entropy" is not supported/);
    assert.match(refusal({ ...base(), extra: true }), /the model has an unknown field "extra"/);
    assert.match(refusal({ ...base(), classes: { positive: 867, negative: 27034, neutral: 1 } }), /"classes" has an unknown field "neutral"/);
    const entry = base();
    (features(entry).cue as Json).neutral = [1, 2, 3];
    assert.match(refusal(entry), /features\.cue has an unknown field "neutral"/);
    assert.match(refusal({ ...base(), trainedOn: 'yesterday' }), /"trainedOn" must be an object/);
  });

  it('a model at the bounds still scores every sentence with a finite number', () => {
    const big = base();
    const { positive, negative } = big.classes as { positive: number; negative: number };
    const scale = Math.floor(MODEL_LIMITS.maxCount / 2 / negative);
    (big.classes as Json).positive = positive * scale;
    (big.classes as Json).negative = negative * scale;
    for (const counts of Object.values(features(big))) {
      counts.positive = counts.positive.map((c) => c * scale);
      counts.negative = counts.negative.map((c) => c * scale);
    }
    const model = validateModel(big);
    const doc = parseDocument('# Ferry\n\nThe ferry leaves at nine. Riders wait on the pier. The timetable changes in May.\n', { format: 'markdown' });
    const { scores } = rankBayes(analyze(doc, 'en'), model);
    assert.ok(scores.length === 3 && [...scores].every(Number.isFinite), String([...scores]));
  });

  it('an invalid model is an options error for a summary, never a silent fallback to the built-in one', () => {
    const model = base();
    (model.classes as Json).positive = 1e308;
    assert.equal(loadModel(model).ok, false);
    assert.throws(() => summarize('The ferry leaves at nine. Riders wait on the pier.', { model, method: 'bayes' }), (error: unknown) => {
      assert.ok(error instanceof OptionsError);
      assert.match(error.problems[0]!.reason, /^invalid sentence model: "classes\.positive" must be a whole number/);
      return true;
    });
  });
});
