/** A small hand-built summary (shared by the extension's panel tests); spans are found in the text, not typed in. */
import type { ParsedDocument, PickedSentence, Section, Sentence, Summary } from '../../src/core/types';

export const FERRY_TEXT = [
  '# Night Ferry Timetable',
  '',
  'The ferry leaves at nine. It returns at noon.',
  '',
  '## Fares',
  '',
  'Tickets cost four coins. However, children ride free.',
  '',
  '### Discounts',
  '',
  'Students pay half.',
  '',
  '## Safety',
  '',
  'Life vests are under the seats.',
  '',
].join('\n');

const SENTENCES: [string, number][] = [
  ['The ferry leaves at nine.', 1],
  ['It returns at noon.', 1],
  ['Tickets cost four coins.', 2],
  ['However, children ride free.', 2],
  ['Students pay half.', 3],
  ['Life vests are under the seats.', 4],
];

function spanOf(text: string, needle: string): { start: number; end: number } {
  const start = text.indexOf(needle);
  if (start < 0) throw new Error(`fixture: ${needle} not found`);
  return { start, end: start + needle.length };
}

export function ferrySummary(text: string = FERRY_TEXT, extra: { sentence?: string } = {}): Summary {
  const heading = (h: string) => spanOf(text, h);
  const sections: Section[] = [
    { index: 0, heading: '', depth: 0, headingSpan: null, span: { start: 0, end: text.length }, parent: null },
    { index: 1, heading: 'Night Ferry Timetable', depth: 1, headingSpan: heading('# Night Ferry Timetable'), span: { start: 0, end: text.length }, parent: 0 },
    { index: 2, heading: 'Fares', depth: 2, headingSpan: heading('## Fares'), span: { start: heading('## Fares').start, end: heading('## Safety').start }, parent: 1 },
    { index: 3, heading: 'Discounts', depth: 3, headingSpan: heading('### Discounts'), span: { start: heading('### Discounts').start, end: heading('## Safety').start }, parent: 2 },
    { index: 4, heading: 'Safety', depth: 2, headingSpan: heading('## Safety'), span: { start: heading('## Safety').start, end: text.length }, parent: 1 },
  ];
  const sentences: Sentence[] = SENTENCES.map(([s, section], index) => ({
    index,
    text: index === 4 && extra.sentence ? extra.sentence : s,
    span: spanOf(text, s),
    section,
    paragraph: index,
    positionInParagraph: 0,
    paragraphLength: 1,
    positionInSection: 0,
    sectionLength: 1,
  }));
  const document: ParsedDocument = { text, baseOffset: 0, format: 'markdown', title: 'Night Ferry Timetable', sections, paragraphs: [], sentences, skipped: [] };
  const pick = (index: number, rank: number, path: string[]): PickedSentence => ({
    sentence: index,
    text: sentences[index]!.text,
    span: sentences[index]!.span,
    sectionPath: path,
    section: sentences[index]!.section,
    score: 1 / rank,
    rank,
    features: { position: 0.5 / rank, 'heading|overlap': 0.25 },
  });
  const picks = [
    pick(0, 1, ['Night Ferry Timetable']),
    pick(3, 2, ['Night Ferry Timetable', 'Fares']),
    pick(4, 4, ['Night Ferry Timetable', 'Fares', 'Discounts']),
    pick(5, 3, ['Night Ferry Timetable', 'Safety']),
  ];
  return {
    document,
    method: 'blend',
    language: 'en',
    sentences: picks,
    keyPhrases: [],
    shares: [
      { section: 1, heading: 'Night Ferry Timetable', documentShare: 0.4, summaryShare: 0.25, picked: 1, quota: 1 },
      { section: 2, heading: 'Fares', documentShare: 0.4, summaryShare: 0.5, picked: 2, quota: 2 },
      { section: 4, heading: 'Safety', documentShare: 0.2, summaryShare: 0.25, picked: 1, quota: 1 },
    ],
    stats: { wordsIn: 28, wordsOut: 18, compression: 18 / 28, sentencesIn: 6, sentencesOut: 4, sectionsCovered: 3, sectionsWithContent: 3, minutesToRead: 18 / 230, documentMinutesToRead: 28 / 230 },
    warnings: [
      {
        sentence: 3,
        trigger: 'connective',
        words: 'However,',
        span: spanOf(text, 'However,'),
        context: [2],
        message: '“However” contrasts with a sentence that is not in the summary.',
        repairs: [
          { kind: 'addContext', sentences: [2] },
          { kind: 'replace', replacement: 2 },
          { kind: 'trimConnective', text: 'Children ride free.' },
        ],
      },
    ],
    ranking: {},
    notices: [],
  };
}
