import assert from 'node:assert/strict';
import { readFileSync } from 'node:fs';
import { DEFAULT_OPTIONS, HOST_OPTIONS, METHOD_NAMES, resolveOptions, SUMMARY_OPTIONS } from '../../src/core/index';
import { describeProblem, formatFor, parseSettings, SETTING_KEYS, settingKeyOf, toEngineOptions } from '../../src/extension/settings';

const manifest = JSON.parse(readFileSync(new URL('../../package.json', import.meta.url), 'utf8'));
const properties: Record<string, { type?: string; default?: unknown; enum?: unknown[]; markdownDescription?: string; maximum?: number }> = manifest.contributes.configuration.properties;

function from(values: Record<string, unknown>) {
  return parseSettings((key) => values[key]);
}

const { model: _model, ...engineDefaults } = DEFAULT_OPTIONS as typeof DEFAULT_OPTIONS & { model?: unknown };

describe('extension settings: read through the option schema', () => {
  it('gives the schema defaults when nothing is set, with no problems', () => {
    const { settings, problems } = from({});
    assert.deepEqual(settings.summary, engineDefaults);
    assert.equal(settings.host.liveDelay, HOST_OPTIONS.liveDelay.default);
    assert.equal(settings.host.modelFile, '');
    assert.equal(settings.host.problemsView, false);
    assert.deepEqual(problems, []);
  });

  it('reads the length grammar of the command line and the panel', () => {
    assert.deepEqual(from({ length: '20%' }).settings.summary.budget, { unit: 'ratio', value: 0.2 });
    assert.deepEqual(from({ length: '120w' }).settings.summary.budget, { unit: 'words', value: 120 });
    assert.deepEqual(from({ length: '6s' }).settings.summary.budget, { unit: 'sentences', value: 6 });
  });

  it('never clamps or guesses: an invalid value is reported with the setting and the reason, and the default is used', () => {
    const { settings, problems } = from({ length: '250%', 'balance.headingDepth': 0, 'live.delay': 1, maxDocumentSize: 50_000_000, method: 'magic', language: 'xx' });
    assert.deepEqual(settings.summary.budget, SUMMARY_OPTIONS.budget.default);
    assert.equal(settings.summary.balanceDepth, SUMMARY_OPTIONS.balanceDepth.default);
    assert.equal(settings.host.liveDelay, HOST_OPTIONS.liveDelay.default);
    assert.equal(settings.summary.maxChars, SUMMARY_OPTIONS.maxChars.default);
    assert.equal(settings.summary.method, 'maxent');
    assert.equal(settings.summary.language, 'auto');
    assert.deepEqual(
      problems.map((p) => p.setting).sort(),
      ['tersely.balance.headingDepth', 'tersely.language', 'tersely.length', 'tersely.live.delay', 'tersely.maxDocumentSize', 'tersely.method'],
    );
    const size = problems.find((p) => p.setting === 'tersely.maxDocumentSize')!;
    assert.match(size.reason, /50000000 is outside 1000\.\.20000000/);
    assert.equal(describeProblem(size), 'The setting tersely.maxDocumentSize is not valid (50000000 is outside 1000..20000000); Tersely uses 3000000 until it is fixed.');
  });

  it('refuses wrong types instead of coercing them', () => {
    const { problems } = from({ 'balance.enabled': 'yes', minSentences: '3', 'phrases.prefer': 'key', excludeHeadings: [42] });
    assert.equal(problems.length, 4);
  });

  it('treats phrase lists as data: trims, drops empties and repeats; never patterns', () => {
    const { settings, problems } = from({ 'phrases.prefer': [' key ', 'key', '', '(a+)+$'] });
    assert.deepEqual(settings.summary.preferPhrases, ['key', '(a+)+$']);
    assert.deepEqual(problems, []);
  });
});

describe('extension settings: to the engine', () => {
  it('passes the schema values on, and an explicit sentence count wins over the minimum', () => {
    const sentences = toEngineOptions(from({ length: '2s' }).settings, 'plaintext', 40);
    assert.deepEqual(sentences.budget, { unit: 'sentences', value: 2 });
    assert.equal(sentences.minSentences, 2);
    assert.equal(sentences.baseOffset, 40);
    assert.equal(sentences.format, 'plaintext');
  });

  it('gives the engine values it accepts unchanged', () => {
    const settings = from({ method: 'lexrank', 'balance.enabled': false, 'balance.headingDepth': 2, 'phrases.avoid': ['perhaps'], language: 'en' }).settings;
    const { format: _f, baseOffset: _b, ...request } = toEngineOptions(settings, 'markdown', 0);
    const resolved = resolveOptions(request);
    assert.deepEqual(resolved.budget, request.budget);
    assert.equal(resolved.method, 'lexrank');
    assert.equal(resolved.balance, false);
    assert.equal(resolved.balanceDepth, 2);
    assert.deepEqual(resolved.avoidPhrases, ['perhaps']);
    assert.equal(resolved.maxChars, settings.summary.maxChars);
  });

  it('asks the format catalog: Markdown editors and .md files shown as plain text are Markdown', () => {
    assert.equal(formatFor('markdown', '/a/notes.txt'), 'markdown');
    assert.equal(formatFor('plaintext', '/a/notes.md'), 'markdown');
    assert.equal(formatFor('plaintext', '/a/notes.txt'), 'plaintext');
    assert.equal(formatFor('restructuredtext', '/a/spec.rst'), 'restructuredtext');
  });
});

describe('extension settings: package.json agrees with the schema', () => {
  it('contributes exactly the keys the code reads, and their defaults parse with no problems', () => {
    assert.deepEqual(Object.keys(properties).sort(), SETTING_KEYS.map((key) => `tersely.${key}`).sort());
    const { settings, problems } = parseSettings((key) => properties[`tersely.${key}`]!.default);
    assert.deepEqual(problems, []);
    assert.deepEqual(settings.summary, engineDefaults);
  });

  it('caps the document size at 20,000,000 characters and restricts it in untrusted workspaces', () => {
    assert.equal(properties['tersely.maxDocumentSize']!.maximum, 20_000_000);
    assert.ok(manifest.capabilities.untrustedWorkspaces.restrictedConfigurations.includes('tersely.maxDocumentSize'));
    assert.equal(settingKeyOf('maxChars'), 'maxDocumentSize');
  });

  it('offers the same methods as the engine', () => {
    assert.deepEqual(properties['tersely.method']!.enum, [...METHOD_NAMES]);
  });
});
