/**
 * Explicit pointers to other parts of the text ("the former", "the latter", "the steps above",
 * "as mentioned", "see below", "the previous section", "the last option", forward: "the following example") and
 * additive back-references ("also", "too", "as well", "either", "Another option ..."): the
 * sentence presupposes something said elsewhere. Halliday and Hasan (1976, "Cohesion in
 * English") call the second kind additive conjunction and comparative reference — from memory.
 */
import type { ClauseLayout } from './clause';
import type { FoundTrigger } from './pronouns';
import { atSentenceEnd, isWord, nextWord, previousWord, type Token } from './tokens';
import { FUNCTION_WORDS } from './words';

const set = (words: string): ReadonlySet<string> => new Set(words.split(/\s+/).filter(Boolean));

/** Participles that make "above"/"below"/"earlier" a pointer into the text: "described above". */
const POINTING_PARTICIPLES = set(`
  mentioned noted discussed described explained shown stated seen outlined said listed given defined
  presented illustrated quoted cited introduced covered detailed explored reviewed summarized
  summarised referred see`);

/** Words after "above" that show it is a pointer, not a preposition ("the steps above must ..."). */
const AFTER_POINTER = set(`
  is are was were must should can could will would may might apply applies also only work works show
  shows hold holds remain remains need needs and or`);

/** Nouns after "the latter" that make it a time phrase ("the latter half of the year"). */
const LATTER_TIME = set('half part stage stages years days decades months weeks period phase century');

/** Nouns after "the former" that make it an anaphor rather than "ex-" ("the former option"). */
const FORMER_ANAPHORIC = set('one two option approach method case variant choice group kind type design model setting version');

/** Ordinals that pick one of a list named earlier ("the last option"); "first" often opens the list itself. */
const ORDINAL_PICKS = set('second third fourth last');

/** Members of a list of choices, besides FORMER_ANAPHORIC's nouns: "the last alternative". */
const LIST_MEMBERS = set('options alternative alternatives proposal proposals solution solutions idea ideas');

/** Document parts after "the previous/preceding". */
const DOCUMENT_PARTS = set(`
  section sections chapter chapters step steps paragraph paragraphs example examples point points
  sentence list table figure one two page part parts item items question answer`);

/** Blocks a forward pointer names besides the document parts: "the following snippet". */
const FORWARD_PARTS = set('snippet snippets code diagram diagrams configuration listing listings output excerpt sample samples line lines command commands block blocks script scripts');

/** After "as mentioned in ...": words that still point inside this document. */
const INTERNAL_PLACES = set('previous preceding last earlier above first introduction overview prior same this');

const ADDITIVE_WINDOW = 6;

export function referenceTriggers(layout: ClauseLayout): FoundTrigger[] {
  const { tokens } = layout;
  const found: FoundTrigger[] = [];
  for (let i = 0; i < tokens.length; i++) {
    const token = tokens[i]!;
    if (!isWord(token)) continue;
    const hit = backReferenceAt(tokens, i);
    if (hit) {
      found.push(hit);
      i = hit.last - 1;
    }
  }
  found.push(...additiveTriggers(layout));
  return found;
}

function backReferenceAt(tokens: readonly Token[], i: number): FoundTrigger | null {
  const word = tokens[i]!.lower;
  const nextIndex = nextWord(tokens, i + 1);
  const next = nextIndex === i + 1 ? tokens[nextIndex]!.lower : '';
  const prev = previousWord(tokens, i);
  const prevWord = prev >= 0 ? tokens[prev]!.lower : '';

  if (/^(aforementioned|aforesaid|above-mentioned|abovementioned)$/.test(word)) return span(i, i + 1);

  if (word === 'the' && (next === 'former' || next === 'latter') && !pairedEarlier(tokens, i)) {
    const afterIndex = nextIndex + 1 < tokens.length ? nextIndex + 1 : -1;
    const after = afterIndex >= 0 && isWord(tokens[afterIndex]) ? tokens[afterIndex]!.lower : '';
    if (next === 'latter' && LATTER_TIME.has(after)) return null;
    if (next === 'former' && after !== '' && !FORMER_ANAPHORIC.has(after) && !AFTER_POINTER.has(after) && !/[^s]s$/.test(after)) {
      return null; // "the former head baker": an ex-holder of a role
    }
    return span(i, nextIndex + 1);
  }

  // "the last option", "the second approach": one of a list the summary may leave out.
  if (word === 'the' && ORDINAL_PICKS.has(next) && !pairedEarlier(tokens, i)) {
    const nounIndex = nextWord(tokens, nextIndex + 1);
    const noun = nounIndex === nextIndex + 1 ? tokens[nounIndex]!.lower : '';
    // Not "the last one": "of the three ferries, the last one" names its list in the same breath.
    if ((FORMER_ANAPHORIC.has(noun) && noun !== 'one' && noun !== 'two') || LIST_MEMBERS.has(noun)) return span(i, nounIndex + 1);
  }

  if (word === 'above' || word === 'below') {
    if (prevWord === 'the' && word === 'above') return span(prev, i + 1);
    if (POINTING_PARTICIPLES.has(prevWord)) return span(prev, i + 1);
    if (word === 'above' && next === 'all') return null;
    // Look past closing quotes: 'crates "above" libstd' is a preposition.
    let after = i + 1;
    while (after < tokens.length && tokens[after]!.kind === 'punct' && /["'”’»]/.test(tokens[after]!.text)) after++;
    const following = tokens[after];
    const pointer = !following || (following.kind === 'punct' ? /[.,;:!?)\]]/.test(following.text) : AFTER_POINTER.has(following.lower));
    // "the steps above must ...", "the table below."; but not "temperatures below zero".
    return pointer && prev >= 0 && !FUNCTION_WORDS.has(prevWord) ? span(i, i + 1) : null;
  }

  if (word === 'as' && nextIndex === i + 1) {
    // "As mentioned", "as noted earlier", "as we saw", "as before"
    if (next === 'before' || next === 'previously') return span(i, nextIndex + 1);
    let verb = nextIndex;
    if (next === 'we' || next === 'i') {
      verb = nextWord(tokens, nextIndex + 1);
      if (verb >= 0 && /^(have|had)$/.test(tokens[verb]!.lower)) verb = nextWord(tokens, verb + 1);
    }
    if (verb < 0 || !POINTING_PARTICIPLES.has(tokens[verb]!.lower) && !/^(saw|discussed|mentioned|noted)$/.test(tokens[verb]!.lower)) return null;
    if (tokens[verb]!.lower === 'see') return null;
    const after = verb + 1 < tokens.length ? tokens[verb + 1]! : undefined;
    if (after && isWord(after) && /^(in|by|on|at|under|from)$/.test(after.lower)) {
      // "as described in the style guide" names its source; "as discussed in the previous section" does not.
      const place = tokens.slice(verb + 2, verb + 5).filter(isWord).map((t) => t.lower);
      return place.some((w) => INTERNAL_PLACES.has(w)) ? span(i, verb + 1) : null;
    }
    // "as described here" points at the sentence's own surroundings, which the reader sees.
    if (after && isWord(after) && after.lower === 'here') return null;
    const pointer = after && isWord(after) && /^(earlier|above|before|previously|below)$/.test(after.lower);
    return span(i, pointer ? verb + 2 : verb + 1);
  }

  if ((word === 'previous' || word === 'preceding') && prevWord === 'the' && DOCUMENT_PARTS.has(next)) return span(prev, nextIndex + 1);
  // Forward: "The following example shows ..." points at a block the summary leaves out.
  if (word === 'following' && prevWord === 'the' && (DOCUMENT_PARTS.has(next) || FORWARD_PARTS.has(next))) return span(prev, nextIndex + 1);

  if (word === 'earlier' && POINTING_PARTICIPLES.has(prevWord)) return span(prev, i + 1);
  if (word === 'see' && (next === 'above' || next === 'below')) return span(i, nextIndex + 1);
  return null;
}

/** "get_mut and into_inner ..., however the latter ...": the pair is named in the same sentence. */
function pairedEarlier(tokens: readonly Token[], i: number): boolean {
  let words = 0;
  let coordination = false;
  for (let j = 0; j < i; j++) {
    if (!isWord(tokens[j])) continue;
    words++;
    if (/^(and|or|versus|vs)$/.test(tokens[j]!.lower)) coordination = true;
  }
  return coordination && words >= 4;
}

function additiveTriggers(layout: ClauseLayout): FoundTrigger[] {
  const { tokens } = layout;
  const found: FoundTrigger[] = [];
  let words = 0;
  const connectiveEnd = layout.connective && layout.connective.connective.role !== 'subordinating' ? layout.connective.next : 0;
  const lastWord = previousWord(tokens, tokens.length);

  for (let i = layout.mainStart; i < tokens.length && words < ADDITIVE_WINDOW; i++) {
    const token = tokens[i]!;
    if (!isWord(token)) continue;
    words++;
    if (i < connectiveEnd) continue;
    if (token.lower === 'also' && isAdditiveAlso(tokens, i)) found.push(additive(i, i + 1));
    if (i === layout.mainStart && token.lower === 'another') found.push(additive(i, Math.min(i + 2, tokens.length)));
    if (i === layout.mainStart && token.lower === 'the') {
      const other = nextWord(tokens, i + 1);
      const noun = other >= 0 ? nextWord(tokens, other + 1) : -1;
      if (other === i + 1 && tokens[other]!.lower === 'other' && noun === other + 1 && tokens[noun]!.lower !== 'hand') {
        found.push(additive(i, noun + 1));
      }
    }
  }

  if (lastWord >= 0) {
    const last = tokens[lastWord]!.lower;
    const before = previousWord(tokens, lastWord);
    const beforeWord = before >= 0 ? tokens[before]!.lower : '';
    if (last === 'too' && atSentenceEnd(tokens, lastWord) && !/^(me|far|much|way)$/.test(beforeWord)) found.push(additive(lastWord, lastWord + 1));
    if (last === 'either' && atSentenceEnd(tokens, lastWord) && before >= 0) found.push(additive(lastWord, lastWord + 1));
    if (last === 'well' && beforeWord === 'as' && atSentenceEnd(tokens, lastWord)) found.push(additive(before, lastWord + 1));
  }
  return found;
}

function isAdditiveAlso(tokens: readonly Token[], i: number): boolean {
  const prev = previousWord(tokens, i);
  // "See also ..." is a cross-reference, not an addition.
  if (prev >= 0 && /^(and|but|or|only|see)$/.test(tokens[prev]!.lower)) return false;
  const next = nextWord(tokens, i + 1);
  if (next >= 0 && /^(known|called|referred|named|spelled|spelt)$/.test(tokens[next]!.lower)) return false;
  // "not only ... but also" adds inside the sentence.
  for (let j = 0; j < i; j++) if (tokens[j]!.lower === 'only' && tokens[j - 1]?.lower === 'not') return false;
  return true;
}

function span(first: number, last: number): FoundTrigger {
  return { trigger: 'backReference', first, last };
}

function additive(first: number, last: number): FoundTrigger {
  return { trigger: 'additive', first, last };
}
