import assert from 'node:assert/strict';
import { checkOptions, DEFAULT_OPTIONS, OptionsError, resolveOptions } from '../../src/core/options/resolve';
import { formatLength, LENGTH_BOUNDS, parseLength } from '../../src/core/options/length';
import { integerKind, numberKind, wordListKind } from '../../src/core/options/kinds';
import { SUMMARY_OPTIONS, HOST_OPTIONS, ALL_OPTIONS } from '../../src/core/options/schema';
import { METHOD_NAMES } from '../../src/core/rank/methods';
import { DEFAULT_EXCLUDED_HEADINGS } from '../../src/core/text/headings';

describe('options: the schema and its resolution', () => {
  it('fills in the defaults from the schema', () => {
    assert.deepEqual(resolveOptions({}), DEFAULT_OPTIONS);
    assert.deepEqual(DEFAULT_OPTIONS.budget, { unit: 'auto', value: 0 });
    assert.equal(DEFAULT_OPTIONS.method, 'blend');
    assert.deepEqual(DEFAULT_OPTIONS.excludeHeadings, DEFAULT_EXCLUDED_HEADINGS);
    for (const [key, definition] of Object.entries(SUMMARY_OPTIONS)) {
      assert.deepEqual((DEFAULT_OPTIONS as unknown as Record<string, unknown>)[key], definition.default, key);
      assert.ok(definition.kind.check(definition.default).ok, `${key}: its default passes its own check`);
    }
    for (const [key, definition] of Object.entries(HOST_OPTIONS)) assert.ok(definition.kind.check(definition.default).ok, key);
  });

  it('reports every invalid value with its key and reason instead of clamping or replacing it', () => {
    const { problems } = checkOptions({
      budget: { unit: 'ratio', value: 7 },
      minSentences: -4,
      method: 'nonsense',
      balance: 'yes',
      balanceDepth: 99,
      mmrLambda: Number.NaN,
      language: '../../etc',
      repair: 'always',
      maxChars: 10,
    });
    assert.deepEqual(
      problems.map((p) => p.key),
      ['budget', 'minSentences', 'method', 'balance', 'balanceDepth', 'language', 'repair', 'maxChars', 'mmrLambda'],
    );
    assert.match(problems.find((p) => p.key === 'budget')!.reason, /700%.*outside 1%\.\.100%/);
    assert.match(problems.find((p) => p.key === 'method')!.reason, /expected one of blend, position/);
    assert.throws(() => resolveOptions({ method: 'nonsense' }), (error: unknown) => error instanceof OptionsError && /method: expected one of/.test(error.message));
  });

  it('treats words and phrases as data: strings only, trimmed, repeats dropped, never patterns', () => {
    const ok = resolveOptions({ preferPhrases: ['  key ', 'key', '', '(a+)+$'], excludeHeadings: ['Appendix'] });
    assert.deepEqual(ok.preferPhrases, ['key', '(a+)+$']);
    assert.deepEqual(ok.excludeHeadings, ['Appendix']);
    const { problems } = checkOptions({ preferPhrases: ['key', 3], avoidPhrases: 'not a list', excludeHeadings: ['x'.repeat(500)] });
    assert.deepEqual(problems.map((p) => p.key), ['excludeHeadings', 'preferPhrases', 'avoidPhrases']);
  });

  it('takes a trained model only after validating it', () => {
    const { problems } = checkOptions({ model: { format: 'tersely-sentence-model', version: 99 } });
    assert.equal(problems[0]!.key, 'model');
    assert.match(problems[0]!.reason, /version 99 is not supported/);
  });

  it('offers exactly the registered methods', () => {
    assert.deepEqual(SUMMARY_OPTIONS.method.kind.json.enum, [...METHOD_NAMES]);
  });

  it('gives every surfaced option a unique setting key and flag', () => {
    const settings = ALL_OPTIONS.flatMap(([, d]) => (d.setting ? [d.setting.key] : []));
    assert.equal(new Set(settings).size, settings.length);
    const flags = ALL_OPTIONS.flatMap(([, d]) => (d.cli ? [d.cli.negated ?? d.cli.flag] : []));
    assert.equal(new Set(flags).size, flags.length);
    // A setting key may not be the prefix of another ("length" and "length.x" would collide in settings.json).
    for (const a of settings) for (const b of settings) if (a !== b) assert.ok(!b.startsWith(a + '.'), `${a} / ${b}`);
  });
});

describe('options: value kinds', () => {
  it('reads whole numbers only in decimal digits from the command line', () => {
    const kind = integerKind(1, 100);
    assert.deepEqual(kind.fromText('12'), { ok: true, value: 12 });
    for (const text of ['0x5', '1e2', '5.0', '', ' ', 'five', '101', '0']) assert.equal(kind.fromText(text).ok, false, text);
    assert.equal(kind.check(4.4).ok, false);
  });

  it('reads decimal numbers and refuses the rest', () => {
    const kind = numberKind(0, 1);
    assert.deepEqual(kind.fromText('0.25'), { ok: true, value: 0.25 });
    assert.deepEqual(kind.fromText('.5'), { ok: true, value: 0.5 });
    for (const text of ['1e-1', 'NaN', 'Infinity', '2', '-0.1']) assert.equal(kind.fromText(text).ok, false, text);
  });

  it('bounds word lists', () => {
    const kind = wordListKind(2, 5);
    assert.deepEqual(kind.check(['a', ' b ', 'a']), { ok: true, value: ['a', 'b'] });
    assert.equal(kind.check(['a', 'b', 'c']).ok, false);
    assert.equal(kind.check(['toolong']).ok, false);
  });
});

describe('options: the length grammar', () => {
  it('reads a share, a word count and a sentence count', () => {
    assert.deepEqual(parseLength('15%'), { ok: true, value: { unit: 'ratio', value: 0.15 } });
    assert.deepEqual(parseLength('2.5%'), { ok: true, value: { unit: 'ratio', value: 0.025 } });
    assert.deepEqual(parseLength('120w'), { ok: true, value: { unit: 'words', value: 120 } });
    assert.deepEqual(parseLength('120 words'), { ok: true, value: { unit: 'words', value: 120 } });
    assert.deepEqual(parseLength('6s'), { ok: true, value: { unit: 'sentences', value: 6 } });
    assert.deepEqual(parseLength(' 6 Sentences '), { ok: true, value: { unit: 'sentences', value: 6 } });
  });

  it('refuses malformed and out-of-bounds lengths, saying what it takes', () => {
    for (const text of ['', '15', '0%', '101%', '0s', '1001s', '2.5w', '-3s', 'lots', '15%%', '1e2w']) {
      const parsed = parseLength(text);
      assert.equal(parsed.ok, false, text);
    }
    assert.match((parseLength('lots') as { reason: string }).reason, /15% \(of the words\), 120w \(words\), 6s \(sentences\), 2min \(reading time\) or one of tldr, minute, detailed, auto/);
    assert.equal(LENGTH_BOUNDS.sentences.max, 1000);
  });

  it('writes a budget back in the same grammar', () => {
    for (const text of ['15%', '2.5%', '120w', '6s', '100%']) {
      const parsed = parseLength(text);
      assert.ok(parsed.ok);
      assert.equal(formatLength(parsed.value), text);
    }
  });

  it('accepts the engine’s own budget shape from programs', () => {
    assert.deepEqual(resolveOptions({ budget: { unit: 'sentences', value: 4 } }).budget, { unit: 'sentences', value: 4 });
    assert.deepEqual(resolveOptions({ budget: { unit: 'ratio', value: 0.3 } }).budget, { unit: 'ratio', value: 0.3 });
    assert.equal(checkOptions({ budget: { unit: 'sentences', value: 4.4 } }).problems.length, 1);
    assert.equal(checkOptions({ budget: { unit: 'pages', value: 1 } }).problems.length, 1);
  });
});
