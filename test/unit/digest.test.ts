/**
 * Digests of several documents: centroid and LexRank over a set (Radev et al. 2004; Erkan & Radev
 * 2004), pyramid weighting by the number of sources that express a content unit (Nenkova &
 * Passonneau 2004, "Evaluating content selection in summarization: the pyramid method"), and
 * cross-document near-duplicates shown once.
 */
import assert from 'node:assert/strict';
import { digestDocuments, startDigest, OptionsError, DIGEST_WEIGHTS } from '../../src/core/index';
import { collectDocument } from '../../src/core/digest/collect';
import { crossDocument, nearDuplicate } from '../../src/core/digest/cross-document';
import { cosine } from '../../src/core/vectors';

const doc = (title: string, ...paragraphs: string[]) => `# ${title}\n\n${paragraphs.join('\n\n')}\n`;

const A = doc(
  'Ferry timetable',
  'The night ferry leaves the harbour at ten every evening. Tickets are sold on board by the purser.',
  'Bicycles ride free on the ferry during the summer months. The crossing takes forty minutes in calm weather.',
);
const B = doc(
  'Ferry timetable, revised',
  'The night ferry leaves the harbour at ten every evening. Tickets are now sold at the pier kiosk before boarding.',
  'Dogs on a lead may travel on the outer deck. Late arrivals lose their reserved seat after nine forty.',
);
const C = doc(
  'Harbour cafe',
  'The harbour cafe opens at six for early travellers. It serves soup, bread and hot tea until the last ferry sails.',
  'Prices at the cafe rose last spring after the kitchen was rebuilt. Seating indoors holds thirty guests.',
);

const inputs = [
  { file: 'a.md', text: A, format: 'markdown' as const },
  { file: 'b.md', text: B, format: 'markdown' as const },
  { file: 'c.md', text: C, format: 'markdown' as const },
];

describe('digest of several documents', () => {
  it('shows a cross-document near-duplicate once, with "also in" pointing at the other file and line', () => {
    // Room for every sentence: only the duplicate rule can keep one of the pair out.
    const digest = digestDocuments(inputs, { budget: { unit: 'sentences', value: 12 } });
    const same = digest.sentences.filter((s) => s.text === 'The night ferry leaves the harbour at ten every evening.');
    assert.equal(same.length, 1);
    const other = same[0]!.file === 'a.md' ? 'b.md' : 'a.md';
    assert.deepEqual(same[0]!.alsoIn.map((o) => [o.file, o.line]), [[other, 3]]);
    assert.ok(digest.stats.duplicatesMerged >= 1);
  });

  it('weights shared content by the number of documents that express it (pyramid tier, Nenkova & Passonneau 2004)', () => {
    const pool = inputs.flatMap((input, k) => collectDocument(k, input.file, input.text, { format: 'markdown' }, 8).kept);
    const cross = crossDocument(pool, 3);
    const tierOf = (text: string) => cross.tier[pool.findIndex((s) => s.text === text)];
    // The repeated sentence is expressed by two of the three documents; a sentence of one document by one.
    assert.equal(tierOf('The night ferry leaves the harbour at ten every evening.'), 2);
    assert.equal(tierOf('Prices at the cafe rose last spring after the kitchen was rebuilt.'), 1);
    pool.forEach((_, i) => {
      // Weight (tier − 1) / (D − 1), and the relevance is the stated weighted sum of its parts.
      assert.equal(cross.pyramid[i], (cross.tier[i]! - 1) / 2);
      const expected = DIGEST_WEIGHTS.own * pool[i]!.own + DIGEST_WEIGHTS.pyramid * cross.pyramid[i]! + DIGEST_WEIGHTS.lexrank * cross.lexrank[i]! + DIGEST_WEIGHTS.centroid * cross.centroid[i]!;
      assert.ok(Math.abs(cross.relevance[i]! - expected) < 1e-12);
    });
    // The two copies are one near-duplicate group with one representative.
    const copies = pool.map((s, i) => [s, i] as const).filter(([s]) => s.text.startsWith('The night ferry leaves'));
    assert.equal(copies.length, 2);
    assert.equal(cross.representative[copies[0]![1]], cross.representative[copies[1]![1]]);
  });

  describe('near-duplicates across documents (shapes seen between re-proposed specs; sentences ours)', () => {
    const sentence = (document: number, text: string) => {
      const collected = collectDocument(document, `d${document}.md`, `# T\n\n${text}\n`, { format: 'markdown' }, 8);
      return collected.kept.find((s) => s.text === text) ?? assert.fail(`not kept: ${text}`);
    };
    // Other sentences of the set, so that shared words have an inverse document frequency above zero.
    const others = collectDocument(2, 'c.md', C, { format: 'markdown' }, 8).kept;
    const pairs = (a: string, b: string) => {
      const pool = [sentence(0, a), sentence(1, b), ...others];
      const cross = crossDocument(pool, 3);
      return cross.representative[0] === cross.representative[1];
    };
    it('groups a sentence whose one mechanism word changed between releases', () => {
      assert.ok(pairs('Add a v3[.2] service extension that lets a reader add, remove, and list labels for a parcel.', 'Add a service microrevision that lets a reader add, remove, and list labels for a parcel.'));
    });
    it('groups a sentence whose option name changed', () => {
      assert.ok(pairs('We will add a new routine for counting crates and pallets from the ledger that is read when [legacy]skip_ledger_counting is False.', 'We will add a new routine for counting crates and pallets from the ledger that is read when [stock]count_from_ledger is True.'));
    });
    it('groups a sentence repeated with a clause added', () => {
      assert.ok(pairs('Change the depot routing methods to allow moving of parked trailers.', 'Change the depot routing methods to allow moving of parked trailers and check for the minimum yard version across sites.'));
    });
    it('keeps apart sentences that differ by a negation or a number, and sentences that only share a topic', () => {
      assert.ok(!pairs('The depot accepts trailers from the northern yard at night.', 'The depot no longer accepts trailers from the northern yard at night.'));
      assert.ok(!pairs('The depot keeps 20 trailers in reserve for the harbour shift.', 'The depot keeps 35 trailers in reserve for the harbour shift.'));
      assert.ok(!pairs('Trailers parked at the depot are weighed before loading.', 'The depot schedules its loading crews from a weekly rota kept by the harbour office.'));
    });
    it('never chains two distinct sentences through a middle one (star groups around the most relevant)', () => {
      const pool = [
        sentence(0, 'Change the depot routing methods to allow moving of parked trailers.'),
        sentence(1, 'Change the depot routing methods to allow moving of parked trailers and checking of yard versions.'),
        sentence(2, 'Change the depot routing methods to allow checking of yard versions and weighing of parked trailers at every site.'),
        ...others,
      ];
      const cross = crossDocument(pool, 4);
      const settings = { duplicateThreshold: 0.7, duplicateDice: 0.75 };
      // The middle one is a near-duplicate of each end, the ends are not of each other.
      assert.ok(nearDuplicate(pool[0]!, pool[1]!, 0, settings) && nearDuplicate(pool[1]!, pool[2]!, 0, settings));
      assert.ok(!nearDuplicate(pool[0]!, pool[2]!, 0, settings));
      // Every grouped sentence is a near-duplicate of its group's representative itself, not through another.
      assert.ok(cross.representative.some((r, i) => r !== i), 'something is grouped');
      for (let i = 0; i < pool.length; i++) {
        const r = cross.representative[i]!;
        assert.equal(cross.representative[r], r);
        if (r !== i) assert.ok(nearDuplicate(pool[r]!, pool[i]!, cosine(cross.vectors[r]!, cross.vectors[i]!), settings), `${i} under ${r}`);
      }
    });
  });

  it('ranks by LexRank over the set: a sentence linked to sentences of other documents is more central (Erkan & Radev 2004)', () => {
    const pool = inputs.flatMap((input, k) => collectDocument(k, input.file, input.text, { format: 'markdown' }, 8).kept);
    const cross = crossDocument(pool, 3);
    const of = (text: string) => cross.lexrank[pool.findIndex((s) => s.text === text)]!;
    assert.ok(of('The night ferry leaves the harbour at ten every evening.') > of('Prices at the cafe rose last spring after the kitchen was rebuilt.'));
  });

  it('represents every document when the length allows (Hamilton apportionment with a floor), grouped by document', () => {
    const digest = digestDocuments(inputs, { budget: { unit: 'sentences', value: 3 } });
    assert.equal(digest.sentences.length, 3);
    assert.deepEqual(digest.sentences.map((s) => s.file), ['a.md', 'b.md', 'c.md']);
    assert.equal(digest.stats.documentsRepresented, 3);
    const tight = digestDocuments(inputs, { budget: { unit: 'sentences', value: 2 } });
    assert.equal(tight.sentences.length, 2);
    assert.ok(tight.notices.some((n) => /1 of 3 documents have no sentence of their own/.test(n)), tight.notices.join(' | '));
  });

  it('streams: documents are added one at a time and reported, bad ones are refused with a reason', () => {
    const builder = startDigest({ budget: { unit: 'sentences', value: 4 }, maxChars: 1000 });
    const first = builder.add('a.md', A, 'markdown');
    assert.equal(first.index, 0);
    assert.ok(first.kept > 0);
    const big = builder.add('big.md', 'word '.repeat(400), 'markdown');
    assert.ok(big.refused && /larger|characters/.test(big.refused), big.refused);
    const digest = builder.finish();
    assert.equal(digest.stats.documents, 2);
    assert.equal(digest.stats.documentsRead, 1);
    assert.ok(digest.documents[1]!.refused);
    assert.ok(digest.sentences.every((s) => s.file === 'a.md'));
  });

  it('keeps only the best sentences of each document (bounded memory) and uses a default length of 2 per document', () => {
    const digest = digestDocuments(inputs, { keepPerDocument: 1 });
    // One sentence kept per document; two documents' best may be the same sentence, then shown once with "also in".
    assert.equal(digest.sentences.length + digest.sentences.reduce((n, s) => n + s.alsoIn.length, 0), 3);
    assert.deepEqual(new Set([...digest.sentences.map((s) => s.file), ...digest.sentences.flatMap((s) => s.alsoIn.map((a) => a.file))]), new Set(['a.md', 'b.md', 'c.md']));
    const defaults = digestDocuments(inputs);
    assert.ok(defaults.sentences.length <= 6 && defaults.sentences.length >= 5, String(defaults.sentences.length));
  });

  it('refuses invalid options before reading anything', () => {
    assert.throws(() => startDigest({ keepPerDocument: 0 }), OptionsError);
    assert.throws(() => startDigest({ budget: { unit: 'sentences', value: -1 } }), OptionsError);
  });

  it('is empty with a notice when nothing could be read', () => {
    const digest = digestDocuments([]);
    assert.equal(digest.sentences.length, 0);
    assert.ok(digest.notices.some((n) => /nothing to digest/.test(n)));
  });
});
