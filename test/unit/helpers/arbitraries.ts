/**
 * fast-check generators for the property tests: arbitrary Markdown and plain-text documents built
 * from the constructs that trouble parsers (containers inside containers, every heading style,
 * code, HTML, tables, front matter, mixed line endings) and from text in many scripts (astral
 * characters, combining marks, right-to-left, CJK). Documents stay small (≤ MAX_DOCUMENT_CHARS)
 * so that thousands of cases run in minutes on a slow machine.
 */
import fc from 'fast-check';
import { METHOD_NAMES as METHODS } from '../../../src/core/rank/methods';
import type { SummarizeRequest } from '../../../src/core/summarize';

export const MAX_DOCUMENT_CHARS = 2048;

// ---------------------------------------------------------------- words and inline text

const ASCII_WORDS = [
  'the', 'rebalancing', 'service', 'moves', 'bikes', 'between', 'docks', 'at', 'night', 'Depot',
  'crew', 'routes', 'are', 'planned', 'daily', 'v1.2.3', 'config.yaml', 'e.g.', 'Dr.', 'U.S.', '3.14',
  'API', 'it', 'This', 'However,', 'ops@fleet.example', 'https://fleet.example/a?b=c', 'x', 'A.',
  "don't", '(see', 'below)', '"quoted"', '—', '-', '1.', '42', 'snake_case', 'CamelCase', '...',
];

/** Words outside ASCII: astral symbols, combining marks, right-to-left and other scripts. */
const UNICODE_WORDS = [
  '\u{1F6B2}', '\u{1F600}\u{1F3FD}', '\u{1F468}\u200D\u{1F469}\u200D\u{1F467}', '\u{1D54F}', '\u{20BB7}野家',
  'cafe\u0301', 'n\u0303o', 'A\u030A\u0301', 'Zu\u0308rich',
  'שלום', 'עולם.', 'مرحبا', 'بالعالم،', '\u202Eevil\u202C', '\u200Fרכב',
  '自転車', '東京', 'の', '再配置', '서울', 'Привет', 'мир', 'Ελλάδα', 'ß', 'İstanbul',
];

/** Whole sentences in scripts written without spaces between words. */
const CJK_SENTENCES = [
  '夜間に自転車を再配置します。',
  '各拠点の在庫は毎朝確認する。',
  '配送車は二台です！',
  '我们在夜里调度自行车。',
  '车站的库存每天早上检查？',
  '이 서비스는 밤에 자전거를 옮깁니다.',
];

const word = fc.oneof(
  { weight: 6, arbitrary: fc.constantFrom(...ASCII_WORDS) },
  { weight: 2, arbitrary: fc.constantFrom(...UNICODE_WORDS) },
  { weight: 1, arbitrary: fc.string({ unit: 'grapheme', minLength: 1, maxLength: 8 }) },
);

/** Inline markup around a word; each form must leave the word's letters in the source. */
const inlineWord = fc.oneof(
  { weight: 10, arbitrary: word },
  { weight: 1, arbitrary: word.map((w) => `*${w}*`) },
  { weight: 1, arbitrary: word.map((w) => `**${w}**`) },
  { weight: 1, arbitrary: word.map((w) => `_${w}_`) },
  { weight: 1, arbitrary: word.map((w) => `\`${w}\``) },
  { weight: 1, arbitrary: word.map((w) => `~~${w}~~`) },
  { weight: 1, arbitrary: fc.tuple(word, word).map(([w, u]) => `[${w}](https://docs.example/${encodeURIComponent(u)})`) },
  { weight: 1, arbitrary: fc.tuple(word, word).map(([w, u]) => `[${w}][${u}]`) },
  { weight: 1, arbitrary: word.map((w) => `![${w}](img/${w.length}.png)`) },
  { weight: 1, arbitrary: word.map((w) => `<span class="k">${w}</span>`) },
  { weight: 1, arbitrary: fc.constantFrom('<https://fleet.example>', '<!-- note -->', '&amp;', '&copy;', '&#x1F6B2;', '\\*', '\\_', '[^1]', '<br>') },
  { weight: 1, arbitrary: fc.tuple(word, word).map(([a, b]) => `${a}**${b}**${a}`) },
);

const terminal = fc.constantFrom('.', '.', '.', '?', '!', '…', '...', '', '."', '.)', '。', '!?');
const separator = fc.oneof(
  { weight: 12, arbitrary: fc.constant(' ') },
  { weight: 2, arbitrary: fc.constant('\n') },
  { weight: 1, arbitrary: fc.constantFrom('  ', '\t', '  \n', '\\\n') },
);

/** One sentence of inline text: words joined by spaces, tabs or soft line breaks. */
export const sentenceText: fc.Arbitrary<string> = fc.oneof(
  { weight: 5, arbitrary: fc.tuple(fc.array(fc.tuple(inlineWord, separator), { minLength: 1, maxLength: 14 }), terminal).map(([parts, end]) => parts.map(([w, s]) => w + s).join('').trimEnd() + end) },
  { weight: 1, arbitrary: fc.constantFrom(...CJK_SENTENCES) },
);

const paragraphText = fc.array(sentenceText, { minLength: 1, maxLength: 4 }).map((s) => s.join(' '));

/** Characters that mean something to Markdown, mixed with letters: raw input a parser must survive. */
const noise = fc.string({
  unit: fc.constantFrom(...'#*_-+>|[]()!<>`~=:.\\/ \t\n\r\n1aZé\u{1F600}\u0301'.split('').concat(['\u{1F600}', '\r\n', '    ', '```'])),
  maxLength: 120,
});

// ---------------------------------------------------------------- Markdown blocks

const indentLines = (text: string, first: string, rest: string): string =>
  text
    .split('\n')
    .map((line, i) => (i === 0 ? first : line === '' ? '' : rest) + line)
    .join('\n');

const atxHeading = fc
  .tuple(fc.integer({ min: 1, max: 6 }), sentenceText, fc.boolean())
  .map(([depth, text, closed]) => `${'#'.repeat(depth)} ${text.replace(/\n/g, ' ')}${closed ? ` ${'#'.repeat(depth)}` : ''}`);

const setextHeading = fc
  .tuple(sentenceText, fc.constantFrom('=', '-'), fc.integer({ min: 1, max: 12 }))
  .map(([text, mark, n]) => `${text.replace(/\n/g, ' ')}\n${mark.repeat(n)}`);

const fencedCode = fc
  .tuple(fc.constantFrom('```', '~~~', '````'), fc.constantFrom('', 'ts', 'rust', 'sh'), fc.array(noise, { maxLength: 3 }), fc.boolean())
  .map(([fence, info, lines, closed]) => `${fence}${info}\n${lines.join('\n').replace(/```|~~~/g, '')}${closed ? `\n${fence}` : ''}`);

const indentedCode = fc.array(sentenceText, { minLength: 1, maxLength: 3 }).map((lines) => lines.map((l) => `    ${l.replace(/\n/g, ' ')}`).join('\n'));

const htmlBlock = fc.oneof(
  paragraphText.map((t) => `<div class="note">\n${t}\n</div>`),
  fc.constant('<!-- a comment\nover two lines -->'),
  fc.constant('<details><summary>More</summary>\n\nHidden *text* here.\n\n</details>'),
  fc.constant('<script>window.pwned = 1</script>'),
);

const tableCell = fc.oneof(word, sentenceText.map((t) => t.replace(/[\n|]/g, ' ')));
const table = fc
  .tuple(fc.integer({ min: 1, max: 4 }), fc.integer({ min: 0, max: 4 }))
  .chain(([columns, rows]) =>
    fc.array(fc.array(tableCell, { minLength: columns, maxLength: columns }), { minLength: rows + 1, maxLength: rows + 1 }).map((cells) => {
      const row = (r: readonly string[]) => `| ${r.join(' | ')} |`;
      return [row(cells[0]!), row(cells[0]!.map(() => '---')), ...cells.slice(1).map(row)].join('\n');
    }),
  );

const leafBlock: fc.Arbitrary<string> = fc.oneof(
  { weight: 8, arbitrary: paragraphText },
  { weight: 2, arbitrary: atxHeading },
  { weight: 1, arbitrary: setextHeading },
  { weight: 1, arbitrary: fencedCode },
  { weight: 1, arbitrary: indentedCode },
  { weight: 1, arbitrary: htmlBlock },
  { weight: 1, arbitrary: table },
  { weight: 1, arbitrary: fc.constantFrom('---', '***', '_ _ _', '[ref]: https://docs.example/ref "Title"', '[^1]: A footnote. With two sentences.') },
  { weight: 1, arbitrary: noise },
);

const bullet = fc.constantFrom('- ', '* ', '+ ', '1. ', '2) ', '- [ ] ', '- [x] ', '-\t');

/** Blocks, with block quotes and lists that nest up to `depth` levels. */
const blocksAt = (depth: number): fc.Arbitrary<string> => {
  if (depth <= 0) return leafBlock;
  const inner = blocksAt(depth - 1);
  const innerBlocks = fc.array(inner, { minLength: 1, maxLength: 2 }).map((b) => b.join('\n\n'));
  const quote = fc.tuple(innerBlocks, fc.boolean()).map(([text, lazy]) =>
    text
      .split('\n')
      .map((line, i) => (lazy && i > 0 && line !== '' ? line : `> ${line}`))
      .join('\n'),
  );
  const list = fc
    .tuple(bullet, fc.array(innerBlocks, { minLength: 1, maxLength: 3 }), fc.boolean())
    .map(([marker, items, loose]) => items.map((item) => indentLines(item, marker, ' '.repeat(marker.replace('\t', '    ').length))).join(loose ? '\n\n' : '\n'));
  return fc.oneof({ weight: 5, arbitrary: leafBlock }, { weight: 1, arbitrary: quote }, { weight: 2, arbitrary: list });
};

const frontMatter = fc.oneof(
  { weight: 3, arbitrary: fc.constant('') },
  { weight: 1, arbitrary: fc.constant('---\ntitle: Night rebalancing\ntags: [ops, bikes]\n---\n') },
  { weight: 1, arbitrary: fc.constant('+++\ntitle = "Depot"\n+++\n') },
);

// ---------------------------------------------------------------- whole documents

/** How lines end: one style for the whole document, or a mix per line. */
const lineEndings = fc.oneof(
  { weight: 3, arbitrary: fc.constant((text: string) => text) },
  { weight: 1, arbitrary: fc.constant((text: string) => text.replace(/\n/g, '\r\n')) },
  { weight: 1, arbitrary: fc.infiniteStream(fc.constantFrom('\n', '\r\n', '\r')).map((ends) => (text: string) => text.replace(/\n/g, () => ends.next().value as string)) },
);

/** Cuts to the size limit without leaving half of a surrogate pair at the end. */
export function clip(text: string, max = MAX_DOCUMENT_CHARS): string {
  if (text.length <= max) return text;
  const code = text.charCodeAt(max - 1);
  return text.slice(0, code >= 0xd800 && code <= 0xdbff ? max - 1 : max);
}

const withBom = (body: fc.Arbitrary<string>) => fc.tuple(fc.boolean(), body).map(([bom, text]) => (bom ? '\uFEFF' : '') + text);

export const markdownDocument: fc.Arbitrary<string> = withBom(
  fc
    .tuple(frontMatter, fc.array(blocksAt(3), { maxLength: 12 }), fc.constantFrom('\n\n', '\n', '\n\n\n'), lineEndings, fc.boolean())
    .map(([front, blocks, gap, endings, finalNewline]) => clip(endings(front + blocks.join(gap) + (finalNewline ? '\n' : '')))),
);

const plainHeading = fc.oneof(
  fc.tuple(sentenceText, fc.constantFrom('=', '-', '~'), fc.integer({ min: 0, max: 4 })).map(([t, mark, extra]) => {
    const line = t.replace(/\n/g, ' ');
    return `${line}\n${mark.repeat(line.length + extra)}`;
  }),
  fc.tuple(fc.constantFrom('1', '2.1', '3.4.5', 'A.'), sentenceText).map(([n, t]) => `${n} ${t.replace(/\n/g, ' ')}`),
  word.map((w) => `${w.toUpperCase()} AND ${w.toUpperCase()}`),
);

const plainBlock: fc.Arbitrary<string> = fc.oneof(
  { weight: 8, arbitrary: paragraphText },
  { weight: 2, arbitrary: plainHeading },
  { weight: 1, arbitrary: fc.array(sentenceText, { minLength: 1, maxLength: 3 }).map((l) => l.map((x) => `    ${x.replace(/\n/g, ' ')}`).join('\n')) },
  { weight: 1, arbitrary: paragraphText.map((t) => `${t} ::\n\n   literal block\n   kept out`) },
  { weight: 1, arbitrary: fc.array(sentenceText, { minLength: 1, maxLength: 4 }).map((l) => l.map((x) => `- ${x.replace(/\n/g, ' ')}`).join('\n')) },
  { weight: 1, arbitrary: noise },
);

export const plainTextDocument: fc.Arbitrary<string> = withBom(
  fc
    .tuple(fc.array(plainBlock, { maxLength: 12 }), fc.constantFrom('\n\n', '\n', '\n\n\n'), lineEndings)
    .map(([blocks, gap, endings]) => clip(endings(blocks.join(gap)))),
);

/** Any text at all, lone surrogates and control characters included (both formats must survive it). */
export const rawText: fc.Arbitrary<string> = fc.oneof(
  fc.string({ unit: 'binary', maxLength: 300 }),
  fc.string({ unit: 'grapheme', maxLength: 300 }),
  fc.string({ unit: fc.integer({ min: 0xd7f0, max: 0xe010 }).map((c) => String.fromCharCode(c)), maxLength: 40 }),
);

export interface GeneratedCase {
  readonly text: string;
  readonly format: 'markdown' | 'plaintext';
}

/** A document of either format (mostly well-formed, sometimes raw). */
export const anyDocument: fc.Arbitrary<GeneratedCase> = fc.oneof(
  { weight: 5, arbitrary: markdownDocument.map((text) => ({ text, format: 'markdown' as const })) },
  { weight: 3, arbitrary: plainTextDocument.map((text) => ({ text, format: 'plaintext' as const })) },
  { weight: 1, arbitrary: fc.tuple(rawText, fc.constantFrom('markdown' as const, 'plaintext' as const)).map(([text, format]) => ({ text, format })) },
);

// ---------------------------------------------------------------- requests

export const budget = fc.oneof(
  fc.record({ unit: fc.constant('sentences' as const), value: fc.integer({ min: 1, max: 12 }) }),
  fc.record({ unit: fc.constant('words' as const), value: fc.integer({ min: 1, max: 200 }) }),
  fc.record({ unit: fc.constant('ratio' as const), value: fc.double({ min: 0.01, max: 1, noNaN: true }) }),
);

/** Summary options a caller may pass (format and baseOffset are added by each property). */
export const requestOptions: fc.Arbitrary<SummarizeRequest> = fc.record(
  {
    budget,
    method: fc.constantFrom(...METHODS),
    balance: fc.boolean(),
    balanceDepth: fc.integer({ min: 1, max: 6 }),
    minSentences: fc.integer({ min: 0, max: 5 }),
    minPerSection: fc.integer({ min: 0, max: 3 }),
    repair: fc.constantFrom('suggest', 'auto'),
    includeTables: fc.boolean(),
    language: fc.constantFrom('auto', 'en', 'de', 'ja', 'ar'),
    excludeHeadings: fc.constantFrom(undefined, [], ['Depot', 'x']),
  },
  { requiredKeys: ['budget', 'method'] },
);

/** Freezes an object and everything inside it, so a property can show the engine writes to nothing it is given. */
export function deepFreeze<T>(value: T): T {
  if (typeof value === 'object' && value !== null && !Object.isFrozen(value)) {
    Object.freeze(value);
    for (const key of Object.keys(value)) deepFreeze((value as Record<string, unknown>)[key]);
  }
  return value;
}

/**
 * Cases per property. The default keeps `npm test` quick on a two-core machine; CI (`.ci/run`)
 * sets TERSELY_PROPERTY_RUNS=10000 for the full strength, and a larger number gives a longer hunt.
 */
export const DEFAULT_PROPERTY_RUNS = 1_000;

export function propertyRuns(defaultRuns = DEFAULT_PROPERTY_RUNS): number {
  const fromEnv = Number(process.env.TERSELY_PROPERTY_RUNS);
  return Number.isInteger(fromEnv) && fromEnv > 0 ? fromEnv : defaultRuns;
}

/**
 * One fixed seed unless TERSELY_PROPERTY_SEED says otherwise, so a CI run is reproducible and a
 * red run can be replayed; set the variable to a new number (or "random") to explore further.
 */
const seedSetting = process.env.TERSELY_PROPERTY_SEED;
if (seedSetting !== 'random') {
  const seed = Number(seedSetting);
  fc.configureGlobal({ seed: Number.isInteger(seed) ? seed : 20_261_201 });
}
