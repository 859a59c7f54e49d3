import assert from 'node:assert/strict';
import { existsSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { ABSTRACT_CHECK_DEFAULTS, checkAbstract } from '../../src/core/check/abstract';
import type { AbstractCheck, AbstractReport } from '../../src/core/check/abstract-report';
import { NO_ABSTRACT_MESSAGE } from '../../src/core/check/abstract-locator';

const demoPath = (name: string) => fileURLToPath(new URL(`../../media/demo/${name}`, import.meta.url));
const demo = (name: string) => readFileSync(demoPath(name), 'utf8');

function expectCheck(report: AbstractReport): AbstractCheck {
  if (!report.ok) assert.fail(`expected a check, got the error: ${report.error}`);
  return report;
}

const headingsOf = (check: AbstractCheck, sections: readonly number[]) =>
  sections.map((s) => check.sections.find((c) => c.section === s)!.heading);

// What media/demo/abstract-check.md was written to contain: its Summary leaves out one body section,
// makes one claim the body never makes, changes one number (310 cancellations → 301) and flips one
// negation (the body: text reminders "reduce missed appointments").
const MISSED_SECTION = 'Patients without a mobile phone';
// Under the one rule a section is covered only when it holds support: the abstract's first sentence
// draws its support from Background alone, so "What we changed" is reported too.
const UNCOVERED = ['What we changed', MISSED_SECTION];
const INVENTED_CLAIM = 'Patient satisfaction scores in the annual survey rose by fifteen points as a result.';
const CHANGED_NUMBER = 1;
const FLIPPED_NEGATION = 4;
const BODY_SECTIONS = ['Background', 'What we changed', 'Results', 'Costs', MISSED_SECTION, 'Next steps'];

describe('check: abstract against body', () => {
  const text = demo('abstract-check.md');
  const check = expectCheck(checkAbstract(text, { format: 'markdown', language: 'en' }));

  it('takes the Summary section as the abstract, with spans into the document', () => {
    assert.equal(check.abstract.origin, 'section');
    assert.equal(check.abstract.heading, 'Summary');
    assert.equal(check.abstract.sentences.length, 6);
    for (const sentence of check.abstract.sentences) {
      assert.ok(sentence.span, 'an in-document abstract sentence has a span');
      const source = text.slice(sentence.span.start, sentence.span.end);
      assert.equal(source.replace(/\s+/g, ' '), sentence.text);
    }
  });

  it('judges every body section and nothing else', () => {
    assert.deepEqual(check.sections.map((s) => s.heading), BODY_SECTIONS);
  });

  it('reports exactly the sections no abstract sentence draws its support from as uncovered', () => {
    assert.deepEqual(headingsOf(check, check.uncoveredSections), UNCOVERED);
  });

  it('reports exactly the invented claim as unsupported, and the changed number and flipped negation as contradicted', () => {
    const unsupported = check.abstract.sentences.filter((s) => s.verdict === 'unsupported').map((s) => s.text);
    assert.deepEqual(unsupported, [INVENTED_CLAIM]);
    assert.deepEqual(check.contradictedSentences, [CHANGED_NUMBER, FLIPPED_NEGATION]);
    assert.deepEqual([...check.unsupportedSentences].sort(), [CHANGED_NUMBER, 3, FLIPPED_NEGATION].sort());
  });

  it('says what the abstract says, what the body says and where, for each finding', () => {
    const [number] = check.abstract.sentences[CHANGED_NUMBER]!.findings;
    assert.equal(number?.kind, 'number');
    assert.equal(number?.abstractSays, '301 appointments');
    assert.equal(number?.bodySays, '310 cancellations');
    assert.equal(text.slice(number!.abstractSpan!.start, number!.abstractSpan!.end).replace(/\s+/g, ' '), '301 appointments');
    assert.equal(text.slice(number!.body!.span.start, number!.body!.span.end), '310 cancellations');
    assert.equal(text.split('\n')[number!.body!.line - 1]!.includes('310 cancellations'), true);
    const [negation] = check.abstract.sentences[FLIPPED_NEGATION]!.findings;
    assert.equal(negation?.kind, 'negation');
    assert.match(negation!.abstractSays, /not reduce/);
    assert.match(negation!.bodySays ?? '', /^reduce missed/);
    assert.match(negation!.message, /^abstract: .*not reduce.* — body, line \d+: reduce missed/);
    // The invented claim is unsupported, and its figure is one the body never writes.
    const [invented] = check.abstract.sentences[3]!.findings;
    assert.equal(invented?.kind, 'number');
    assert.equal(invented?.abstractSays, 'fifteen points');
    assert.equal(invented?.body, null);
    assert.match(invented!.message, /the body never gives 15$/);
    assert.deepEqual(check.findings, [number, invented, negation]);
  });

  it('follows one rule: a section is covered exactly when it holds support of a claim that reached the threshold', () => {
    const supportSections = new Set(
      check.abstract.sentences.filter((s) => s.verdict === 'supported' || s.verdict === 'contradicted').flatMap((s) => s.support.map((p) => p.section)),
    );
    for (const section of check.sections) assert.equal(section.covered, supportSections.has(section.section), section.heading);
    for (const sentence of check.abstract.sentences) {
      assert.equal(sentence.supported, sentence.verdict === 'supported' || sentence.verdict === 'notAClaim');
      if (sentence.verdict === 'supported') assert.ok(sentence.similarity >= check.thresholds.supported);
    }
  });

  it('weighs key content pyramid-style and names what the abstract leaves out', () => {
    const { content } = check;
    assert.ok(content.items.length > 0);
    for (let i = 1; i < content.items.length; i++) assert.ok(content.items[i - 1]!.weight >= content.items[i]!.weight);
    for (const item of content.items) assert.ok(item.weight >= 2 && item.weight === item.sources.length, item.word);
    const covered = content.items.filter((i) => i.covered).reduce((sum, i) => sum + i.weight, 0);
    assert.equal(content.coveredWeight, covered);
    assert.ok(Math.abs(content.share - covered / content.totalWeight) < 1e-12);
    // The demo's abstract uses some of the body's repeated terms and not others.
    assert.ok(content.items.some((i) => i.covered) && content.items.some((i) => !i.covered));
  });

  it('leaves verbs, generic words and placeholder answers out of the key content (common practice, no source)', () => {
    // Invented demo document: every section says "we add" something "new" and answers a template question "None."
    const doc = [
      '# Harbour ferry', '', '## Summary', '', 'The ferry gets a tide-aware timetable.', '',
      '## Timetable', '', 'We add a new tide column to the ferry timetable. Crossings follow the tide tables.', '', '### Security', '', 'None.', '',
      '## Crew', '', 'We add a new shift rota for the ferry crew. The crew keeps its shifts.', '', '### Upgrades', '', 'None.', '',
      '## Passengers', '', 'We add a new notice board for ferry passengers. Passengers see the tide.', '', '### Other effects', '', 'None.', '',
    ].join('\n');
    const words = expectCheck(checkAbstract(doc, { format: 'markdown', language: 'en' })).content.items.map((i) => i.word.toLowerCase());
    assert.ok(words.includes('ferry'), words.join(', '));
    for (const generic of ['add', 'new', 'none']) assert.ok(!words.includes(generic), `${generic} in ${words.join(', ')}`);
  });

  it('lists up to three supporting sentences, best first, pointing into the body', () => {
    for (const sentence of check.abstract.sentences) {
      assert.ok(sentence.support.length <= 3);
      // Combined support is at least as strong as its best sentence alone.
      assert.ok(sentence.similarity >= (sentence.support[0]?.similarity ?? 0) - 1e-12);
      for (let i = 1; i < sentence.support.length; i++) {
        assert.ok(sentence.support[0]!.similarity >= sentence.support[i]!.similarity);
      }
      for (const support of sentence.support) {
        assert.notEqual(support.heading, 'Summary', 'the abstract never supports itself');
        assert.ok(text.slice(support.span.start, support.span.end).length > 0);
      }
    }
    // The costs claim is backed by the costs section.
    const costs = check.abstract.sentences.find((s) => s.text.startsWith('Reminders cost'))!;
    assert.equal(costs.support[0]!.heading, 'Costs');
  });

  it('states its thresholds and keeps every similarity in [0, 1]', () => {
    assert.deepEqual(check.thresholds, ABSTRACT_CHECK_DEFAULTS);
    for (const section of check.sections) assert.ok(section.similarity >= 0 && section.similarity <= 1);
    for (const sentence of check.abstract.sentences) assert.ok(sentence.similarity >= 0 && sentence.similarity <= 1);
  });

  it('compares the abstract with a summary of the same length, in both directions', () => {
    const rouge = check.rouge;
    assert.ok(rouge, check.notices.join('; '));
    assert.equal(rouge.words, check.abstract.words);
    assert.ok(rouge.summary.length > 0);
    // The summary is made from the body: none of its sentences comes from the Summary section.
    const abstractSpan = check.abstract.span!;
    for (const sentence of rouge.summary) {
      assert.ok(sentence.span.end <= abstractSpan.start || sentence.span.start >= abstractSpan.end, sentence.text);
    }
    // ROUGE-N counts the same clipped matches either way round, so precision and recall swap
    // (Lin 2004, §2: recall over the reference's n-grams, precision over the candidate's).
    for (const n of ['rouge1', 'rouge2'] as const) {
      const forward = rouge.abstractAgainstSummary[n];
      const reverse = rouge.summaryAgainstAbstract[n];
      assert.ok(Math.abs(forward.precision - reverse.recall) < 1e-12);
      assert.ok(Math.abs(forward.recall - reverse.precision) < 1e-12);
      assert.ok(Math.abs(forward.f1 - reverse.f1) < 1e-12);
    }
    // Abstract and summary describe the same pilot, so they share words, but the abstract is not a copy.
    assert.ok(rouge.abstractAgainstSummary.rouge1.f1 > 0.2, JSON.stringify(rouge.abstractAgainstSummary));
    assert.ok(rouge.abstractAgainstSummary.rouge1.f1 < 0.9);
  });

  it('is plain data that survives a JSON round trip', () => {
    assert.deepEqual(JSON.parse(JSON.stringify(check)), check);
  });

  it('gives the same verdicts for the abstract supplied as separate text', () => {
    const summaryStart = text.indexOf('## Summary');
    const summaryEnd = text.indexOf('## Background');
    const abstractText = text.slice(summaryStart, summaryEnd).replace('## Summary', '').trim();
    const body = text.slice(0, summaryStart) + text.slice(summaryEnd);
    const separate = expectCheck(checkAbstract(body, { format: 'markdown', language: 'en', abstract: { kind: 'text', text: abstractText } }));
    assert.equal(separate.abstract.origin, 'text');
    assert.equal(separate.abstract.span, null);
    assert.ok(separate.abstract.sentences.every((s) => s.span === null));
    assert.deepEqual(headingsOf(separate, separate.uncoveredSections), UNCOVERED);
    assert.deepEqual(separate.unsupportedSentences, check.unsupportedSentences);
    assert.deepEqual(separate.contradictedSentences, check.contradictedSentences);
    assert.ok(separate.findings.every((f) => f.abstractSpan === null));
    assert.deepEqual(separate.findings.map((f) => f.body === null), check.findings.map((f) => f.body === null));
  });

  it('uses a named heading when asked, and explains a missing one', () => {
    const byName = expectCheck(checkAbstract(text, { format: 'markdown', language: 'en', abstract: { kind: 'heading', heading: 'next steps' } }));
    assert.equal(byName.abstract.heading, 'Next steps');
    assert.ok(!byName.sections.some((s) => s.heading === 'Next steps'));
    const missing = checkAbstract(text, { format: 'markdown', abstract: { kind: 'heading', heading: 'Conclusions' } });
    assert.equal(missing.ok, false);
    assert.match((missing as { error: string }).error, /"Conclusions"/);
  });

  it('returns a clear error when the document has no abstract section', () => {
    const report = checkAbstract(demo('bike-share-rebalancing.md'), { format: 'markdown', language: 'en' });
    assert.deepEqual(report, { ok: false, reason: 'noAbstract', error: NO_ABSTRACT_MESSAGE });
    // Said in words both the editor and the command line can show (each adds how to name an abstract there).
    assert.equal(NO_ABSTRACT_MESSAGE, 'No section headed Summary, Abstract or TL;DR was found, so there is no abstract to check.');
    assert.doesNotMatch(NO_ABSTRACT_MESSAGE, /--/);
  });

  it('prefers a Summary over an Overview, and takes an Overview when it is all there is', () => {
    const doc = (first: string, second: string) =>
      `# Title\n\n## ${first}\n\nThe ferry timetable changes in May.\n\n## ${second}\n\nThe ferry leaves at nine.\n\n## Timetable\n\nFrom May the ferry timetable adds a late crossing at eleven on Fridays and Saturdays, and the early crossing moves to six.\n`;
    const both = expectCheck(checkAbstract(doc('Overview', 'TL;DR'), { format: 'markdown', language: 'en' }));
    assert.equal(both.abstract.heading, 'TL;DR');
    const overviewOnly = expectCheck(checkAbstract(doc('Overview', 'Details'), { format: 'markdown', language: 'en' }));
    assert.equal(overviewOnly.abstract.heading, 'Overview');
  });

  it('finds the underlined plain-text heading "1. Summary" in the field report', () => {
    const report = expectCheck(checkAbstract(demo('field-report.txt'), { format: 'plaintext', language: 'en' }));
    assert.equal(report.abstract.heading, '1. Summary');
    assert.ok(report.sections.length >= 4);
    assert.ok(!report.sections.some((s) => s.heading === '1. Summary'));
  });
});

describe('check: abstract options and edge cases', () => {
  const doc = [
    '# Harbour ferry timetable',
    '',
    '## Summary',
    '',
    'The changes are as follows:',
    '',
    '- The late ferry crossing runs at eleven on Fridays and Saturdays.',
    '- Ticket machines take contactless cards.',
    '',
    '## Timetable',
    '',
    'From May the harbour ferry adds a late crossing at eleven on Fridays and Saturdays. The early crossing moves from half past six to six.',
    '',
    '## Tickets',
    '',
    'Ticket machines on every pier now accept contactless cards. Paper tickets remain on sale at the kiosks near the harbour office.',
    '',
  ].join('\n');
  const run = (extra: object = {}) => expectCheck(checkAbstract(doc, { format: 'markdown', language: 'en', ...extra }));

  it('never flags a lead-in line as an unsupported claim', () => {
    const check = run();
    const leadIn = check.abstract.sentences[0]!;
    assert.equal(leadIn.text, 'The changes are as follows:');
    assert.equal(leadIn.claim, false);
    assert.equal(leadIn.supported, true);
    assert.deepEqual(check.unsupportedSentences, []);
    assert.deepEqual(check.uncoveredSections, []);
  });

  it('does not judge a sentence that only points to a web address, but judges a claim that carries one', () => {
    const abstract = [
      'The new timetable can be seen here: https://ferries.example/timetable',
      'Ferries to the island now leave every twenty minutes instead of every hour (https://ferries.example/notice).',
    ].join('\n\n');
    const check = expectCheck(checkAbstract(doc, { format: 'markdown', language: 'en', abstract: { kind: 'text', text: abstract } }));
    const [pointer, claim] = check.abstract.sentences;
    assert.equal(pointer!.verdict, 'notAClaim');
    assert.match(pointer!.reason, /web address/);
    assert.equal(claim!.claim, true);
    assert.notEqual(claim!.verdict, 'notAClaim');
  });

  it('applies a caller threshold, clamped to [0, 1], to both verdicts at once', () => {
    const strict = run({ thresholds: { supported: 5 } });
    assert.deepEqual(strict.thresholds, { ...ABSTRACT_CHECK_DEFAULTS, supported: 1 });
    assert.deepEqual(headingsOf(strict, strict.uncoveredSections), ['Timetable', 'Tickets']);
    assert.deepEqual(strict.unsupportedSentences, [1, 2]);
    const lax = run({ thresholds: { supported: Number.NaN } });
    assert.equal(lax.thresholds.supported, ABSTRACT_CHECK_DEFAULTS.supported);
  });

  it('marks an abstract sentence that copies the body, with the share of the abstract copied', () => {
    const copied = doc.replace('- Ticket machines take contactless cards.', '- Ticket machines on every pier now accept contactless cards.');
    const check = expectCheck(checkAbstract(copied, { format: 'markdown', language: 'en' }));
    assert.equal(check.abstract.sentences[2]!.copy?.kind, 'verbatim');
    assert.deepEqual(check.copied.sentences, [2]);
    const words = check.abstract.sentences.map((s) => s.text.split(/\s+/).length);
    assert.ok(check.copied.share > 0 && check.copied.share < 1);
    assert.ok(Math.abs(check.copied.share - words[2]! / words.reduce((a, b) => a + b, 0)) < 0.1);
  });

  it('tolerates paraphrase by stems and spelled-out numbers', () => {
    const paraphrased = doc.replace('- The late ferry crossing runs at eleven on Fridays and Saturdays.', '- Late crossings run at 11 on Friday and Saturday.');
    const check = expectCheck(checkAbstract(paraphrased, { format: 'markdown', language: 'en' }));
    assert.equal(check.abstract.sentences[1]!.verdict, 'supported', check.abstract.sentences[1]!.reason);
  });

  it('uses the summary settings: excluded headings are not body', () => {
    const withRefs = doc + '## References\n\nThe harbour ferry timetable archive lists every crossing since the pier opened in the old town.\n';
    const check = expectCheck(checkAbstract(withRefs, { format: 'markdown', language: 'en' }));
    assert.ok(!check.sections.some((s) => s.heading === 'References'));
    const kept = expectCheck(checkAbstract(withRefs, { format: 'markdown', language: 'en', excludeHeadings: [] }));
    assert.ok(kept.sections.some((s) => s.heading === 'References') || kept.unjudgedSections.some((s) => s.heading === 'References'));
    const refused = checkAbstract(withRefs + '\nThe ferry runs late. '.repeat(60), { format: 'markdown', language: 'en', maxChars: 1000 });
    assert.equal(refused.ok, false);
  });

  it('lists sections too short to judge instead of calling them left out', () => {
    const withStub = doc + '## Fares\n\nTo be decided.\n';
    const check = expectCheck(checkAbstract(withStub, { format: 'markdown', language: 'en' }));
    assert.deepEqual(check.unjudgedSections.map((s) => s.heading), ['Fares']);
    assert.ok(!check.sections.some((s) => s.heading === 'Fares'));
  });

  it('says so when there is nothing outside the abstract', () => {
    const report = checkAbstract('# Note\n\n## Summary\n\nThe ferry runs late on Fridays.\n', { format: 'markdown', language: 'en' });
    assert.equal(report.ok, false);
    assert.match((report as { error: string }).error, /no prose outside the abstract/);
  });
});

describe('check: the opening text as the abstract', () => {
  it('checks the introduction before the first heading against the rest (the rst demo)', () => {
    const text = demo('ferry-timetable-planner.rst');
    const check = expectCheck(checkAbstract(text, { format: 'restructuredtext', language: 'en', abstract: { kind: 'opening' } }));
    assert.equal(check.abstract.origin, 'opening');
    assert.equal(check.abstract.heading, null);
    const firstHeading = text.indexOf('Problem description');
    assert.ok(check.abstract.sentences.length >= 3);
    assert.match(check.abstract.sentences[0]!.text, /^The Skerra ferry runs a fixed timetable/);
    // Every abstract sentence comes from before the first section; no section of the body is the opening.
    for (const s of check.abstract.sentences) assert.ok(s.span !== null && s.span.end <= firstHeading, s.text);
    assert.ok(check.sections.length >= 3 && check.sections.every((s) => s.heading !== ''), check.sections.map((s) => s.heading).join(' | '));
    // Tersely's own summary to compare with leaves the opening out, as it leaves out an abstract section.
    assert.ok(check.rouge !== null);
    const opening = new Set(check.abstract.sentences.map((s) => s.text));
    assert.ok(check.rouge!.summary.every((s) => !opening.has(s.text)), 'the comparison summary copies the opening');
  });

  it('looks up what the opening names in the body only, as it does for an abstract section', () => {
    // Invented demo document: the option and the count appear in the opening alone.
    const body = ['## Stations', '', 'The harbour scheme runs 21 docking stations along the quay, each with ten bikes.', 'Riders unlock bikes with the app at any of the stations.', '',
      '## Operations', '', 'Vans move bikes between the stations twice a day, and the crew checks every dock each morning.', 'The crew logs every repair in the harbour maintenance sheet.', ''];
    const claim = 'The harbour scheme runs 12 docking stations along the quay and uses the --night-mode option.';
    const findingsOf = (check: AbstractCheck) => check.findings.map((f) => f.message).join(' | ');
    const asSection = expectCheck(checkAbstract(['# Harbour bikes', '', '## Summary', '', claim, '', ...body].join('\n'), { format: 'markdown', language: 'en' }));
    const asOpening = expectCheck(checkAbstract(['# Harbour bikes', '', claim, '', ...body].join('\n'), { format: 'markdown', language: 'en', abstract: { kind: 'opening' } }));
    assert.match(findingsOf(asSection), /never mentions --night-mode/);
    assert.match(findingsOf(asOpening), /never mentions --night-mode/);
  });

  it('says why when there is no opening text or no heading to end it', () => {
    const noOpening = checkAbstract('# Ferry\n\n## Fares\n\nFares rise in May for every crossing.\n\n## Crew\n\nThe crew works four shifts a week.\n', { format: 'markdown', language: 'en', abstract: { kind: 'opening' } });
    assert.equal(noOpening.ok, false);
    assert.equal((noOpening as { reason: string }).reason, 'emptyAbstract');
    assert.match((noOpening as { error: string }).error, /no text before its first section heading/);
    const noHeadings = checkAbstract('The ferry runs late on Fridays. The crew works four shifts a week.\n', { format: 'markdown', language: 'en', abstract: { kind: 'opening' } });
    assert.equal(noHeadings.ok, false);
    assert.match((noHeadings as { error: string }).error, /no section headings/);
  });
});

// Rust RFCs (MIT/Apache-2.0, /work/shared/corpus) open with a "Summary" written by their authors:
// real abstracts by other people. These are the first five (by number) whose Summary has three
// sentences or more; a one-sentence abstract is not meant to cover a whole RFC.
const CORPUS = '/work/shared/corpus/rust-rfcs/docs';
const CORPUS_DOCS = [
  '0008-new-intrinsics.md',
  '0019-opt-in-builtin-traits.md',
  '0034-bounded-type-parameters.md',
  '0042-regexps.md',
  '0048-traits.md',
];

describe('check: abstract on corpus documents', function () {
  before(function () {
    if (!existsSync(CORPUS)) this.skip();
  });

  it('never throws, and covers most sections that visibly restate an abstract sentence', () => {
    let clear = 0;
    let clearCovered = 0;
    for (const name of CORPUS_DOCS) {
      const text = readFileSync(`${CORPUS}/${name}`, 'utf8');
      const report = expectCheck(checkAbstract(text, { format: 'markdown', language: 'en' }));
      assert.equal(report.abstract.heading, 'Summary', name);
      for (const section of report.sections) {
        // "Clear matching text", judged without tf-idf: some sentence of the section repeats at
        // least four distinct words (five letters or longer) of one abstract sentence.
        if (!sharesFourLongWords(text, section.span, report.abstract.sentences.map((s) => s.text))) continue;
        clear++;
        if (section.covered) clearCovered++;
      }
    }
    assert.ok(clear >= 5, `too few clear sections to judge: ${clear}`);
    assert.ok(clearCovered / clear >= 0.75, `${clearCovered} of ${clear} clearly matching sections covered`);
  });
});

function sharesFourLongWords(text: string, span: { start: number; end: number }, abstract: readonly string[]): boolean {
  const longWords = (s: string) => new Set((s.toLowerCase().match(/\p{L}{5,}/gu) ?? []));
  const sentences = text.slice(span.start, span.end).split(/(?<=[.!?])\s+/u);
  return abstract.some((a) => {
    const wanted = longWords(a);
    return sentences.some((s) => [...longWords(s)].filter((w) => wanted.has(w)).length >= 4);
  });
}
