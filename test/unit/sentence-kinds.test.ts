/**
 * Sentence kinds (src/core/select/sentence-kinds.ts): what is never picked and what never fills a
 * seat. Outside sources: GitHub's issue-closing keywords (close/closes/closed, fix/fixes/fixed,
 * resolve/resolves/resolved; GitHub Docs "Linking a pull request to an issue", from memory) and
 * git's commit trailers (Signed-off-by, from `git commit --signoff`; Co-authored-by, GitHub Docs;
 * from memory); the placeholder answers of the nova-specs template (../shared/corpus/nova-specs).
 */
import assert from 'node:assert/strict';
import { readdirSync, readFileSync, existsSync } from 'node:fs';
import { join } from 'node:path';
import { parseDocument } from '../../src/core/formats/registry';
import fc from 'fast-check';
import { barredKind, fragmentKind, normalizeSentence, sentenceKinds } from '../../src/core/select/sentence-kinds';
import { wordTokens } from '../../src/core/text/tokens';
import { CORPUS_DIR, corpusFiles } from './helpers/corpus';

const words = (text: string) => wordTokens(text).length;
const barred = (text: string) => barredKind(text, words(text));

describe('sentence kinds: barred outright', () => {
  it('bars every GitHub closing keyword with an issue reference (from memory), and linking lines', () => {
    for (const keyword of ['close', 'closes', 'closed', 'fix', 'fixes', 'fixed', 'resolve', 'resolves', 'resolved']) {
      assert.equal(barred(`${keyword[0]!.toUpperCase()}${keyword.slice(1)} #2231.`), 'boilerplate', keyword);
    }
    for (const line of ['Closes #812.', 'Fixes #2231.', 'Related to #774 and #790.', 'Fixes hollowell/jobs#12, #13', 'See also #4.', 'Part of #100']) {
      assert.equal(barred(line), 'boilerplate', line);
    }
  });

  it('bars commit trailers (git, GitHub; from memory), cc lines and check-list items', () => {
    for (const line of ['Signed-off-by: Ada Quay <ada@ferry.example>', 'Co-authored-by: Bo Pier <bo@ferry.example>', 'cc @dock-team', '/cc @ops', '[ ] Tests added', '[x] Docs updated']) {
      assert.equal(barred(line), 'boilerplate', line);
    }
  });

  it('bars placeholder answers, notes left for later, bylines and metadata lines', () => {
    for (const line of ['N/A', 'TBD', 'None.', 'none', 'To be determined.', 'TODO for the ferry schedule', 'Not applicable.']) assert.equal(barred(line), 'placeholder', line);
    assert.equal(barred('Prepared by the harbour operations group.'), 'byline');
    for (const line of ['Start Date: 2024-03-11', 'Status: accepted', 'Primary assignee: ada']) assert.equal(barred(line), 'metadata', line);
    // A version line in prose (invented demo lines), but not a sentence about what a version does.
    for (const line of ['Report version 1.2, circulated for comment in November.', 'Version 3.', 'Draft version 0.4 (internal).']) assert.equal(barred(line), 'metadata', line);
    for (const line of ['Version 2 adds a late crossing on Fridays.', 'Version 2, with its new fares, starts in May.']) assert.equal(barred(line), null, line);
  });

  it('bars an HTTP request line or a bare path alone: it names an endpoint but says nothing about it', () => {
    // Request methods from RFC 9110 §9 (from memory).
    for (const line of ['GET /docks/{dock_id}', 'POST /v2/ferries/{ferry_id}/action', 'DELETE /berths/7 HTTP/1.1', '/docks/{dock_id}/schedule', 'GET /docks/{dock_id}/detail (Show Dock Details)', 'POST /ferries/{ferry_id}/action (Dock Ferry (dock Action))']) {
      assert.equal(barred(line), 'apiLine', line);
    }
  });

  it('keeps prose that merely mentions an issue, a byline word or a key-value shape', () => {
    for (const line of [
      'A GET /docks/{dock_id} request now returns the berth count as well.',
      'GET requests are cached for a minute.',
      'GET /docks (List Docks) now takes a region filter.',
      'This change fixes the retry storm described in #774 by capping retries per queue.',
      'The schedule was prepared by hand until the planner took over in May.',
      'Status pages will show the new dock hours from the first of the month.',
      'None of the existing queues change behaviour until their owners opt in.',
    ]) {
      assert.equal(barred(line), null, line);
    }
  });

  it('on the nova-specs corpus, bars the template answers "None" it counts (corpus check)', function () {
    const dir = join(process.cwd(), '..', 'shared', 'corpus', 'nova-specs', 'docs');
    if (!existsSync(dir)) this.skip();
    let none = 0;
    let barredNone = 0;
    for (const name of readdirSync(dir).filter((f) => f.endsWith('.rst')).slice(0, 200)) {
      for (const s of parseDocument(readFileSync(join(dir, name), 'utf8'), { format: 'restructuredtext' }).sentences) {
        if (/^none\.?$/i.test(s.text.trim())) {
          none++;
          if (barred(s.text) === 'placeholder') barredNone++;
        }
      }
    }
    assert.ok(none > 50, `${none} "None" answers`);
    assert.equal(barredNone, none);
  });

  it('bars few rust-rfcs sentences (the rules are narrow; corpus check, at most 1%)', function () {
    const files = corpusFiles(CORPUS_DIR).slice(0, 120);
    if (files.length === 0) this.skip();
    let total = 0;
    let hits = 0;
    for (const file of files) {
      for (const s of parseDocument(readFileSync(file, 'utf8'), { format: 'markdown' }).sentences) {
        total++;
        if (barred(s.text) !== null) hits++;
      }
    }
    assert.ok(total > 5_000);
    assert.ok(hits / total <= 0.01, `${hits} of ${total}`);
  });
});

describe('sentence kinds: fragments', () => {
  it('marks six words or fewer, colon lead-ins, link-only text and bare references (issue 11 definition)', () => {
    assert.equal(fragmentKind('The ferry leaves at nine.', 5), 'short');
    assert.equal(fragmentKind('The ferry leaves the north pier at nine sharp.', 9), null);
    assert.equal(fragmentKind('The crew checks three things every morning before the first crossing:', 11), 'leadIn');
    assert.equal(fragmentKind('Rename the dock table to berth_slots in the schedule service, and', 11), 'unfinished');
    assert.equal(fragmentKind('Move the winter timetable to the shared calendar before the first storm;', 12), 'unfinished');
    assert.equal(fragmentKind('The ferry and the bus now share one ticket and one timetable.', 12), null);
    assert.equal(fragmentKind('RFC 1234.', 2), 'bareReference');
    assert.equal(fragmentKind('[3]', 1), 'bareReference');
    assert.equal(fragmentKind('the full timetable for the winter season', 7, '[the full timetable for the winter season](https://ferry.example/t)'), 'linkOnly');
  });

  it('marks a question its paragraph goes on to answer, not one left open (common practice, no source)', () => {
    // Invented demo sentences: a run-in question ("**Why …?** Because …") leads in to its answer.
    const question = 'Why does the night ferry leave from the north pier instead of the harbour?';
    assert.equal(fragmentKind(question, 14, `**${question}**`, { answeredInParagraph: true }), 'answeredQuestion');
    assert.equal(fragmentKind(question, 14, question, { answeredInParagraph: true }), 'answeredQuestion');
    // Alone in its paragraph (an open question), or not a question: prose.
    assert.equal(fragmentKind(question, 14, question), null);
    assert.equal(fragmentKind('The night ferry leaves from the north pier because the harbour is dredged.', 13, undefined, { answeredInParagraph: true }), null);
  });

  it('marks a sentence that only points elsewhere (common practice, no source)', () => {
    // Invented demo sentences; the shape is the "For more information, see …" of product documentation.
    assert.equal(fragmentKind('For more information, see Running the ferry timetable service.', 9), 'pointer');
    assert.equal(fragmentKind('Please refer to the harbour operations guide for the winter schedule.', 11), 'pointer');
    assert.equal(fragmentKind('See the timetable RFC for the rules on late departures.', 10), 'pointer');
    assert.equal(fragmentKind('(See the crew handbook, chapter three.)', 6), 'pointer');
    assert.equal(fragmentKind('Cf. the summer timetable of the north pier ferry.', 9), 'pointer');
    // Prose that merely starts like one, or runs longer than a pointer, stays prose.
    assert.equal(fragmentKind('Seeing the queue grow, the crew opens a second gangway at the north pier.', 14), null);
    assert.equal(fragmentKind('For more information about delays, riders check the board, the app and the text line that the harbour office runs.', 20), null);
  });

  it('normalizes copies to one key', () => {
    assert.equal(normalizeSentence('  The **ferry** leaves at nine.  '), normalizeSentence('the ferry leaves at nine'));
    assert.notEqual(normalizeSentence('The ferry leaves at nine.'), normalizeSentence('The ferry leaves at ten.'));
  });

  // sentenceKinds reuses a sentence's key for its barred check, which keys the trimmed text.
  it('gives a text and its trimmed text the same key', () => {
    const piece = fc.constantFrom(' ', '\t', '\n', '\u00a0', '\u3000', '\ufeff', '*', '`', '_', '~', '-', '(', '.', ',', ':', '?', '#', 'é', 'Σ', 'a', 'N', '7', '\u0301');
    fc.assert(
      fc.property(fc.array(piece, { maxLength: 12 }).map((parts) => parts.join('')), (text) => {
        assert.equal(normalizeSentence(text), normalizeSentence(text.trim()));
      }),
      { numRuns: 2000 },
    );
  });

  it('classifies sentences as barredKind does, one by one', () => {
    const text = ['# Notes', '', 'N/A', '', 'Signed-off-by: Ada <ada@ferry.example>', '', 'TODO: timetable', '', 'The ferry leaves at nine every morning from the north pier.'].join('\n');
    const doc = parseDocument(text, { format: 'markdown' });
    const counts = doc.sentences.map((s) => words(s.text));
    const kinds = sentenceKinds(doc, counts);
    assert.deepEqual(kinds.barred, doc.sentences.map((s, i) => barredKind(s.text, counts[i]!)));
    assert.deepEqual(kinds.barred.slice(0, 3), ['placeholder', 'boilerplate', 'placeholder']);
  });
});
