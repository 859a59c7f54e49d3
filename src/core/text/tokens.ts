/**
 * Word tokens, stop words, stems and content terms: the token views every ranker shares.
 */

import { LANGUAGE_CODES } from './language-codes';
import { LANGUAGES, languageFor, type Language, type Script } from './languages';

/** ISO 639-1 codes the engine has stop words for (stemming where `natural` has a stemmer). */
export const SUPPORTED_LANGUAGES: readonly string[] = LANGUAGE_CODES;

/**
 * A word: letters, marks and digits, joined across an inner apostrophe, hyphen or period
 * ("don't", "self-made", "node.js", "3.14") and across a comma between digits ("1,000").
 */
const WORD = /[\p{L}\p{M}\p{N}]+(?:(?:['\u2019\u2010.-]|(?<=\p{N}),(?=\p{N}))[\p{L}\p{M}\p{N}]+)*/gu;
/** Scripts written without spaces whose characters carry meaning one by one. */
const IDEOGRAPHIC = /[\p{sc=Han}\p{sc=Hiragana}\p{sc=Katakana}\p{sc=Hangul}]/u;
const IDEOGRAPHIC_CHAR_OR_RUN =
  /[\p{sc=Han}\p{sc=Hiragana}\p{sc=Katakana}\p{sc=Hangul}]|[^\p{sc=Han}\p{sc=Hiragana}\p{sc=Katakana}\p{sc=Hangul}]+/gu;
/** Scripts written without spaces whose words span several characters. */
const UNSPACED_ALPHABETIC = /[\p{sc=Thai}\p{sc=Lao}\p{sc=Khmer}\p{sc=Myanmar}]/u;
/** Either kind; text without any takes the fast path. */
const UNSPACED_SCRIPT =
  /[\p{sc=Han}\p{sc=Hiragana}\p{sc=Katakana}\p{sc=Hangul}\p{sc=Thai}\p{sc=Lao}\p{sc=Khmer}\p{sc=Myanmar}]/u;

/**
 * Lower-cased word tokens of `text`, numbers included. Han, Kana and Hangul characters become one
 * token each; Thai, Lao, Khmer and Burmese runs are split by `Intl.Segmenter` when the runtime has
 * it (kept whole otherwise), so text in those scripts still yields tokens.
 */
export function wordTokens(text: string): string[] {
  // Lower-casing once, before matching, is much cheaper than once per token.
  const lower = text.toLowerCase();
  const words = lower.match(WORD);
  if (words === null) return [];
  const unspaced = UNSPACED_SCRIPT.test(lower);
  const curly = lower.includes('\u2019');
  const hyphen = lower.includes('\u2010');
  // The common case: every match is a token as it stands.
  if (!unspaced && !curly && !hyphen) return words;
  const tokens: string[] = [];
  for (let word of words) {
    if (curly && word.includes('\u2019')) word = word.replaceAll('\u2019', "'");
    if (hyphen && word.includes('\u2010')) word = word.replaceAll('\u2010', '-');
    if (!unspaced) {
      tokens.push(word);
    } else if (IDEOGRAPHIC.test(word)) {
      for (const piece of word.match(IDEOGRAPHIC_CHAR_OR_RUN) ?? []) pushPiece(tokens, piece);
    } else {
      pushPiece(tokens, word);
    }
  }
  return tokens;
}

function pushPiece(tokens: string[], piece: string): void {
  if (wordSegmenter !== null && UNSPACED_ALPHABETIC.test(piece)) {
    for (const part of wordSegmenter.segment(piece)) {
      if (part.isWordLike) tokens.push(part.segment);
    }
    return;
  }
  // Splitting ideographs off can leave a joiner at an edge ("-x"); it is not part of a word.
  const trimmed = piece.replace(/^['.,-]+|['.,-]+$/g, '');
  if (trimmed !== '') tokens.push(trimmed);
}

/** A fixed locale ('und', undetermined) so the split does not depend on the user's settings. */
const wordSegmenter: Intl.Segmenter | null =
  typeof Intl !== 'undefined' && 'Segmenter' in Intl ? new Intl.Segmenter('und', { granularity: 'word' }) : null;

const stopWordSets = new Map<string, ReadonlySet<string>>();
const EMPTY: ReadonlySet<string> = new Set();

/** Stop words of a language (ISO 639-1); an empty set for a language without a list. */
export function stopWords(lang: string): ReadonlySet<string> {
  const language = languageFor(lang);
  if (language === undefined) return EMPTY;
  let set = stopWordSets.get(language.code);
  if (set === undefined) {
    set = new Set(language.stopWords);
    stopWordSets.set(language.code, set);
  }
  return set;
}

/** Stemming is hot (every token of every sentence), so each language keeps its stems. */
const stemCaches = new Map<string, Map<string, string>>();
/** Bounds memory on huge vocabularies; the cache simply starts over (common practice, no source). */
const MAX_CACHED_STEMS = 200_000;

/**
 * Longer tokens are not words (base64, minified code, hashes) and are left unstemmed: the
 * stemmers' suffix rules take time quadratic in the token's length, minutes for one 200,000-
 * character token (common practice, no source; the longest dictionary words are under 50 letters).
 */
const MAX_STEMMED_LENGTH = 64;

/** Stem of a lower-cased word; the word itself for a language without a stemmer. */
export function stem(word: string, lang: string): string {
  const language = languageFor(lang);
  if (language?.stem == null || word.length > MAX_STEMMED_LENGTH) return word;
  let cache = stemCaches.get(language.code);
  if (cache === undefined) {
    cache = new Map();
    stemCaches.set(language.code, cache);
  }
  let stemmed = cache.get(word);
  if (stemmed === undefined) {
    stemmed = language.stem(word);
    if (cache.size >= MAX_CACHED_STEMS) cache.clear();
    cache.set(word, stemmed);
  }
  return stemmed;
}

/** Tokens shorter than this are dropped as content terms, except ideographs (common practice, no source). */
const MIN_TERM_LENGTH = 2;
/** Parts of hyphenated words are held to a higher bar, so "re-run" and "e-mail" give no "re" or "e". */
const MIN_PART_LENGTH = 3;
const HAS_LETTER = /\p{L}/u;
const HAS_DIGIT_OR_DOT = /[\p{N}.]/u;

/**
 * Content terms of a sentence's word tokens: stop words and very short tokens dropped, hyphenated
 * words split into their parts (so "rate-limit" meets "rate limit"), English possessive "'s"
 * removed, then stemmed. Numbers, versions and file names are kept unstemmed.
 */
export function contentTerms(words: readonly string[], lang: string): string[] {
  const cache = wordTermCache(lang);
  const terms: string[] = [];
  for (const word of words) {
    const own = cachedWordTerms(cache, word, lang);
    for (let k = 0; k < own.length; k++) terms.push(own[k]!);
  }
  return terms;
}

/** contentTerms([word], lang), read-only and without a copy (for callers asking word by word). */
export function wordTerms(word: string, lang: string): readonly string[] {
  return cachedWordTerms(wordTermCache(lang), word, lang);
}

function cachedWordTerms(cache: Map<string, readonly string[]>, word: string, lang: string): readonly string[] {
  let own = cache.get(word);
  if (own === undefined) {
    own = termsOfWord(word, lang);
    if (cache.size >= MAX_CACHED_WORDS) cache.clear();
    cache.set(word, own);
  }
  return own;
}

/**
 * A word's terms depend on the word and the language alone, and a document repeats its words: each
 * language keeps the terms of the words it has seen (bounded like the stems).
 */
const wordTermCaches = new Map<string, Map<string, readonly string[]>>();
const MAX_CACHED_WORDS = 200_000;
const NO_LANGUAGE = '';

function wordTermCache(lang: string): Map<string, readonly string[]> {
  const code = languageFor(lang)?.code ?? NO_LANGUAGE;
  let cache = wordTermCaches.get(code);
  if (cache === undefined) wordTermCaches.set(code, (cache = new Map()));
  return cache;
}

/** The content terms of one word token (see contentTerms). */
function termsOfWord(word: string, lang: string): readonly string[] {
  const stops = stopWords(lang);
  if (stops.has(word)) return NO_TERMS;
  const english = languageFor(lang)?.code === 'en';
  const hyphenated = word.includes('-');
  const minLength = hyphenated ? MIN_PART_LENGTH : MIN_TERM_LENGTH;
  const terms: string[] = [];
  for (let part of hyphenated ? word.split('-') : [word]) {
    if (english && part.endsWith("'s")) part = part.slice(0, -2);
    if (part.startsWith("'") || part.endsWith("'")) part = part.replace(/^'+|'+$/g, '');
    if (part === '' || stops.has(part)) continue;
    if (part.length < minLength && !IDEOGRAPHIC.test(part)) continue;
    terms.push(HAS_DIGIT_OR_DOT.test(part) || !HAS_LETTER.test(part) ? part : stem(part, lang));
  }
  return terms.length === 0 ? NO_TERMS : terms;
}

const NO_TERMS: readonly string[] = [];

/** Characters read to detect the language; enough for a stable stop-word count. */
export const DETECTION_SAMPLE = 20_000;
const LATIN_RUNS = /\p{sc=Latin}+/gu;
/** Runs of each script's characters; counted in code points (see charactersIn). */
const SCRIPT_PATTERNS: readonly (readonly [Script, RegExp])[] = [
  ['latin', LATIN_RUNS],
  ['cyrillic', /\p{sc=Cyrillic}+/gu],
  ['arabic', /\p{sc=Arabic}+/gu],
  ['han', /\p{sc=Han}+/gu],
  ['kana', /[\p{sc=Hiragana}\p{sc=Katakana}]+/gu],
  ['hangul', /\p{sc=Hangul}+/gu],
];

/**
 * Characters (code points) of the text that `runs` matches. Matching runs, not single characters,
 * saves a string per character (a 20 KB sample held some 15,000 Latin ones).
 */
function charactersIn(text: string, runs: RegExp): number {
  let count = 0;
  for (const [run] of text.matchAll(runs)) {
    count += run.length;
    // A run holds whole code points, so each high surrogate starts a pair counted twice above.
    for (let k = 0; k < run.length; k++) {
      const unit = run.charCodeAt(k);
      if (unit >= 0xd800 && unit <= 0xdbff) count--;
    }
  }
  return count;
}

const NON_ASCII_RUNS = /[^\u0000-\u007f]+/g;

/**
 * charactersIn(text, Latin runs), faster: the only Latin characters in ASCII are A-Z and a-z, so
 * those are counted by code and the regular expression reads only the non-ASCII runs (matching
 * every Latin run of a 20 KB sample took a few percent of its summary).
 */
function latinCharacters(text: string): number {
  let count = 0;
  for (let i = 0; i < text.length; i++) {
    const folded = text.charCodeAt(i) | 0x20; // 'A'-'Z' onto 'a'-'z'; no other unit lands there
    if (folded >= 0x61 && folded <= 0x7a) count++;
  }
  for (const [run] of text.matchAll(NON_ASCII_RUNS)) count += charactersIn(run, LATIN_RUNS);
  return count;
}

const byScript = new Map<Script, readonly Language[]>();

/** The languages written in a script, in LANGUAGES order (one array per script, so its stop-word index is built once). */
function languagesOfScript(script: Script): readonly Language[] {
  let list = byScript.get(script);
  if (list === undefined) byScript.set(script, (list = LANGUAGES.filter((language) => language.script === script)));
  return list;
}

/**
 * Language of `text` (ISO 639-1): the dominant script first (Japanese whenever Kana is common,
 * since Japanese mixes Kana with Han), then the language of that script whose stop words occur
 * most often. 'en' when nothing fits. `sampleTokens`, when given, returns what
 * wordTokens(text.slice(0, DETECTION_SAMPLE)) would, from tokens the caller already has.
 */
export function detectLanguage(text: string, sampleTokens?: () => readonly string[]): string {
  const sample = text.slice(0, DETECTION_SAMPLE);
  const counts = new Map<Script, number>();
  for (const [script, runs] of SCRIPT_PATTERNS) counts.set(script, script === 'latin' ? latinCharacters(sample) : charactersIn(sample, runs));
  const kana = counts.get('kana') ?? 0;
  const han = counts.get('han') ?? 0;
  if (kana > 0 && kana * 5 >= han) counts.set('kana', kana + han);
  let script: Script | null = null;
  let best = 0;
  for (const [name, count] of counts) {
    if (count > best) {
      best = count;
      script = name;
    }
  }
  if (script === null) return 'en';
  const candidates = languagesOfScript(script);
  if (candidates.length === 1) return candidates[0]?.code ?? 'en';
  const tokens = sampleTokens ? sampleTokens() : wordTokens(sample);
  return mostStopWords(tokens, candidates) ?? (script === 'latin' ? 'en' : candidates[0]?.code ?? 'en');
}

/** Per list of candidate languages: which of them (by position) have each stop word. */
const stopWordOwners = new WeakMap<readonly Language[], Map<string, number[]>>();

function ownersOf(candidates: readonly Language[]): Map<string, number[]> {
  let owners = stopWordOwners.get(candidates);
  if (owners === undefined) {
    owners = new Map();
    candidates.forEach((language, position) => {
      for (const word of stopWords(language.code)) {
        const list = owners!.get(word);
        if (list === undefined) owners!.set(word, [position]);
        else list.push(position);
      }
    });
    stopWordOwners.set(candidates, owners);
  }
  return owners;
}

/**
 * The candidate with the most stop-word hits (the earlier one on a tie). One lookup per token
 * instead of one per token and language (with a dozen Latin-script languages, 3% of a 20 KB summary).
 */
function mostStopWords(tokens: readonly string[], candidates: readonly Language[]): string | null {
  const owners = ownersOf(candidates);
  const hits = new Array<number>(candidates.length).fill(0);
  for (const token of tokens) {
    const list = owners.get(token);
    if (list !== undefined) for (const position of list) hits[position]!++;
  }
  let bestCode: string | null = null;
  let bestHits = 0;
  for (let position = 0; position < candidates.length; position++) {
    if (hits[position]! > bestHits) {
      bestHits = hits[position]!;
      bestCode = candidates[position]!.code;
    }
  }
  return bestCode;
}

/** Words in a text, counted the way every figure in a summary counts them (the word tokens above). */
export function countWords(text: string): number {
  return wordTokens(text).length;
}
