/**
 * Where the main clause of a sentence starts: after a leading connective and after up to two
 * introductory phrases closed by a comma ("In practice, ...", "When the cache fills, ...").
 * Pronoun checks look at the first words of the main clause; nouns in an introductory
 * subordinate clause may be a pronoun's antecedent, nouns in a prepositional phrase are not
 * (after "After the storm, it ..." the reader still asks what "it" is).
 */
import { leadingConnective, type ConnectiveMatch } from './connectives';
import { isWord, type Token } from './tokens';
import { MODALS_AND_AUXILIARIES, PREPOSITIONS, SUBORDINATORS, THIRD_PERSON, SPEAKER_PRONOUNS } from './words';

export type IntroKind = 'subordinate' | 'prepositional';

export interface IntroPhrase {
  readonly kind: IntroKind;
  /** Token range, half-open, without the closing comma. */
  readonly start: number;
  readonly end: number;
}

export interface ClauseLayout {
  readonly tokens: readonly Token[];
  /** The connective that opens the sentence, if any (whether or not it points back). */
  readonly connective: ConnectiveMatch | null;
  readonly intros: readonly IntroPhrase[];
  /** Token index of the main clause's first token. */
  readonly mainStart: number;
}

/** Longest introductory phrase we accept before its comma, in tokens. */
const MAX_INTRO_TOKENS = 16;
const MAX_INTROS = 2;

/** Words that open a multi-word preposition ("according to", "much like", "due to"). */
const PREPOSITION_OPENERS = new Set(['according', 'due', 'thanks', 'owing', 'much', 'just', 'similar', 'contrary', 'compared', 'relative', 'prior', 'apart']);

/** Words that are both prepositions and subordinators: a verb inside decides. */
const AMBIGUOUS_OPENERS = new Set(['after', 'before', 'since', 'until', 'till', 'as']);

export function clauseLayout(tokens: readonly Token[]): ClauseLayout {
  const intros: IntroPhrase[] = [];
  const connective = leadingConnective(tokens);
  let at = 0;
  if (connective && connective.connective.role !== 'subordinating') at = connective.next;

  for (let round = 0; round < MAX_INTROS; round++) {
    const head = tokens[at];
    if (!isWord(head)) break;
    const comma = commaWithin(tokens, at);
    if (comma < 0) break;
    const kind = introKind(tokens, at, comma);
    if (!kind) break;
    intros.push({ kind, start: at, end: comma });
    at = comma + 1;
  }
  return { tokens, connective, intros, mainStart: at };
}

function commaWithin(tokens: readonly Token[], from: number): number {
  const limit = Math.min(tokens.length, from + MAX_INTRO_TOKENS);
  for (let i = from; i < limit; i++) {
    const token = tokens[i]!;
    if (token.kind !== 'punct') continue;
    if (token.text === ',') return i;
    if (/[;:.!?]/.test(token.text)) return -1;
  }
  return -1;
}

function introKind(tokens: readonly Token[], start: number, end: number): IntroKind | null {
  const head = tokens[start]!.lower;
  if (AMBIGUOUS_OPENERS.has(head)) return hasVerbSign(tokens, start + 1, end) ? 'subordinate' : 'prepositional';
  if (SUBORDINATORS.has(head)) return 'subordinate';
  if (PREPOSITIONS.has(head) || PREPOSITION_OPENERS.has(head)) return 'prepositional';
  // A one- or two-word adverbial ("Today,", "In practice," is covered above, "Sadly,").
  if (end - start <= 2 && /ly$/.test(head)) return 'prepositional';
  if (tokens[start]!.kind === 'number') return 'prepositional';
  return null;
}

/** Does the stretch look like a clause (has a subject pronoun, an auxiliary or a finite-looking verb)? */
function hasVerbSign(tokens: readonly Token[], start: number, end: number): boolean {
  for (let i = start; i < end; i++) {
    const token = tokens[i]!;
    if (!isWord(token)) continue;
    const word = token.lower;
    if (MODALS_AND_AUXILIARIES.has(word) || THIRD_PERSON.has(word) || SPEAKER_PRONOUNS.has(word)) return true;
    if (token.contracted) return true;
    // A last word ending in -ed or -s after a noun: "after the storm passed", "as the wind rises".
    if (i === end - 1 && i > start && /(ed|es|s)$/.test(word) && !/(ss|us|is)$/.test(word)) return true;
  }
  return false;
}
