/**
 * Length presets by reading time, template text (files and learned), and hysteresis.
 * Outside sources: design documents of ../shared/corpus/rust-rfcs (the 16 KB and 84 KB sizes of
 * issue 11) and the nova-specs template's instruction line (../shared/corpus/nova-specs).
 * The reading speed (230 words a minute) is common practice, no source.
 */
import assert from 'node:assert/strict';
import { existsSync, readFileSync, readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { parseLength } from '../../src/core/options/length';
import { validateModel, defaultModel } from '../../src/core/rank/trained/model';
import { defaultMaxentModel, validateMaxentModel } from '../../src/core/rank/trained/maxent-model';
import { AUTO_LENGTH, autoWords, WORDS_PER_MINUTE } from '../../src/core/reading';
import { learnTemplateText } from '../../src/core/select/template-text';
import { parseDocument } from '../../src/core/formats/registry';
import { summarize } from '../../src/core/summarize';
import { CORPUS_DIR, corpusFiles } from './helpers/corpus';

describe('length presets', () => {
  it('reads the named presets and reading times', () => {
    assert.deepEqual(parseLength('tldr'), { ok: true, value: { unit: 'sentences', value: 3 } });
    assert.deepEqual(parseLength('minute'), { ok: true, value: { unit: 'minutes', value: 1 } });
    assert.deepEqual(parseLength('Detailed'), { ok: true, value: { unit: 'ratio', value: 0.25 } });
    assert.deepEqual(parseLength('auto'), { ok: true, value: { unit: 'auto', value: 0 } });
    assert.deepEqual(parseLength('1.5min'), { ok: true, value: { unit: 'minutes', value: 1.5 } });
    assert.deepEqual(parseLength('2 minutes'), { ok: true, value: { unit: 'minutes', value: 2 } });
    for (const bad of ['0min', '61min', 'brief', 'toString', '__proto__']) assert.equal(parseLength(bad).ok, false, bad);
  });

  it('the default reads in one to two minutes for the 16 KB and 84 KB design documents of the corpus (rust-rfcs)', function () {
    const files = corpusFiles(CORPUS_DIR);
    if (files.length === 0) this.skip();
    const nearest = (bytes: number) => files.reduce((a, b) => (Math.abs(statSync(b).size - bytes) < Math.abs(statSync(a).size - bytes) ? b : a));
    for (const kb of [16, 84]) {
      const file = nearest(kb * 1024);
      const summary = summarize(readFileSync(file, 'utf8'));
      assert.ok(summary.stats.minutesToRead >= 1 && summary.stats.minutesToRead <= 2, `${file}: ${summary.stats.minutesToRead.toFixed(2)} min`);
    }
  });

  it('grows slowly: doubling the document adds a quarter minute, within bounds', () => {
    const at = (minutes: number) => autoWords(minutes * WORDS_PER_MINUTE) / WORDS_PER_MINUTE;
    assert.ok(Math.abs(at(16) - at(8) - AUTO_LENGTH.perDoubling) < 0.01, String(at(16) - at(8)));
    assert.equal(at(100_000), AUTO_LENGTH.maxMinutes);
    assert.ok(autoWords(300) <= 100, 'never more than a third of a short document');
  });

  it('a minute preset gives about 230 words', () => {
    const files = corpusFiles(CORPUS_DIR);
    if (files.length === 0) return;
    const summary = summarize(readFileSync(files[40]!, 'utf8'), { budget: 'minute' });
    assert.ok(summary.stats.wordsOut <= WORDS_PER_MINUTE || summary.stats.sentencesOut <= 3, String(summary.stats.wordsOut));
    assert.ok(summary.stats.wordsOut >= 0.6 * WORDS_PER_MINUTE, String(summary.stats.wordsOut));
  });
});

describe('template text', () => {
  const doc = '# Dock change\n\n## Why\n\nDescribe why this change is needed and who asked for it.\n\nThe north dock floods at spring tide, so boats must tie up at the south pier for two weeks.\n\n## How\n\nExplain how the change was tested before it ships.\n\nThe crew walked the new mooring plan twice at low tide with the harbour master.\n';
  const template = '# Title\n\n## Why\n\nDescribe why this change is needed and who asked for it.\n\n## How\n\nExplain how the change was tested before it ships.\n';

  it('never picks a sentence that occurs in a template passed by the caller', () => {
    const without = summarize(doc, { budget: '100%' });
    assert.ok(without.sentences.some((s) => s.text.startsWith('Describe why')));
    const withTemplate = summarize(doc, { budget: '100%', templates: [template] });
    assert.ok(!withTemplate.sentences.some((s) => s.text.startsWith('Describe why') || s.text.startsWith('Explain how')));
    assert.ok(withTemplate.barred!.filter((b) => b.kind === 'template').length === 2);
  });

  it('never picks the template text a model carries, and a model refuses malformed template text', () => {
    const model = { ...defaultModel(), templateText: ['Describe why this change is needed and who asked for it.'] };
    const summary = summarize(doc, { budget: '100%', method: 'bayes', model });
    assert.ok(!summary.sentences.some((s) => s.text.startsWith('Describe why')));
    const maxent = validateMaxentModel({ ...defaultMaxentModel(), templateText: ['Describe why this change is needed and who asked for it.'] });
    assert.ok(!summarize(doc, { budget: '100%', model: maxent }).sentences.some((s) => s.text.startsWith('Describe why')));
    assert.throws(() => validateMaxentModel({ ...defaultMaxentModel(), templateText: [3] }), /templateText/);
    assert.throws(() => validateModel({ ...defaultModel(), templateText: [3] }), /templateText/);
    assert.throws(() => validateModel({ ...defaultModel(), templateText: 'x' }), /templateText/);
  });

  it('learns a sentence recurring across independent documents, and counts copies of one document once', () => {
    const docs = Array.from({ length: 6 }, (_, k) => parseDocument(`# D${k}\n\nDescribe why this change is needed and who asked for it.\n\nThe pier ${k} gets a new crane for crate ${k * 7} on shift ${k}.\n`, { format: 'markdown' }));
    assert.deepEqual(learnTemplateText(docs), ['Describe why this change is needed and who asked for it.']);
    const copies = Array.from({ length: 6 }, () => parseDocument('# D\n\nThe pier gets a new crane this spring.\n\nThe crane lifts forty crates an hour.\n\nThe crew trains on it in May.\n\nThe old crane goes to the museum.\n', { format: 'markdown' }));
    assert.deepEqual(learnTemplateText(copies), []);
  });

  it('learns the nova-specs template instruction from the corpus (corpus check)', function () {
    const dir = join(process.cwd(), '..', 'shared', 'corpus', 'nova-specs', 'docs');
    if (!existsSync(dir)) this.skip();
    const docs = readdirSync(dir).filter((f) => f.endsWith('.rst')).map((f) => parseDocument(readFileSync(join(dir, f), 'utf8'), { format: 'restructuredtext' }));
    const learned = learnTemplateText(docs);
    assert.ok(learned.includes('Include the URL of your launchpad blueprint:'), learned.slice(0, 10).join(' | '));
  });
});

describe('hysteresis', () => {
  it('keeps previous picks after a one-paragraph insertion unless a new sentence is clearly better (corpus document)', function () {
    const files = corpusFiles(CORPUS_DIR);
    if (files.length === 0) this.skip();
    const text = readFileSync(files[120]!, 'utf8');
    const before = summarize(text, { budget: '6s' });
    const at = text.indexOf('\n\n', Math.floor(text.length / 2));
    const edited = `${text.slice(0, at)}\n\nThe ferry crew also asked for a second gangway so riders with bikes can board at low tide without waiting.${text.slice(at)}`;
    const plain = summarize(edited, { budget: '6s' });
    const kept = summarize(edited, { budget: '6s', previous: before.sentences.map((s) => s.text) });
    const survivors = (s: typeof plain) => before.sentences.filter((b) => s.sentences.some((p) => p.text === b.text)).length;
    assert.ok(survivors(kept) >= survivors(plain));
    assert.ok(survivors(kept) >= 5, `${survivors(kept)} of ${before.sentences.length} kept`);
  });

  it('accepts spans of the previous picks and refuses malformed ones', () => {
    const text = '# Plan\n\nThe night ferry leaves at nine from the north pier. Riders wait on the pier in the rain. The crew checks the engine every morning.\n';
    const first = summarize(text, { budget: '1s' });
    const again = summarize(text, { budget: '1s', previous: [first.sentences[0]!.span] });
    assert.equal(again.sentences[0]!.text, first.sentences[0]!.text);
    assert.throws(() => summarize(text, { previous: [{ start: -1, end: 2 }] }), /previous/);
    assert.throws(() => summarize(text, { previous: 'x' }), /previous/);
  });
});
