import assert from 'node:assert/strict';
import { readFileSync } from 'node:fs';
import { METHOD_NAMES as METHODS, resolveOptions } from '../../src/core/index';
import { DEFAULT_SETTINGS, METHOD_NAMES, SETTING_KEYS, formatFor, parseSettings, toEngineOptions, type SettingKey } from '../../src/extension/settings';

const manifest = JSON.parse(readFileSync(new URL('../../package.json', import.meta.url), 'utf8'));
const properties: Record<string, { type?: string; default?: unknown; enum?: unknown[]; description?: string; markdownDescription?: string }> =
  manifest.contributes.configuration.properties;

function from(values: Partial<Record<SettingKey, unknown>>) {
  return parseSettings((key) => values[key]);
}

describe('extension settings: parsing', () => {
  it('gives the defaults when nothing is set, with no problems', () => {
    const { settings, problems } = from({});
    assert.deepEqual(settings, DEFAULT_SETTINGS);
    assert.deepEqual(problems, []);
  });

  it('clamps numbers into range and says so', () => {
    const { settings, problems } = from({ 'length.unit': 'percent', 'length.value': 250, 'balance.headingDepth': 0, 'live.delay': 1, maxDocumentSize: 10 });
    assert.equal(settings.length.value, 100);
    assert.equal(settings.balance.depth, 1);
    assert.equal(settings.liveDelayMs, 50);
    assert.equal(settings.maxDocumentSize, 1000);
    assert.equal(problems.length, 4);
  });

  it('rounds counts and keeps the unit bounds per unit', () => {
    assert.equal(from({ 'length.unit': 'sentences', 'length.value': 7.6 }).settings.length.value, 8);
    assert.equal(from({ 'length.unit': 'words', 'length.value': 3 }).settings.length.value, 10);
  });

  it('falls back on wrong types and unknown choices', () => {
    const { settings, problems } = from({ method: 'magic', 'balance.enabled': 'yes', 'length.value': 'ten', language: 'English!', repair: 7 });
    assert.equal(settings.method, DEFAULT_SETTINGS.method);
    assert.equal(settings.balance.enabled, true);
    assert.equal(settings.length.value, DEFAULT_SETTINGS.length.value);
    assert.equal(settings.language, 'auto');
    assert.equal(settings.repair, 'suggest');
    assert.equal(problems.length, 5);
  });

  it('treats word lists as data: trims, drops non-strings and empties, de-duplicates, caps length', () => {
    const long = 'x'.repeat(500);
    const { settings } = from({ 'cueWords.bonus': [' key ', 'key', '', 42, '(a+)+$', long], excludeHeadings: 'References' });
    assert.deepEqual(settings.cueWords.bonus.slice(0, 2), ['key', '(a+)+$']);
    assert.equal(settings.cueWords.bonus[2]!.length, 100);
    assert.deepEqual(settings.excludeHeadings, DEFAULT_SETTINGS.excludeHeadings);
  });

  it('accepts language codes in any case and trims them', () => {
    assert.equal(from({ language: ' DE ' }).settings.language, 'de');
  });
});

describe('extension settings: to the engine', () => {
  it('maps percent to a ratio budget and keeps sentence counts', () => {
    const percent = toEngineOptions(from({ 'length.unit': 'percent', 'length.value': 20 }).settings, 'markdown', 0);
    assert.deepEqual(percent.budget, { unit: 'ratio', value: 0.2 });
    const sentences = toEngineOptions(from({ 'length.unit': 'sentences', 'length.value': 2 }).settings, 'plaintext', 40);
    assert.deepEqual(sentences.budget, { unit: 'sentences', value: 2 });
    // An explicit count below the default minimum wins over the minimum.
    assert.equal(sentences.minSentences, 2);
    assert.equal(sentences.baseOffset, 40);
    assert.equal(sentences.format, 'plaintext');
  });

  it('passes values the engine keeps as they are (nothing is clamped again on the other side)', () => {
    const settings = from({ method: 'lexrank', 'balance.enabled': false, 'balance.headingDepth': 2, 'cueWords.stigma': ['perhaps'], language: 'en' }).settings;
    const request = toEngineOptions(settings, 'markdown', 0);
    const resolved = resolveOptions(request);
    assert.deepEqual(resolved.budget, request.budget);
    assert.equal(resolved.method, 'lexrank');
    assert.equal(resolved.balance, false);
    assert.equal(resolved.balanceDepth, 2);
    assert.deepEqual(resolved.avoidPhrases, ['perhaps']);
    assert.equal(resolved.maxChars, settings.maxDocumentSize);
  });

  it('uses Markdown for Markdown editors and .md files shown as plain text, plain text otherwise', () => {
    assert.equal(formatFor('markdown', '/a/notes.txt'), 'markdown');
    assert.equal(formatFor('plaintext', '/a/notes.md'), 'markdown');
    assert.equal(formatFor('plaintext', '/a/notes.txt'), 'plaintext');
    assert.equal(formatFor('python', '/a/tool.py'), 'plaintext');
  });
});

describe('extension settings: package.json agrees with the code', () => {
  it('contributes exactly the keys the code reads', () => {
    const contributed = Object.keys(properties).sort();
    assert.deepEqual(contributed, SETTING_KEYS.map((key) => `tersely.${key}`).sort());
  });

  it('gives every setting a description, a type and a default, and the defaults parse to DEFAULT_SETTINGS', () => {
    for (const [key, property] of Object.entries(properties)) {
      assert.ok(property.description || property.markdownDescription, `${key} has a description`);
      assert.ok(property.type, `${key} has a type`);
      assert.ok('default' in property, `${key} has a default`);
    }
    const { settings, problems } = parseSettings((key) => properties[`tersely.${key}`]!.default);
    assert.deepEqual(problems, []);
    assert.deepEqual(settings, DEFAULT_SETTINGS);
  });

  it('offers the same methods as the engine', () => {
    assert.deepEqual(properties['tersely.method']!.enum, [...METHOD_NAMES]);
    assert.deepEqual([...METHOD_NAMES].sort(), [...METHODS].sort());
  });
});
