/** How a digest shows in the panel (src/extension/digest-view.ts), built from a real engine digest. */
import assert from 'node:assert/strict';
import { startDigest, type Digest } from '../../src/core/index';
import { digestView, SECTION_SEPARATOR, uniqueNames } from '../../src/extension/digest-view';
import { wordingFor } from '../../src/extension/wording';

// Three invented documents about one lighthouse, one per format; supplies.rst repeats a sentence of keeping.md.
const KEEPING = [
  '# Lighthouse keeping',
  '',
  'The lamp room is cleaned every morning before nine. Oil for the lamp arrives by boat each month.',
  '',
  '## Night watch',
  '',
  'The keeper climbs the tower at dusk to light the lamp. Fog signals sound every thirty seconds in thick weather.',
  '',
  '### Log book',
  '',
  'Every passing ship is written in the log book with its flag.',
  '',
].join('\n');
const SUPPLIES = [
  'Lighthouse supplies',
  '===================',
  '',
  'Oil for the lamp arrives by boat each month. The supply boat also brings bread, letters and spare wicks.',
  '',
  'Storage',
  '-------',
  '',
  'Barrels are stored in the dry cellar below the tower. Each barrel is marked with the date it arrived.',
  '',
].join('\n');
const VISITORS = [
  'VISITOR HOURS',
  '',
  "The tower opens to visitors on summer weekends only. Children under ten must hold an adult's hand on the stairs.",
  '',
  'Guided tours leave from the gate at eleven and at three. The view from the gallery reaches the far islands on clear days.',
  '',
].join('\n');
const SOURCES = [
  { file: 'keeping.md', text: KEEPING, format: 'markdown' as const },
  { file: 'supplies.rst', text: SUPPLIES, format: 'restructuredtext' as const },
  { file: 'visitors.txt', text: VISITORS, format: 'plaintext' as const },
];
const SHARED = 'Oil for the lamp arrives by boat each month.';

function lighthouseDigest(sentences = 20): Digest {
  const builder = startDigest({ budget: { unit: 'sentences', value: sentences } });
  for (const source of SOURCES) builder.add(source.file, source.text, source.format);
  return builder.finish();
}

describe('editor digest: the panel view', () => {
  const digest = lighthouseDigest();
  const view = digestView(digest);

  it('groups by document in the order added, then by section path, every picked sentence once', () => {
    assert.deepEqual(view.panel.documents.map((d) => d.file), ['keeping.md', 'supplies.rst', 'visitors.txt']);
    const keeping = view.panel.documents[0]!;
    // The shared sentence is left out here: supplies.rst stands for it (checked below).
    assert.deepEqual(
      keeping.sections.map((s) => [s.heading, s.lines.map((l) => l.text)]),
      [
        ['', ['The lamp room is cleaned every morning before nine.']],
        [
          'Night watch',
          ['The keeper climbs the tower at dusk to light the lamp.', 'Fog signals sound every thirty seconds in thick weather.'],
        ],
        [`Night watch${SECTION_SEPARATOR}Log book`, ['Every passing ship is written in the log book with its flag.']],
      ],
    );
    const supplies = view.panel.documents[1]!;
    assert.deepEqual(
      supplies.sections.map((s) => [s.heading, s.lines.map((l) => l.text)]),
      [
        ['', [SHARED, 'The supply boat also brings bread, letters and spare wicks.']],
        ['Storage', ['Barrels are stored in the dry cellar below the tower.', 'Each barrel is marked with the date it arrived.']],
      ],
    );
    // The shared sentence is shown once, in the document the digest kept it for.
    const shownShared = view.panel.documents.flatMap((d) => d.sections.flatMap((s) => s.lines)).filter((l) => l.text === SHARED);
    assert.equal(shownShared.length, 1);
    const allLines = view.panel.documents.flatMap((d) => d.sections.flatMap((s) => s.lines.map((l) => l.text)));
    assert.deepEqual(allLines, digest.sentences.map((s) => s.text));
  });

  it('points every line at its own sentence: the right document and the exact span of its text', () => {
    view.panel.documents.forEach((doc, index) => {
      for (const line of doc.sections.flatMap((s) => s.lines)) {
        const place = view.places[line.target]!;
        assert.equal(place.document, index, line.text);
        assert.equal(SOURCES[index]!.text.slice(place.span.start, place.span.end), line.text);
        const sentence = digest.sentences.find((s) => s.document === index && s.text === line.text)!;
        assert.equal(line.line, `line ${sentence.line}`);
      }
    });
  });

  it('points an "also in" link at the copy in the other document, with that file and line', () => {
    const lines = view.panel.documents.flatMap((d, index) => d.sections.flatMap((s) => s.lines.map((l) => ({ ...l, index }))));
    const withLink = lines.filter((l) => l.alsoIn.length > 0);
    assert.equal(withLink.length, 1, 'exactly the repeated sentence has a link');
    const [line] = withLink;
    const [link] = line!.alsoIn;
    const target = view.places[link!.target]!;
    const other = line!.index === 0 ? 1 : 0;
    assert.equal(target.document, other);
    assert.equal(SOURCES[other]!.text.slice(target.span.start, target.span.end), SHARED);
    const lineOfCopy = SOURCES[other]!.text.slice(0, target.span.start).split('\n').length;
    assert.equal(link!.label, `also in: ${SOURCES[other]!.file} line ${lineOfCopy}`);
    assert.notEqual(link!.target, line!.target);
  });

  it('names another file once when it holds several copies: "also in: FILE line N", then "line M"', () => {
    const builder = startDigest({ budget: { unit: 'sentences', value: 6 } });
    // Both notes give the oil sentence twice, so whichever copy is picked, the other file holds two.
    builder.add('keeping.md', KEEPING.replace('Every passing ship', `${SHARED} Every passing ship`), 'markdown');
    builder.add('supplies.rst', SUPPLIES.replace('Barrels are stored', `${SHARED} Barrels are stored`), 'restructuredtext');
    const twice = digestView(builder.finish());
    const links = twice.panel.documents.flatMap((d) => d.sections.flatMap((s) => s.lines.flatMap((l) => l.alsoIn)));
    const labels = links.map((l) => l.label);
    assert.ok(labels.length >= 2, labels.join(' | '));
    const files = labels.filter((l) => l.startsWith('also in: '));
    assert.equal(new Set(files.map((l) => l.replace(/ line \d+$/, ''))).size, files.length, `each file named once: ${labels.join(' | ')}`);
    assert.ok(labels.some((l) => /^line \d+$/.test(l)), labels.join(' | '));
    assert.equal(new Set(links.map((l) => l.target)).size, links.length, 'each link its own place');
  });

  it('words the headline and each document’s figures from the digest’s own counts', () => {
    const { stats } = digest;
    assert.equal(stats.documents, 3);
    assert.equal(view.panel.headline, `Digest of 3 documents: ${stats.sentencesOut} sentences, ${stats.wordsOut} of ${stats.wordsIn} words.`);
    assert.deepEqual(
      view.panel.documents.map((d) => d.figures),
      digest.documents.map((d) => `${d.picked} of ${d.sentencesIn} sentences`),
    );
    // One sentence is merged into its copy, so the digest shows one fewer than the documents hold.
    assert.equal(stats.duplicatesMerged, 1);
    assert.equal(stats.sentencesOut, digest.documents.reduce((n, d) => n + d.sentencesIn, 0) - 1);
  });

  it('shows a refused document with its reason instead of figures, and words numbers for the display language', () => {
    const builder = startDigest({ budget: { unit: 'sentences', value: 4 } });
    builder.add('keeping.md', KEEPING, 'markdown');
    // A picked file is read whatever its extension: an image read as text is refused as binary.
    builder.add('photo.png', '\u0089PNG\r\n\u001a\n\u0000\u0000\u0000\rIHDR', 'plaintext');
    const refused = builder.finish();
    const binary = refused.documents[1]!;
    assert.match(binary.refused ?? '', /binary/);
    const shown = digestView(refused).panel.documents[1]!;
    assert.equal(shown.figures, binary.refused);
    assert.deepEqual(shown.sections, []);
    const big = { ...digest, stats: { ...digest.stats, wordsIn: 12_345 } };
    assert.match(digestView(big, wordingFor('de')).panel.headline, /of 12\.345 words/);
  });

  it('keeps the engine’s notices', () => {
    const withNotice = { ...digest, notices: ['2 documents had no sentences to pick.'] };
    assert.deepEqual(digestView(withNotice).panel.notices, ['2 documents had no sentences to pick.']);
  });
});

describe('editor digest: names shown', () => {
  it('numbers a repeated name from its second occurrence, leaves unique names alone', () => {
    assert.deepEqual(uniqueNames(['a.md', 'Untitled-1', 'a.md', 'b.md', 'a.md']), ['a.md', 'Untitled-1', 'a.md (2)', 'b.md', 'a.md (3)']);
    assert.deepEqual(uniqueNames([]), []);
  });
});
