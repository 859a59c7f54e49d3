/**
 * Perturbed copies of real abstracts, made by rule, for the abstract-check benchmark. Each rule
 * changes one sentence in one place; the same seed gives the same copies on every run.
 *
 * Rules (one perturbation per document and rule, the target drawn with the seeded generator):
 *   number      a number (digits, a number word, a percentage) that the body also states is changed
 *               to a value the body never states (n → n+1, n+2, 2n, n+10, … in seeded order); "one"
 *               as a pronoun ("the one that", "one of which", "allows one to") is not a number;
 *   negation    a negation is dropped ("does not X" → "does X", "cannot" → "can", "never X" → "X")
 *               or one is added after an auxiliary ("is X" → "is not X");
 *   modal       a modal verb is swapped for one of another strength (must / should / may / will);
 *   identifier  a code span, option, file name or path is swapped for another identifier of the same
 *               kind from the same body;
 *   replacement the sentence is replaced by a sentence of another document's abstract.
 * "Grounded" targets only: the changed item (the number, or the word after the negation or the
 * modal, or the identifier) occurs in the body, so the original sentence had something in the body
 * to be checked against. A sentence with no grounded target is not perturbed by that rule.
 */
import { parseDocument, wordTokens, type DocumentFormat } from '../src/core/index';
import { eng } from 'stopword';
import { seededRandom } from './seeded-random';

export type PerturbationKind = 'number' | 'negation' | 'modal' | 'identifier' | 'replacement';
export const PERTURBATION_KINDS: readonly PerturbationKind[] = ['number', 'negation', 'modal', 'identifier', 'replacement'];

export interface Perturbation {
  readonly kind: PerturbationKind;
  /** Index of the changed sentence among the abstract's sentences. */
  readonly sentence: number;
  readonly before: string;
  readonly after: string;
  /** The abstract with the change made. */
  readonly abstractText: string;
  /**
   * Modal swaps only: whether a body sentence about the same thing (3 more content words in common)
   * puts a modal of the original's class on the governed word, so that a check reading the body has
   * something to set against the swap.
   */
  readonly bodyStatesModal?: boolean;
}

interface Edit {
  readonly start: number;
  readonly end: number;
  readonly replacement: string;
  readonly bodyStatesModal?: boolean;
}

const NUMBER_WORDS: readonly string[] = [
  'zero', 'one', 'two', 'three', 'four', 'five', 'six', 'seven', 'eight', 'nine', 'ten', 'eleven', 'twelve',
  'thirteen', 'fourteen', 'fifteen', 'sixteen', 'seventeen', 'eighteen', 'nineteen', 'twenty',
];
const NUMBER_WORD_VALUE = new Map(NUMBER_WORDS.map((w, i) => [w, i] as const));
/** Words skipped when looking for the word a negation or a modal governs. */
const FILLER = new Set(['a', 'an', 'the', 'be', 'been', 'also', 'now', 'only', 'then', 'just', 'always', 'still', 'even', 'this', 'that', 'these', 'those', 'to', 'it', 'its', 'yet', 'ever', 'all', 'any', 'more', 'longer']);
const AUXILIARIES = ['is', 'are', 'was', 'were', 'will', 'can', 'should', 'must', 'would', 'could', 'may', 'might', 'does'];
const MODAL_CLASS: Readonly<Record<string, string>> = {
  must: 'must', shall: 'must', should: 'should', may: 'may', might: 'may', can: 'may', could: 'may', will: 'will', would: 'will',
};
const MODAL_REPRESENTATIVES = ['must', 'should', 'may', 'will'];
const ENGLISH_STOP_WORDS = new Set(eng);
const MODAL_WORD = /\b(must|shall|should|may|might|can|could|will|would)\b(?!['’])/giu;

/** Lower-cased word prefix used to decide whether the body mentions a word (a crude stem). */
const stemKey = (word: string) => word.toLowerCase().slice(0, Math.max(4, Math.min(6, word.length - 1)));

interface BodyModalUse {
  /** Stem key of the governed word. */
  readonly key: string;
  readonly modalClass: string;
  /** Stem keys of the sentence's content words. */
  readonly words: ReadonlySet<string>;
}

/** Stem keys of a text's words that are not stop words (the `stopword` package's English list). */
function contentKeys(text: string): Set<string> {
  return new Set(wordTokens(text).filter((w) => !ENGLISH_STOP_WORDS.has(w.toLowerCase()) && !/^\d/u.test(w)).map(stemKey));
}

export class BodyFacts {
  readonly stems: ReadonlySet<string>;
  private readonly modalUses: readonly BodyModalUse[];
  readonly numbers: ReadonlySet<number>;
  readonly identifiers: ReadonlyMap<string, readonly string[]>;
  constructor(readonly bodyText: string) {
    const words = wordTokens(bodyText);
    this.stems = new Set(words.map(stemKey));
    const numbers = new Set<number>();
    for (const word of words) {
      const value = numericValue(word);
      if (value !== null) numbers.add(value);
    }
    this.numbers = numbers;
    const identifiers = new Map<string, string[]>();
    for (const found of identifiersIn(bodyText)) {
      const list = identifiers.get(found.kind) ?? [];
      if (!list.includes(found.text)) list.push(found.text);
      identifiers.set(found.kind, list);
    }
    this.identifiers = identifiers;
    const modalUses: BodyModalUse[] = [];
    // Sentences cut at end punctuation: a bench heuristic, good enough to tell which words a modal sits among.
    for (const sentence of bodyText.split(/(?<=[.!?])\s+|\n\s*\n/u)) {
      const words = contentKeys(sentence);
      for (const m of sentence.matchAll(MODAL_WORD)) {
        const governed = governedWord(sentence, m.index! + m[0].length);
        if (governed !== null) modalUses.push({ key: stemKey(governed), modalClass: MODAL_CLASS[m[1]!.toLowerCase()]!, words });
      }
    }
    this.modalUses = modalUses;
  }
  /** Whether a body sentence about `sentence` (3 more content words in common) puts a modal of `modalClass` on `governed`. */
  statesModal(sentence: string, governed: string, modalClass: string): boolean {
    const key = stemKey(governed);
    const words = contentKeys(sentence);
    words.delete(key);
    return this.modalUses.some((use) => {
      if (use.key !== key || use.modalClass !== modalClass) return false;
      let shared = 0;
      for (const w of use.words) if (words.has(w)) shared++;
      return shared >= 3;
    });
  }
  mentions(word: string): boolean {
    return this.stems.has(stemKey(word));
  }
}

function numericValue(word: string): number | null {
  const lower = word.toLowerCase().replace(/%$/u, '');
  if (/^\d+(?:\.\d+)?$/u.test(lower)) return Number(lower);
  if (/^\d{1,3}(?:,\d{3})+$/u.test(lower)) return Number(lower.replaceAll(',', ''));
  return NUMBER_WORD_VALUE.get(lower) ?? null;
}

interface FoundIdentifier {
  readonly kind: 'code' | 'option' | 'file' | 'path';
  readonly text: string;
  /** Offsets of `text` (inside the backticks for code). */
  readonly start: number;
  readonly end: number;
}

/** A code span; its content neither starts nor ends with a space, so the text between two spans is never taken for one. */
const CODE_SPAN = /(`{1,2})([^`\s](?:[^`\n]{0,58}[^`\s])?)\1/gu;
const OPTION = /(?<![\w-])--[a-z][a-z0-9-]+/gu;
const FILE_NAME = /(?<![\w/.-])[\w-]+\.(?:rs|toml|md|json|yaml|yml|py|js|ts|c|h|cfg|conf|ini|txt|lock|sh)\b/gu;
const PATH = /(?<![\w:])[A-Za-z_]\w*(?:::[A-Za-z_]\w*)+/gu;

export function identifiersIn(text: string): FoundIdentifier[] {
  const found: FoundIdentifier[] = [];
  const covered: [number, number][] = [];
  for (const m of text.matchAll(CODE_SPAN)) {
    // `text`_ in reStructuredText is a hyperlink reference, not code.
    if (text[m.index! + m[0].length] === '_') continue;
    const start = m.index! + m[1]!.length;
    found.push({ kind: 'code', text: m[2]!, start, end: start + m[2]!.length });
    covered.push([m.index!, m.index! + m[0].length]);
  }
  const outside = (at: number) => !covered.some(([s, e]) => at >= s && at < e);
  for (const [kind, pattern] of [['option', OPTION], ['file', FILE_NAME], ['path', PATH]] as const) {
    for (const m of text.matchAll(pattern)) {
      if (outside(m.index!)) found.push({ kind, text: m[0], start: m.index!, end: m.index! + m[0].length });
    }
  }
  return found.sort((a, b) => a.start - b.start);
}

/** The first word after `end` that is not a filler word, or null. */
function governedWord(text: string, end: number): string | null {
  for (const word of text.slice(end).match(/[\p{L}][\p{L}'-]*/gu)?.slice(0, 4) ?? []) {
    if (!FILLER.has(word.toLowerCase())) return word;
  }
  return null;
}

/** Words before "one" that make it a pronoun ("the one that", "this one", "each one"). */
const DETERMINERS = new Set(['the', 'this', 'that', 'each', 'every', 'any', 'which', 'no', 'a', 'an', 'another', 'such', 'only']);

/**
 * "one" as a pronoun, not a count: nothing but a function word (the `stopword` package's English
 * list, or an auxiliary) follows it ("one of which", "allows one to", "when one may"), or a
 * determiner precedes it ("the one that"). Common practice, no source.
 */
function pronounOne(sentence: string, start: number, end: number): boolean {
  const next = sentence.slice(end).match(/^\s+([\p{L}][\p{L}'-]*)/u)?.[1]?.toLowerCase();
  const previous = sentence.slice(0, start).match(/([\p{L}][\p{L}'-]*)\s+$/u)?.[1]?.toLowerCase();
  return next === undefined || ENGLISH_STOP_WORDS.has(next) || AUXILIARIES.includes(next) || (previous !== undefined && DETERMINERS.has(previous));
}

function numberEdits(sentence: string, facts: BodyFacts, random: () => number): Edit[] {
  const edits: Edit[] = [];
  const inCode = identifiersIn(sentence).filter((i) => i.kind === 'code');
  for (const m of sentence.matchAll(/(?<![\w.`-])(\d+(?:\.\d+)?|\d{1,3}(?:,\d{3})+|[A-Za-z]+)(%?)(?![\w`]|\.\d)/gu)) {
    const value = numericValue(m[1]!);
    if (value === null || !facts.numbers.has(value)) continue;
    if (m[1]!.toLowerCase() === 'one' && pronounOne(sentence, m.index!, m.index! + m[0].length)) continue;
    // "[3]" and "[3]_" are citation markers, not quantities.
    if (sentence[m.index! - 1] === '[' && sentence[m.index! + m[0].length] === ']') continue;
    if (inCode.some((c) => m.index! >= c.start - 1 && m.index! < c.end + 1)) continue;
    const isWord = /[A-Za-z]/u.test(m[1]!);
    const candidates = [value + 1, value + 2, value * 2, value + 10, value + 3, value * 3 + 1];
    for (let k = candidates.length - 1; k > 0; k--) {
      const j = Math.floor(random() * (k + 1));
      [candidates[k], candidates[j]] = [candidates[j]!, candidates[k]!];
    }
    const fresh = candidates.find((c) => !facts.numbers.has(c) && (!isWord || c < NUMBER_WORDS.length));
    if (fresh === undefined) continue;
    let replacement = isWord ? NUMBER_WORDS[fresh]! : m[1]!.includes('.') ? fresh.toFixed(m[1]!.split('.')[1]!.length) : String(fresh);
    if (isWord && /^[A-Z]/u.test(m[1]!)) replacement = replacement[0]!.toUpperCase() + replacement.slice(1);
    edits.push({ start: m.index!, end: m.index! + m[1]!.length, replacement });
  }
  return edits;
}

function negationEdits(sentence: string, facts: BodyFacts): Edit[] {
  const edits: Edit[] = [];
  const grounded = (end: number) => {
    const word = governedWord(sentence, end);
    return word !== null && facts.mentions(word);
  };
  const removals: readonly [RegExp, (m: RegExpMatchArray) => string][] = [
    [/\b(is|are|was|were|will|can|should|must|would|could|may|might|does|do|did|has|have)\s+not\s+/giu, (m) => `${m[1]} `],
    [/\b(can)not\b/giu, (m) => m[1]!],
    [/\b(is|are|was|were|does|do|did|has|have|should|would|could)n['’]t\b/giu, (m) => m[1]!],
    [/\bwon['’]t\b/giu, () => 'will'],
    [/\bcan['’]t\b/giu, () => 'can'],
    [/\bnever\s+/giu, () => ''],
    [/\bno longer\s+/giu, () => ''],
  ];
  for (const [pattern, replace] of removals) {
    for (const m of sentence.matchAll(pattern)) {
      if (grounded(m.index! + m[0].length)) edits.push({ start: m.index!, end: m.index! + m[0].length, replacement: replace(m) });
    }
  }
  const aux = new RegExp(`\\b(${AUXILIARIES.join('|')})\\b(?!\\s+(?:not|n't|no|never)\\b)`, 'giu');
  for (const m of sentence.matchAll(aux)) {
    const end = m.index! + m[0].length;
    if (!/^\s+[\p{L}]/u.test(sentence.slice(end))) continue;
    // "is only available" → "is not only available" is the idiom "not only … (but also)", not a flipped claim.
    if (/^\s+only\b/iu.test(sentence.slice(end))) continue;
    if (grounded(end)) edits.push({ start: end, end, replacement: ' not' });
  }
  return edits;
}

function modalEdits(sentence: string, facts: BodyFacts, random: () => number): (Edit & { bodyStatesModal: boolean })[] {
  const edits: (Edit & { bodyStatesModal: boolean })[] = [];
  for (const m of sentence.matchAll(MODAL_WORD)) {
    const word = m[1]!.toLowerCase();
    if (/^\s*(?:not|n't)\b/u.test(sentence.slice(m.index! + m[0].length))) continue;
    const end = m.index! + m[0].length;
    const governed = governedWord(sentence, end);
    if (governed === null || !facts.mentions(governed)) continue;
    const others = MODAL_REPRESENTATIVES.filter((r) => r !== MODAL_CLASS[word]);
    let replacement = others[Math.floor(random() * others.length)]!;
    if (/^[A-Z]/u.test(m[1]!)) replacement = replacement[0]!.toUpperCase() + replacement.slice(1);
    edits.push({ start: m.index!, end, replacement, bodyStatesModal: facts.statesModal(sentence, governed, MODAL_CLASS[word]!) });
  }
  return edits;
}

function identifierEdits(sentence: string, facts: BodyFacts, random: () => number): Edit[] {
  const edits: Edit[] = [];
  const own = new Set(identifiersIn(sentence).map((i) => i.text));
  for (const found of identifiersIn(sentence)) {
    if (!facts.bodyText.includes(found.text)) continue;
    const others = (facts.identifiers.get(found.kind) ?? []).filter((t) => !own.has(t) && t.toLowerCase() !== found.text.toLowerCase());
    if (others.length === 0) continue;
    edits.push({ start: found.start, end: found.end, replacement: others[Math.floor(random() * others.length)]! });
  }
  return edits;
}

export interface PerturbInput {
  readonly abstractText: string;
  readonly format: DocumentFormat;
  readonly facts: BodyFacts;
  /** Sentences of other documents' abstracts, for the replacement rule. */
  readonly foreignSentences: readonly string[];
  readonly seed: number;
}

/** One perturbation per rule where the abstract has a grounded target (see the file header). */
export function perturbAbstract(input: PerturbInput): Perturbation[] {
  const { abstractText, format, facts } = input;
  const sentences = parseDocument(abstractText, { format }).sentences;
  const results: Perturbation[] = [];
  PERTURBATION_KINDS.forEach((kind, kindIndex) => {
    const random = seededRandom(input.seed * 31 + kindIndex);
    const options: { sentence: number; edit: Edit }[] = [];
    sentences.forEach((s, index) => {
      const raw = abstractText.slice(s.span.start, s.span.end);
      // A lead-in ("The changes are as follows:") makes no claim to change.
      if (/:\s*$/u.test(s.text)) return;
      let edits: Edit[];
      if (kind === 'number') edits = numberEdits(raw, facts, random);
      else if (kind === 'negation') edits = negationEdits(raw, facts);
      else if (kind === 'modal') edits = modalEdits(raw, facts, random);
      else if (kind === 'identifier') edits = identifierEdits(raw, facts, random);
      else edits = wordTokens(raw).length >= 6 ? [{ start: 0, end: raw.length, replacement: '' }] : [];
      for (const edit of edits) options.push({ sentence: index, edit: { ...edit, start: edit.start + s.span.start, end: edit.end + s.span.start } });
    });
    if (options.length === 0) return;
    const pick = options[Math.floor(random() * options.length)]!;
    let edit = pick.edit;
    if (kind === 'replacement') {
      const usable = input.foreignSentences.filter((t) => wordTokens(t).length >= 6);
      if (usable.length === 0) return;
      edit = { ...edit, replacement: usable[Math.floor(random() * usable.length)]! };
    }
    const changed = abstractText.slice(0, edit.start) + edit.replacement + abstractText.slice(edit.end);
    const after = parseDocument(changed, { format }).sentences;
    // The change must leave the sentence split alone, or the sentence indices would not line up.
    if (after.length !== sentences.length) return;
    const same = sentences.every((s, i) => i === pick.sentence || s.text === after[i]!.text);
    if (!same || after[pick.sentence]!.text === sentences[pick.sentence]!.text) return;
    results.push({
      kind,
      sentence: pick.sentence,
      before: sentences[pick.sentence]!.text,
      after: after[pick.sentence]!.text,
      abstractText: changed,
      ...(edit.bodyStatesModal !== undefined ? { bodyStatesModal: edit.bodyStatesModal } : {}),
    });
  });
  return results;
}
