/**
 * Anaphoric pronouns ("it", "they", "his"...) and demonstratives ("this", "these approaches",
 * "that", "such") near the start of a sentence, whose antecedent the sentence does not supply.
 *
 * Only the first words of the main clause (and any introductory phrase before it) are looked at:
 * further in, a pronoun usually has an antecedent earlier in the same sentence. The exception is a
 * demonstrative with its noun ("enforce these rules"), followed to the end of the first simple
 * clause unless the same noun was named earlier in the sentence. A pronoun is also
 * accepted when a fitting noun phrase comes before it in the same sentence (number agreement is
 * checked roughly: "they" wants a plural or a coordination, "it" a singular). An object pronoun
 * cannot take its own clause's subject as antecedent (binding principle B, Chomsky 1981 — from
 * memory): in "We moved them to the cold room", "them" still needs earlier text.
 */
import type { ClauseLayout } from './clause';
import { isGenericIt } from './generic-it';
import { isClauseBreak, isWord, nextWord, previousWord, type Token } from './tokens';
import { DETERMINERS, FUNCTION_WORDS, PREPOSITIONS, SUBORDINATORS, looksPlural } from './words';

// Hoisted: the bundler turns a \p{…} literal into `new RegExp(…)`, which inside a function runs at every call.
const STARTS_UPPER = /^\p{Lu}/u;

export interface FoundTrigger {
  readonly trigger: 'pronoun' | 'demonstrative' | 'backReference' | 'additive';
  /** Token range, half-open. */
  readonly first: number;
  readonly last: number;
}

/** How many words of the main clause are checked for pronouns and demonstratives. */
export const MAIN_CLAUSE_WINDOW = 5;

const PLURAL_PRONOUNS = new Set(['they', 'them', 'their', 'theirs']);
const SINGULAR_NEUTER = new Set(['it', 'its']);
const OBJECT_ONLY = new Set(['them', 'him']);

/** Nouns after "this" that point at the text itself or at the present time, not at earlier text. */
const SELF_OR_NOW = new Set(
  `section chapter document page guide article paper report post note readme tutorial handbook manual
   file book list release repository repo project website site blog wiki proposal spec specification design plan
   overview walkthrough faq checklist changelog summary appendix part tool extension library
   rfc pep adr pr patch commit crate package plugin app script
   year month week quarter morning afternoon evening night weekend spring summer autumn fall winter
   season semester today`.split(/\s+/),
);

/** Frequent irregular past forms, so that "That made ..." is not read as "that made" + noun. */
const IRREGULAR_PAST = new Set(
  `made took gave meant kept left led let put set cut got went came saw found brought held ran won lost
   sent built paid told said began broke became grew drew threw wrote rose fell stood felt thought
   taught caught bought sold spent shut split`.split(/\s+/),
);

/** Irregular past participles not in IRREGULAR_PAST ("those given by ..."). */
const PARTICIPLES = new Set('given taken shown known seen written chosen done drawn grown thrown driven hidden'.split(' '));

/** Words after "that" that show it opens a clause ("That the pump survived ..."), not a reference. */
const CLAUSE_OPENERS = new Set(
  'the a an this these those it they we he she you i our their its his her my your there no some most all each every'.split(' '),
);

export function pronounTriggers(layout: ClauseLayout): FoundTrigger[] {
  const { tokens } = layout;
  const found: FoundTrigger[] = [];
  const windowEnd = windowLimit(tokens, layout.mainStart);
  const from = layout.connective && layout.connective.connective.role !== 'subordinating' ? layout.connective.next : 0;
  for (let i = from; i < windowEnd; i++) {
    const token = tokens[i]!;
    if (!isWord(token)) continue;
    const word = token.lower;
    if (PLURAL_PRONOUNS.has(word) || SINGULAR_NEUTER.has(word) || /^(he|him|his|she|her|hers)$/.test(word)) {
      if (word === 'it' && isGenericIt(tokens, i)) continue;
      if (hasAntecedent(layout, i)) continue;
      found.push({ trigger: 'pronoun', first: i, last: i + 1 });
      continue;
    }
    const demonstrative = demonstrativeAt(layout, i);
    if (demonstrative && !nounNamedEarlier(tokens, demonstrative)) found.push(demonstrative);
  }
  // "The compiler cannot enforce these rules": a demonstrative with its noun still points back
  // further into the first clause, as long as no earlier clause in the sentence could hold the referent.
  if (found.length === 0) {
    const clauseEnd = firstClauseEnd(tokens, windowEnd);
    for (let i = windowEnd; i < clauseEnd; i++) {
      if (!isWord(tokens[i]) || !/^(this|these|those)$/.test(tokens[i]!.lower)) continue;
      const demonstrative = demonstrativeAt(layout, i);
      if (demonstrative && demonstrative.last - demonstrative.first > 1 && !nounNamedEarlier(tokens, demonstrative)) found.push(demonstrative);
      break;
    }
  }
  return found;
}

/**
 * "Because consts need the match property, and this property cannot ...": the demonstrative's
 * noun was named earlier in the same sentence, which supplies the referent (lexical repetition).
 */
function nounNamedEarlier(tokens: readonly Token[], hit: FoundTrigger): boolean {
  if (hit.last - hit.first < 2) return false;
  const stem = (word: string) => word.replace(/(es|s)$/, '');
  const noun = stem(tokens[hit.last - 1]!.lower);
  if (noun.length < 3) return false;
  for (let i = 0; i < hit.first; i++) if (isWord(tokens[i]) && stem(tokens[i]!.lower) === noun) return true;
  return false;
}

/** Words that end a simple clause: a coordination, a subordinator or a relative pronoun. */
const CLAUSE_LINKS = new Set(['and', 'but', 'or', 'so', 'yet', 'which', 'who', 'whom', 'whose', 'that', 'where', 'while', 'because', 'if', 'when', 'than', 'as']);
const FIRST_CLAUSE_WORDS = 14;

function firstClauseEnd(tokens: readonly Token[], from: number): number {
  let words = 0;
  for (let i = from; i < tokens.length; i++) {
    const token = tokens[i]!;
    if (isClauseBreak(token) || token.text === '(' || (isWord(token) && CLAUSE_LINKS.has(token.lower))) return i;
    if (isWord(token) && ++words > FIRST_CLAUSE_WORDS) return i;
  }
  return tokens.length;
}

/** Token index where the checked window ends: MAIN_CLAUSE_WINDOW words into the main clause. */
function windowLimit(tokens: readonly Token[], mainStart: number): number {
  let words = 0;
  for (let i = mainStart; i < tokens.length; i++) {
    if (isWord(tokens[i])) words++;
    if (words > MAIN_CLAUSE_WINDOW) return i;
  }
  return tokens.length;
}

function demonstrativeAt(layout: ClauseLayout, i: number): FoundTrigger | null {
  const { tokens } = layout;
  const word = tokens[i]!.lower;
  if (!/^(this|these|those|that|such)$/.test(word) || tokens[i]!.text.includes('-')) return null;
  const nextIndex = nextWord(tokens, i + 1);
  const adjacent = nextIndex === i + 1;
  const next = adjacent ? tokens[nextIndex]!.lower : '';
  const prev = previousWord(tokens, i);
  const prevWord = prev >= 0 ? tokens[prev]!.lower : '';
  const opensClause = i === layout.mainStart || prev < 0 || layout.intros.some((intro) => intro.start === i);

  if (word === 'this' || word === 'these') {
    if (SELF_OR_NOW.has(next)) return null;
    return spanWithNoun(tokens, i, nextIndex, adjacent);
  }
  if (word === 'those') {
    if (next === 'who' || next === 'whom' || next === 'whose') return null;
    if (next === 'of' && /^(you|us)$/.test(tokens[nextWord(tokens, nextIndex + 1)]?.lower ?? '')) return null;
    // "those defined in this RFC", "those given by the user": the participle phrase says which
    // ones, as "those who" does. Not "those changed files", where the participle modifies a noun.
    if (adjacent && (/ed$/.test(next) || IRREGULAR_PAST.has(next) || PARTICIPLES.has(next))) {
      const after = tokens[nextIndex + 1];
      if (!isWord(after) || FUNCTION_WORDS.has(after.lower)) return null;
    }
    return spanWithNoun(tokens, i, nextIndex, adjacent);
  }
  if (word === 'that') {
    // Elsewhere "that" is a complementizer ("we propose that") or a relative pronoun.
    if (!opensClause && !PREPOSITIONS.has(prevWord)) return null;
    // "That the pump survived ..." and "in that it ..." open a clause.
    if (CLAUSE_OPENERS.has(next) && !tokens[i]!.contracted) return null;
    return spanWithNoun(tokens, i, nextIndex, adjacent);
  }
  // such
  if (next === 'as' || next === 'that') return null;
  if (!opensClause && !PREPOSITIONS.has(prevWord)) return null;
  return spanWithNoun(tokens, i, nextIndex, adjacent);
}

/** "this approach" when a noun-like word follows, else just "this" ("This means ..."). */
function spanWithNoun(tokens: readonly Token[], i: number, nextIndex: number, adjacent: boolean): FoundTrigger {
  if (adjacent && !FUNCTION_WORDS.has(tokens[nextIndex]!.lower) && !tokens[i]!.contracted && !looksLikeVerbAfter(tokens[i]!.lower, tokens[nextIndex]!.lower)) {
    // "such a delay": keep the article and its noun together.
    return { trigger: 'demonstrative', first: i, last: nextIndex + 1 };
  }
  if (adjacent && /^(a|an)$/.test(tokens[nextIndex]!.lower)) {
    const noun = nextWord(tokens, nextIndex + 1);
    if (noun === nextIndex + 1) return { trigger: 'demonstrative', first: i, last: noun + 1 };
  }
  return { trigger: 'demonstrative', first: i, last: i + 1 };
}

/**
 * After singular "this/that", a word in -s is a verb ("This means", "That applies"); after plural
 * "these/those" it is a noun ("These changes"). A word in -ed is a verb either way ("That made").
 */
function looksLikeVerbAfter(demonstrative: string, word: string): boolean {
  if (/ed$/.test(word) || IRREGULAR_PAST.has(word)) return true;
  return (demonstrative === 'this' || demonstrative === 'that') && looksPlural(word);
}

/** Is there a fitting noun phrase before the pronoun at `index` in this sentence? */
function hasAntecedent(layout: ClauseLayout, index: number): boolean {
  const { tokens } = layout;
  const pronoun = tokens[index]!.lower;
  const wantsPlural = PLURAL_PRONOUNS.has(pronoun);
  const wantsSingular = SINGULAR_NEUTER.has(pronoun);
  const objectPosition = OBJECT_ONLY.has(pronoun) || (pronoun === 'it' && isObjectPosition(tokens, index));
  const connectiveEnd = layout.connective && layout.connective.connective.role !== 'subordinating' ? layout.connective.next : 0;

  for (let i = connectiveEnd; i < index; i++) {
    const token = tokens[i]!;
    if (!isWord(token) || token.kind === 'number' || FUNCTION_WORDS.has(token.lower)) continue;
    const intro = layout.intros.find((phrase) => i >= phrase.start && i < phrase.end);
    if (intro?.kind === 'prepositional') continue;
    // An object pronoun cannot point at its own clause's subject.
    if (objectPosition && !intro && i >= layout.mainStart) continue;
    if (!looksLikeNounPhraseHead(tokens, i) || verbBeforePronoun(tokens, i, index)) continue;
    const plural = looksPlural(token.lower) || coordinated(tokens, i);
    if (wantsPlural && !plural && !isCapitalizedName(tokens, i)) continue;
    if (wantsSingular && plural) continue;
    return true;
  }
  return false;
}

/** "The club requires that they ...": a word right before "(that) <pronoun>" is read as the verb that takes it. */
function verbBeforePronoun(tokens: readonly Token[], i: number, pronoun: number): boolean {
  const next = nextWord(tokens, i + 1);
  if (next === pronoun) return looksPlural(tokens[i]!.lower) && tokens[i + 1] === tokens[next];
  return next === i + 1 && tokens[next]!.lower === 'that' && nextWord(tokens, next + 1) === next + 1 && next + 1 === pronoun;
}

function looksLikeNounPhraseHead(tokens: readonly Token[], i: number): boolean {
  const prev = previousWord(tokens, i);
  if (prev < 0) return STARTS_UPPER.test(tokens[i]!.text); // first word of the sentence
  const prevWord = tokens[prev]!.lower;
  if (isImperativeObject(tokens, i, prev)) return true;
  if (DETERMINERS.has(prevWord) || SUBORDINATORS.has(prevWord) || prevWord === 'and') return true;
  if (isCapitalizedName(tokens, i)) return true;
  // A modifier between determiner and noun: "the weather station", "each orchard row". Before a
  // comma the third word is the clause's verb instead: "When the booking opens, ...".
  const prev2 = previousWord(tokens, prev);
  if (isClauseBreak(tokens[i + 1])) return false;
  return prev2 >= 0 && DETERMINERS.has(tokens[prev2]!.lower) && !FUNCTION_WORDS.has(prevWord);
}

/**
 * "Give dispatchers a plan they can read": a bare plural right after an opening imperative verb
 * (a base form: no -s, -ed or -ing) and followed by another noun phrase is its object. Not "Cargo
 * requires that they ...": a word in -s followed by "that" or a pronoun is read as a verb.
 */
function isImperativeObject(tokens: readonly Token[], i: number, prev: number): boolean {
  const word = tokens[i]!.lower;
  const opener = tokens[prev]!.lower;
  if (prev !== 0 || i !== prev + 1 || !looksPlural(word) || FUNCTION_WORDS.has(word)) return false;
  if (FUNCTION_WORDS.has(opener) || /(s|ed|ing)$/.test(opener) || !STARTS_UPPER.test(tokens[prev]!.text)) return false;
  const after = tokens[i + 1];
  return isWord(after) && DETERMINERS.has(after.lower) && !/^(that|this|these|those|their|its)$/.test(after.lower);
}

function isCapitalizedName(tokens: readonly Token[], i: number): boolean {
  return previousWord(tokens, i) >= 0 && STARTS_UPPER.test(tokens[i]!.text);
}

/** "Tomasz and Ravi", "the probe and the valve": a coordination counts as plural. */
function coordinated(tokens: readonly Token[], i: number): boolean {
  const next = nextWord(tokens, i + 1);
  return next >= 0 && tokens[next]!.lower === 'and';
}

/** "it" after a verb-like word ("We tested it") rather than in subject position. */
function isObjectPosition(tokens: readonly Token[], index: number): boolean {
  const prev = previousWord(tokens, index);
  if (prev < 0 || tokens[index - 1]?.kind === 'punct') return false;
  const word = tokens[prev]!.lower;
  return !FUNCTION_WORDS.has(word) || PREPOSITIONS.has(word);
}
