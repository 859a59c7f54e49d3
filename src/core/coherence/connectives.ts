/**
 * Sentence-initial discourse connectives.
 *
 * Inventory: the 100 explicit connective types annotated in the Penn Discourse Treebank 2.0
 * (Prasad et al., 2008, "The Penn Discourse TreeBank 2.0", LREC) — written down FROM MEMORY, not
 * copied from the corpus files, so spelling of the paired types ("either..or") is our own.
 * A few frequent connectives the PDTB does not list (ordinals, "that said", "since then"...) are
 * marked `source: 'project'`.
 *
 * Which ones depend on prior context follows the PDTB's own argument structure: a discourse
 * adverbial or a coordinating conjunction at the start of a sentence takes its first argument
 * (Arg1) from earlier text, so the sentence dangles without it. A subordinating conjunction at the
 * start ("Because ...,", "If ...,", "When ...,") finds both arguments inside the sentence, and the
 * first half of a paired connective ("On the one hand", "Either") looks forward, not back.
 * Concluding adverbials ("overall", "in the end", "in short") are marked as standing alone:
 * they sum up, but the sentence they open states its own point.
 */
import { tokenize, type Token } from './tokens';

export type ConnectiveRole = 'adverbial' | 'coordinating' | 'subordinating' | 'paired' | 'preposition';

export interface Connective {
  /** Lower case, words separated by one space; paired types as "either..or". */
  readonly phrase: string;
  readonly role: ConnectiveRole;
  /** At the start of a sentence, does it point back to earlier text? */
  readonly dependsOnPrior: boolean;
  readonly source: 'pdtb2' | 'project';
  /** Only a connective when a comma follows ("However, ..." but "However the job runs, ..."). */
  readonly requiresComma?: boolean;
  /** Not a connective when one of these words follows ("As a result of ...", "Instead of ..."). */
  readonly notBefore?: readonly string[];
}

type Entry = [phrase: string, role: ConnectiveRole, dependsOnPrior: boolean, extra?: Partial<Connective>];

const COMMA: Partial<Connective> = { requiresComma: true };

// prettier-ignore
const PDTB2: readonly Entry[] = [
  ['accordingly', 'adverbial', true],
  ['additionally', 'adverbial', true],
  ['after', 'subordinating', false],
  ['afterward', 'adverbial', true],
  ['also', 'adverbial', true],
  ['alternatively', 'adverbial', true],
  ['although', 'subordinating', false],
  ['and', 'coordinating', true],
  ['as', 'subordinating', false],
  ['as a result', 'adverbial', true, { notBefore: ['of'] }],
  ['as an alternative', 'adverbial', true, { notBefore: ['to'] }],
  ['as if', 'subordinating', false],
  ['as long as', 'subordinating', false],
  ['as soon as', 'subordinating', false],
  ['as though', 'subordinating', false],
  ['as well', 'adverbial', false], // sentence-final in practice; the additive check handles it
  ['because', 'subordinating', false],
  ['before', 'subordinating', false],
  ['before and after', 'subordinating', false],
  ['besides', 'adverbial', true, COMMA], // "Besides the drills, ..." is a preposition
  ['but', 'coordinating', true],
  ['by comparison', 'adverbial', true, { notBefore: ['with', 'to'] }],
  ['by contrast', 'adverbial', true, { notBefore: ['with', 'to'] }],
  ['by then', 'adverbial', true],
  ['consequently', 'adverbial', true],
  ['conversely', 'adverbial', true],
  ['earlier', 'adverbial', true, COMMA], // "Earlier versions ..." is an adjective
  ['either..or', 'paired', false],
  ['else', 'adverbial', false], // never sentence-initial on its own
  ['except', 'preposition', false],
  ['finally', 'adverbial', true],
  ['for', 'coordinating', false], // sentence-initial "For" is the preposition ("For each sailing, ...")
  ['for example', 'adverbial', true],
  ['for instance', 'adverbial', true],
  ['further', 'adverbial', true, COMMA], // "Further tests are planned" is an adjective
  ['furthermore', 'adverbial', true],
  ['hence', 'adverbial', true],
  ['however', 'adverbial', true, COMMA], // "However the booking is made, ..." means "no matter how"
  ['if', 'subordinating', false],
  ['if and when', 'subordinating', false],
  ['if..then', 'paired', false],
  ['in addition', 'adverbial', true, { notBefore: ['to'] }],
  ['in contrast', 'adverbial', true, { notBefore: ['to', 'with'] }],
  ['in fact', 'adverbial', true],
  ['in other words', 'adverbial', true],
  ['in particular', 'adverbial', true],
  ['in short', 'adverbial', false],
  ['in sum', 'adverbial', false],
  ['in the end', 'adverbial', false],
  ['in turn', 'adverbial', true],
  ['indeed', 'adverbial', true],
  ['insofar as', 'subordinating', false],
  ['instead', 'adverbial', true, { notBefore: ['of'] }],
  ['later', 'adverbial', true, COMMA], // "Later releases ..." is an adjective
  ['lest', 'subordinating', false],
  ['likewise', 'adverbial', true],
  ['meantime', 'adverbial', true],
  ['meanwhile', 'adverbial', true],
  ['moreover', 'adverbial', true],
  ['much as', 'subordinating', false],
  ['neither..nor', 'paired', false],
  ['nevertheless', 'adverbial', true],
  ['next', 'adverbial', true, COMMA], // "Next week ..." is a time phrase
  ['nonetheless', 'adverbial', true],
  ['nor', 'coordinating', true],
  ['now that', 'subordinating', false],
  ['on the contrary', 'adverbial', true],
  ['on the one hand..on the other hand', 'paired', false],
  ['on the other hand', 'adverbial', true],
  ['once', 'subordinating', false],
  ['or', 'coordinating', true],
  ['otherwise', 'adverbial', true],
  ['overall', 'adverbial', false],
  ['plus', 'adverbial', true, COMMA],
  ['previously', 'adverbial', true, COMMA],
  ['rather', 'adverbial', true, COMMA], // "Rather than ..." opens a comparison inside the sentence
  ['regardless', 'adverbial', true, COMMA], // "Regardless of ..." is a preposition
  ['separately', 'adverbial', true],
  ['similarly', 'adverbial', true],
  ['simultaneously', 'adverbial', true],
  ['since', 'subordinating', false],
  ['so', 'coordinating', true, { notBefore: ['far', 'that', 'long', 'much', 'many', 'called'] }],
  ['so that', 'subordinating', false],
  ['specifically', 'adverbial', true],
  ['still', 'adverbial', true, COMMA],
  ['then', 'adverbial', true],
  ['thereafter', 'adverbial', true],
  ['thereby', 'adverbial', true],
  ['therefore', 'adverbial', true],
  ['though', 'subordinating', false],
  ['thus', 'adverbial', true],
  ['till', 'subordinating', false],
  ['ultimately', 'adverbial', false],
  ['unless', 'subordinating', false],
  ['until', 'subordinating', false],
  ['when', 'subordinating', false],
  ['when and if', 'subordinating', false],
  ['whereas', 'subordinating', false],
  ['while', 'subordinating', false],
  ['yet', 'coordinating', true],
];

// prettier-ignore
const PROJECT: readonly Entry[] = [
  ['afterwards', 'adverbial', true],
  ['first', 'adverbial', false, COMMA], // opens a sequence: looks forward
  ['firstly', 'adverbial', false],
  ['first of all', 'adverbial', false],
  ['second', 'adverbial', true, COMMA],
  ['secondly', 'adverbial', true],
  ['third', 'adverbial', true, COMMA],
  ['thirdly', 'adverbial', true],
  ['fourth', 'adverbial', true, COMMA],
  ['lastly', 'adverbial', true],
  ['last', 'adverbial', true, COMMA],
  ['last but not least', 'adverbial', true],
  ['that said', 'adverbial', true],
  ['having said that', 'adverbial', true],
  ['that is', 'adverbial', true, COMMA],
  ['even so', 'adverbial', true],
  ['after all', 'adverbial', true, COMMA], // "After all the tools are back, ..." is a clause
  ['at the same time', 'adverbial', true, COMMA],
  ['as such', 'adverbial', true, COMMA], // "As such tools age, ..."
  ['by the same token', 'adverbial', true],
  ['as a consequence', 'adverbial', true, { notBefore: ['of'] }],
  ['in the meantime', 'adverbial', true],
  ['on top of that', 'adverbial', true],
  ['what is more', 'adverbial', true],
  ['more importantly', 'adverbial', true],
  ['since then', 'adverbial', true],
  ['until then', 'adverbial', true],
  ['till then', 'adverbial', true],
  ['even then', 'adverbial', true],
  ['only then', 'adverbial', true],
  ['again', 'adverbial', true, COMMA],
  ['equally', 'adverbial', true, COMMA],
  ['in any case', 'adverbial', true],
  ['anyway', 'adverbial', true],
  ['besides that', 'adverbial', true],
  ['apart from that', 'adverbial', true],
  ['in conclusion', 'adverbial', false],
  ['on a related note', 'adverbial', true],
  ['on the same note', 'adverbial', true],
];

function build(entries: readonly Entry[], source: Connective['source']): Connective[] {
  return entries.map(([phrase, role, dependsOnPrior, extra]) => ({ phrase, role, dependsOnPrior, source, ...extra }));
}

export const PDTB2_CONNECTIVES: readonly Connective[] = build(PDTB2, 'pdtb2');
export const CONNECTIVES: readonly Connective[] = [...PDTB2_CONNECTIVES, ...build(PROJECT, 'project')];

/** Phrase → connective, for matching the start of a sentence. Paired types match their first half. */
const BY_FIRST_WORD = new Map<string, Connective[]>();
for (const connective of CONNECTIVES) {
  const words = connective.phrase.split('..')[0]!.split(' ');
  const list = BY_FIRST_WORD.get(words[0]!) ?? [];
  list.push(connective);
  BY_FIRST_WORD.set(words[0]!, list);
}
for (const list of BY_FIRST_WORD.values()) {
  list.sort((a, b) => leadingWords(b).length - leadingWords(a).length);
}

function leadingWords(connective: Connective): string[] {
  return connective.phrase.split('..')[0]!.split(' ');
}

export interface ConnectiveMatch {
  readonly connective: Connective;
  /** Index of the first token after the connective (and after its comma, if any). */
  readonly next: number;
  /** Offsets of the connective words in the sentence text. */
  readonly start: number;
  readonly end: number;
}

/**
 * The connective that opens the sentence (the longest that fits), whether or not it depends on
 * prior context, or null. Leading quotes and brackets are skipped.
 */
export function leadingConnective(tokens: readonly Token[], from = 0): ConnectiveMatch | null {
  let first = from;
  while (first < tokens.length && tokens[first]!.kind === 'punct' && /["'“‘(\[*_]/.test(tokens[first]!.text)) first++;
  const head = tokens[first];
  if (!head || head.kind !== 'word') return null;
  for (const connective of BY_FIRST_WORD.get(head.lower) ?? []) {
    const words = leadingWords(connective);
    let i = first;
    let ok = true;
    for (const word of words) {
      const token = tokens[i];
      if (!token || token.kind !== 'word' || token.lower !== word || token.contracted) {
        ok = false;
        break;
      }
      i++;
    }
    if (!ok) continue;
    const after = tokens[i];
    const comma = after?.kind === 'punct' && after.text === ',';
    if (connective.requiresComma && !comma) continue;
    if (!comma && after?.kind === 'word' && connective.notBefore?.includes(after.lower)) continue;
    // A hyphen glues the word to the next ("So-called"), which the tokenizer keeps in one token.
    return { connective, next: comma ? i + 1 : i, start: head.start, end: tokens[i - 1]!.end };
  }
  return null;
}

/** Convenience for callers holding plain text. */
export function leadingConnectiveOf(text: string): ConnectiveMatch | null {
  return leadingConnective(tokenize(text));
}
