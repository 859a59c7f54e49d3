/**
 * fast-check generators for reStructuredText documents whose prose is known: every generated
 * block says which words a reader must find in it (none for literal blocks, comments, code,
 * tables, fields, targets, transitions; the visible words for paragraphs, list items, terms,
 * definitions, quotes and note bodies). Inline markup is generated with its visible text
 * (emphasis, literals, roles, links, references, substitutions, escapes, footnote references).
 *
 * Layout rules that keep the known answer true: blocks are separated by blank lines; a paragraph
 * starts with a plain word (so it cannot read as a list marker or a title); a block quote always
 * follows a paragraph (an indented block after a comment or literal block would belong to it).
 */
import fc from 'fast-check';
import { clip } from './arbitraries';

export interface RstPart {
  /** reStructuredText source of the block. */
  readonly source: string;
  /** Its prose as a reader should show it (words matter, spacing does not). */
  readonly prose: string;
}

/** Words that start a paragraph safely: not an enumerator, not punctuation. */
const LEAD_WORDS = ['The', 'Depot', 'Crews', 'Every', 'Night', 'Routes', 'Bikes', 'Zürich', 'Сервис', '自転車', 'Planning'];
const WORDS = [
  'dock', 'bikes', 'move', 'between', 'stations', 'at', 'night', 'crew', 'routes', 'planned', 'daily', 'v1.2.3',
  'config.yaml', 'e.g.', '3.14', 'API', "don't", 'snake_case', 'CamelCase', 'naïve', 'café', 'Zürich', 'שלום', 'مرحبا',
  '東京', '再配置', '서울', 'Привет', '\u{1F6B2}', '\u{1D54F}x', 'ops@fleet.example', '42',
];
/** Words usable as simple reference names (`name_`). */
const NAMES = ['Depot', 'fleet', 'router', 'Station9', 'planner'];

const word = fc.constantFrom(...WORDS);
const leadWord = fc.constantFrom(...LEAD_WORDS);

/** One inline token with its visible text. */
const inlineToken: fc.Arbitrary<RstPart> = fc.oneof(
  { weight: 12, arbitrary: word.map((w) => ({ source: w, prose: w })) },
  { weight: 1, arbitrary: word.map((w) => ({ source: `*${w}*`, prose: w })) },
  { weight: 1, arbitrary: word.map((w) => ({ source: `**${w}**`, prose: w })) },
  { weight: 1, arbitrary: word.map((w) => ({ source: `\`\`${w}\`\``, prose: w })) },
  { weight: 1, arbitrary: word.map((w) => ({ source: `\`${w}\``, prose: w })) },
  {
    weight: 2,
    arbitrary: fc
      .tuple(fc.constantFrom('ref', 'doc', 'code', 'py:func', 'oslo.config:option', 'kbd', 'emphasis', 'term'), word, fc.boolean())
      .map(([role, w, titled]) => {
        // Cross-reference roles show the title of `title <target>`; text roles show everything.
        const crossReference = !['code', 'kbd', 'emphasis'].includes(role);
        return { source: titled && crossReference ? `:${role}:\`${w} <target-${role.length}>\`` : `:${role}:\`${w}\``, prose: w };
      }),
  },
  { weight: 1, arbitrary: fc.tuple(word, fc.constantFrom('_', '__')).map(([w, end]) => ({ source: `\`${w} <https://docs.example/p/${w.length}>\`${end}`, prose: w })) },
  { weight: 1, arbitrary: fc.tuple(word, word).map(([a, b]) => ({ source: `\`${a} ${b}\`_`, prose: `${a} ${b}` })) },
  { weight: 1, arbitrary: fc.constantFrom(...NAMES).map((n) => ({ source: `${n}_`, prose: n })) },
  { weight: 1, arbitrary: fc.constantFrom('[1]_', '[#]_', '[*]_', '[CIT2031]_').map((ref) => ({ source: ref, prose: '' })) },
  { weight: 1, arbitrary: fc.constantFrom(...NAMES).map((n) => ({ source: `|${n}|`, prose: n })) },
  { weight: 1, arbitrary: word.map((w) => ({ source: `_\`${w}\``, prose: w })) },
  { weight: 1, arbitrary: fc.integer({ min: 1, max: 9999 }).map((n) => ({ source: `:rfc:\`${n}\``, prose: `rfc ${n}` })) },
  { weight: 1, arbitrary: word.map((w) => ({ source: `\\*${w}`, prose: `*${w}` })) },
);

const terminal = fc.constantFrom('.', '.', '!', '?', '');

/** Lines of inline text (no line starts with a blank); the first token is a plain lead word. */
const inlineLines: fc.Arbitrary<RstPart> = fc
  .tuple(leadWord, fc.array(fc.tuple(inlineToken, fc.constantFrom(' ', ' ', ' ', '\n')), { minLength: 1, maxLength: 16 }), terminal)
  .map(([lead, tokens, end]) => {
    let source = lead;
    let prose = lead;
    for (const [token, gap] of tokens) {
      source += (gap === '\n' && source.length > 0 ? '\n' : ' ') + token.source;
      prose += ' ' + token.prose;
    }
    return { source: source + end, prose: prose + end };
  });

const indent = (text: string, first: string, rest: string): string =>
  text
    .split('\n')
    .map((line, i) => (i === 0 ? first : rest) + line)
    .join('\n');

/** Text that must never show up as prose. */
const noiseLine = fc.constantFrom('x = compute(1) * 2', 'secret words never prose', '<tag attr="1">', 'for i in range(3): pass', '$ fleet move --all', '|| && ** ``');
const noiseLines = fc.array(noiseLine, { minLength: 1, maxLength: 3 });

const none = (source: string): RstPart => ({ source, prose: '' });

const paragraph = inlineLines;

const title: fc.Arbitrary<RstPart> = fc
  .tuple(leadWord, fc.array(word, { maxLength: 3 }), fc.constantFrom('=', '-', '~', '^', '"', '*', '+', '#'), fc.boolean(), fc.integer({ min: 0, max: 3 }))
  .map(([lead, rest, mark, overline, extra]) => {
    const text = [lead, ...rest].join(' ');
    const line = mark.repeat([...text].length * 2 + extra + 4);
    return none(overline ? `${line}\n${text}\n${line}` : `${text}\n${line}`);
  });

const bulletList = fc.tuple(fc.constantFrom('- ', '* ', '+ '), fc.array(inlineLines, { minLength: 1, maxLength: 3 })).map(([bullet, items]) => ({
  source: items.map((item) => indent(item.source, bullet, ' '.repeat(bullet.length))).join('\n'),
  prose: items.map((item) => item.prose).join(' '),
}));

const enumeratedList = fc.tuple(fc.constantFrom('.', ')'), fc.array(inlineLines, { minLength: 1, maxLength: 3 })).map(([suffix, items]) => ({
  source: items.map((item, k) => indent(item.source, `${k + 1}${suffix} `, '   ')).join('\n'),
  prose: items.map((item) => item.prose).join(' '),
}));

/** Definitions of two lines or more, so that the list never reads as a run of `Key: value` fields. */
const definitionList = fc
  .array(fc.tuple(leadWord, fc.option(word, { nil: undefined }), inlineLines, inlineLines), { minLength: 1, maxLength: 3 })
  .map((items) => ({
    source: items.map(([term, classifier, a, b]) => `${term}${classifier ? ` : ${classifier}` : ''}\n${indent(`${a.source}\n${b.source}`, '    ', '    ')}`).join('\n'),
    prose: items.map(([term, , a, b]) => `${term} ${a.prose} ${b.prose}`).join(' '),
  }));

/** A block quote, always after a paragraph. */
const quoted = fc.tuple(paragraph, inlineLines).map(([intro, quote]) => ({
  source: `${intro.source}\n\n${indent(quote.source, '    ', '    ')}`,
  prose: `${intro.prose} ${quote.prose}`,
}));

const note = fc.tuple(fc.constantFrom('note', 'warning', 'tip', 'important', 'seealso'), inlineLines, fc.boolean()).map(([name, body, sameLine]) => ({
  source: sameLine ? `.. ${name}:: ${indent(body.source, '', '   ')}` : `.. ${name}::\n\n${indent(body.source, '   ', '   ')}`,
  prose: body.prose,
}));

const literalBlock = fc.tuple(paragraph, noiseLines, fc.constantFrom('::', ' ::')).map(([intro, lines, marker]) => ({
  source: `${intro.source.replace(/[.!?]$/, '')}${marker}\n\n${lines.map((l) => `    ${l}`).join('\n')}`,
  prose: intro.prose.replace(/[.!?]$/, ''),
}));

const notProse: fc.Arbitrary<RstPart> = fc.oneof(
  noiseLines.map((lines) => none(`.. code-block:: python\n\n${lines.map((l) => `   ${l}`).join('\n')}`)),
  noiseLines.map((lines) => none(`..\n${lines.map((l) => `   ${l}`).join('\n')}`)),
  noiseLine.map((line) => none(`.. ${line}`)),
  noiseLine.map((line) => none(`:Status: ${line}\n:Owner: ops`)),
  fc.constant(none('.. _fleet-guide: https://docs.example/guide')),
  fc.constant(none('__ https://docs.example/anonymous')),
  fc.constant(none('.. |Depot| replace:: secret words')),
  fc.constant(none('.. [1] secret words in a footnote')),
  fc.constant(none('+-------+-------+\n| secret| words |\n+=======+=======+\n| never | prose |\n+-------+-------+')),
  fc.constant(none('=====  =====\nsecret words\n=====  =====\nnever  prose\n=====  =====')),
  fc.constant(none('| secret line\n| never prose')),
  fc.constant(none('>>> secret(words)\nnever prose')),
  fc.constant(none('--------')),
  fc.constant(none('.. image:: secret.png\n.. toctree::\n\n   never/prose')),
);

const block: fc.Arbitrary<RstPart> = fc.oneof(
  { weight: 6, arbitrary: paragraph },
  { weight: 2, arbitrary: title },
  { weight: 2, arbitrary: bulletList },
  { weight: 1, arbitrary: enumeratedList },
  { weight: 1, arbitrary: definitionList },
  { weight: 1, arbitrary: quoted },
  { weight: 1, arbitrary: note },
  { weight: 1, arbitrary: literalBlock },
  { weight: 3, arbitrary: notProse },
);

const lineEndings = fc.constantFrom(
  (text: string) => text,
  (text: string) => text.replace(/\n/g, '\r\n'),
  (text: string) => text.replace(/\n/g, '\r'),
);

/** A document with its expected prose (the licence-style comment opening many documents included). */
export const rstDocument: fc.Arbitrary<RstPart> = fc
  .tuple(fc.boolean(), fc.boolean(), fc.array(block, { minLength: 1, maxLength: 12 }), lineEndings)
  .map(([bom, licence, blocks, endings]) => {
    const parts = licence ? [none('..\n This work is licensed under a licence.\n\n http://licence.example/'), ...blocks] : blocks;
    const source = (bom ? '\uFEFF' : '') + endings(parts.map((p) => p.source).join('\n\n') + '\n');
    return { source, prose: parts.map((p) => p.prose).filter((p) => p.length > 0).join(' ') };
  });

/** Characters that mean something to reStructuredText, mixed with letters: raw input a reader must survive. */
export const rstNoise: fc.Arbitrary<string> = fc
  .array(
    fc.oneof(
      fc.constantFrom(...'*`_|:.-=~+#[]<>()\\ \t\n\r1aZé'.split('')),
      fc.constantFrom('\n\n', '.. ', '::', '\n   ', '\u{1F600}', '\u0301', '\r\n', '+--+', '====', '__ ', ':role:`', '`_', '[1]_', '>>> ', '| ', '\uFEFF'),
    ),
    { maxLength: 200 },
  )
  .map((parts) => clip(parts.join('')));
