/**
 * Key phrases by TextRank keyword extraction: Mihalcea & Tarau (2004), "TextRank: Bringing order
 * into texts", EMNLP, section 3.
 *
 * The paper's steps, and what we do at each:
 *  1. Tokenize and keep candidate words through a syntactic filter (nouns and adjectives). We have
 *     no part-of-speech tagger, so the filter is part-of-speech-free: a candidate is a word with a
 *     letter that is not a stop word of the document's language (the `stopword` lists, via
 *     text/tokens.ts), is at least `minWordLength` letters long and is not a number. Words are
 *     merged by stem, so "system" and "systems" are one vertex.
 *  2. Link two candidates when they co-occur within a window of N words; the paper's best setting
 *     is N = 2. Like the paper's Figure 2 the window runs over the candidate sequence of a sentence
 *     (filtered words removed), never across sentences. The graph is undirected and unweighted.
 *  3. Score vertices with PageRank, damping 0.85, until the change drops below 0.0001 (the paper's
 *     threshold), and keep the top T = |V| / 3 (the paper's choice for abstracts); for long texts
 *     T is capped at `maxKeywords`.
 *  4. Collapse: kept words that are adjacent in the text become one multi-word phrase. Adjacent
 *     means next to each other within a clause: a stop word or punctuation ends a phrase.
 * Phrases are ordered by the sum of their words' scores (the paper leaves phrase order open; ours),
 * and a phrase whose words all appear in a phrase above it is left out (ours).
 */
import type { AnalyzedDocument, KeyPhrase, Span } from '../types';
import { stem, stopWords, wordTokens } from '../text/tokens';
import { pageRank } from '../rank/power-iteration';
import type { CsrGraph } from '../rank/similarity-graph';
import { isEnglishNonKeyword } from './english-shapes';
import { phraseMatches } from './phrase-matches';

export interface KeyPhraseSettings {
  readonly window: number;
  readonly damping: number;
  readonly tolerance: number;
  readonly maxIterations: number;
  /** Share of the vertices kept as keywords (the paper: a third). */
  readonly keepShare: number;
  /** Upper bound on kept keywords for long documents (ours). */
  readonly maxKeywords: number;
  /** Phrases reported (ours). */
  readonly maxPhrases: number;
  /** Longest phrase in words (ours); longer runs of keywords count as single words. */
  readonly maxPhraseWords: number;
  /** Shortest candidate word in letters (common practice, no source). */
  readonly minWordLength: number;
  /** Longest candidate word: longer tokens are hashes, base64 or minified code, not words (common practice, no source). */
  readonly maxWordLength: number;
  /** Occurrence spans kept per phrase (ours: bounds the result on huge documents). */
  readonly maxOccurrences: number;
}

export const KEYPHRASE_DEFAULTS: KeyPhraseSettings = {
  window: 2,
  damping: 0.85,
  tolerance: 1e-4,
  maxIterations: 200,
  keepShare: 1 / 3,
  maxKeywords: 30,
  maxPhrases: 10,
  maxPhraseWords: 4,
  minWordLength: 3,
  maxWordLength: 48,
  maxOccurrences: 200,
};

/**
 * What ends a clause (and so a phrase): a web address (its pieces, "https", "www", "html", are not
 * words of the text), a mark followed by space or the end, or a bracket or quote.
 */
const CLAUSE_BREAK = /\b(?:https?|ftp):\/\/\S+|\bwww\.\S+|[,;:.!?](?=\s|$)|[()[\]{}"“”«»|]|\s[-–—]+\s/u;
const HAS_LETTER = /\p{L}/u;
/** Relative difference below which two PageRank scores count as tied (power iteration stops at 1e-4). */
const TIE_TOLERANCE = 1e-3;

/**
 * Part-of-speech-free stand-ins for the paper's noun-and-adjective filter, per language (see
 * english-shapes.ts); a language without an entry keeps every non-stop word.
 */
const NON_KEYWORDS: Readonly<Record<string, (word: string) => boolean>> = { en: isEnglishNonKeyword };

/** Whether a lower-case word is no content word in `language` by the filter above (false for a language without one). */
export function isNonKeyword(word: string, language: string): boolean {
  return NON_KEYWORDS[language]?.(word) ?? false;
}

const NUMBER_LIKE = /^[\p{N}.,'-]+$/u;

interface Clause {
  readonly sentence: number;
  /** Lower-cased tokens of the clause, stop words included. */
  readonly tokens: readonly string[];
}

/** Each sentence split at clause punctuation, then into word tokens. */
function clausesOf(a: AnalyzedDocument, skip?: (sentence: number) => boolean): Clause[] {
  const clauses: Clause[] = [];
  a.doc.sentences.forEach((sentence, index) => {
    if (skip?.(index)) return;
    for (const piece of sentence.text.split(CLAUSE_BREAK)) {
      const tokens = wordTokens(piece);
      if (tokens.length > 0) clauses.push({ sentence: index, tokens });
    }
  });
  return clauses;
}

/**
 * Extracts the document's key phrases. Deterministic: vertices are numbered in order of first
 * appearance. `skip` names sentences not to read (lines that are no content of the document).
 */
export function extractKeyPhrases(a: AnalyzedDocument, overrides: Partial<KeyPhraseSettings> = {}, skip?: (sentence: number) => boolean): KeyPhrase[] {
  const settings: KeyPhraseSettings = { ...KEYPHRASE_DEFAULTS, ...overrides };
  const stops = stopWords(a.language);
  const isCandidate = (word: string) =>
    word.length >= settings.minWordLength && word.length <= settings.maxWordLength && HAS_LETTER.test(word) && !NUMBER_LIKE.test(word) && !stops.has(word) && !isNonKeyword(word, a.language);

  const clauses = clausesOf(a, skip);
  const vertexOf = new Map<string, number>();
  // The filter and the stem depend on the token alone, so each distinct token is judged once.
  const vertexOfToken = new Map<string, number>();
  /** Per clause: the vertex of each token, or -1 for a filtered word (plain arrays: thousands of tiny typed arrays cost more). */
  const clauseVertices: number[][] = [];
  for (const clause of clauses) {
    const vertices = new Array<number>(clause.tokens.length);
    clause.tokens.forEach((token, k) => {
      let id = vertexOfToken.get(token);
      if (id === undefined) {
        id = -1;
        if (isCandidate(token)) {
          const key = stem(token, a.language);
          id = vertexOf.get(key) ?? vertexOf.size;
          if (id === vertexOf.size) vertexOf.set(key, id);
        }
        vertexOfToken.set(token, id);
      }
      vertices[k] = id;
    });
    clauseVertices.push(vertices);
  }
  const n = vertexOf.size;
  if (n === 0) return [];

  // Step 2: co-occurrence edges: two candidates at most `window` − 1 tokens apart in a sentence's
  // token sequence (filtered words keep their place, so a stop word between two words separates them at N = 2).
  const edges = new Set<number>();
  const link = (x: number, y: number) => {
    if (x !== y) edges.add(x < y ? x * n + y : y * n + x);
  };
  let sentence = -1;
  let sequence: number[] = [];
  const flush = () => {
    for (let i = 0; i < sequence.length; i++) {
      if (sequence[i]! < 0) continue;
      for (let j = i + 1; j < Math.min(sequence.length, i + settings.window); j++) if (sequence[j]! >= 0) link(sequence[i]!, sequence[j]!);
    }
    sequence = [];
  };
  clauses.forEach((clause, c) => {
    if (clause.sentence !== sentence) {
      flush();
      sentence = clause.sentence;
    }
    for (const v of clauseVertices[c]!) sequence.push(v);
  });
  flush();

  // Step 3: PageRank over the undirected, unweighted graph.
  const { scores } = pageRank(csrOf(n, edges), settings);
  const keep = Math.min(settings.maxKeywords, Math.max(1, Math.round(n * settings.keepShare)));
  // The keep-th highest score; words tied with it are kept too: the cut never chooses among equals by position.
  const cutScore = Float64Array.from(scores).sort()[n - keep]!;
  const isKeyword = new Uint8Array(n);
  for (let v = 0; v < n; v++) if (scores[v]! >= cutScore * (1 - TIE_TOLERANCE)) isKeyword[v] = 1;

  // Step 4: collapse adjacent keywords into phrases; count them and their written forms.
  interface Tally {
    score: number;
    count: number;
    forms: Map<string, number>;
    sentences: Set<number>;
    firstSeen: number;
  }
  const phrases = new Map<string, Tally>();
  let seen = 0;
  clauses.forEach((clause, c) => {
    const vertices = clauseVertices[c]!;
    let k = 0;
    while (k < vertices.length) {
      if (vertices[k]! < 0 || !isKeyword[vertices[k]!]) {
        k++;
        continue;
      }
      let end = k;
      while (end < vertices.length && vertices[end]! >= 0 && isKeyword[vertices[end]!]) end++;
      const ids = vertices.slice(k, end);
      // A run that repeats a word ("type type") or runs on is not a phrase; its words still count alone.
      if (ids.length > 1 && (ids.length > settings.maxPhraseWords || new Set(ids).size < ids.length)) {
        for (let w = k; w < end; w++) tallyPhrase([vertices[w]!], clause.tokens[w]!, clause.sentence);
        k = end;
        continue;
      }
      tallyPhrase(ids, clause.tokens.slice(k, end).join(' '), clause.sentence);
      k = end;
    }
  });
  function tallyPhrase(ids: readonly number[], form: string, sentenceIndex: number): void {
    const key = ids.join(' ');
    let tally = phrases.get(key);
    if (!tally) {
      tally = { score: ids.reduce((sum, v) => sum + scores[v]!, 0), count: 0, forms: new Map(), sentences: new Set(), firstSeen: seen++ };
      phrases.set(key, tally);
    }
    tally.count++;
    tally.forms.set(form, (tally.forms.get(form) ?? 0) + 1);
    tally.sentences.add(sentenceIndex);
  }

  // A phrase whose words all belong to a phrase ranked above it ("rewards riders", "rider
  // rewards" or "riders" under "riders small rewards") says nothing new and is left out (ours).
  // A superset scores higher (scores are positive sums), so the longer phrase is the one kept.
  const ranked: Tally[] = [];
  const keptWords: Set<number>[] = [];
  for (const [key, tally] of [...phrases].sort(([, x], [, y]) => y.score - x.score || x.firstSeen - y.firstSeen)) {
    if (ranked.length >= settings.maxPhrases) break;
    const words = key.split(' ').map(Number);
    if (keptWords.some((kept) => words.every((w) => kept.has(w)))) continue;
    ranked.push(tally);
    keptWords.push(new Set(words));
  }
  return ranked.map((tally) => {
    const text = mostCommon(tally.forms);
    return { text, score: tally.score, count: tally.count, occurrences: occurrencesOf(a, text, tally.sentences, settings.maxOccurrences) };
  });
}

function mostCommon(forms: ReadonlyMap<string, number>): string {
  let best = '';
  let bestCount = -1;
  for (const [form, count] of forms) if (count > bestCount) [best, bestCount] = [form, count];
  return best;
}

/** Symmetric compressed rows from undirected edge keys (x·n + y, x < y), each row ascending. */
function csrOf(n: number, edges: ReadonlySet<number>): CsrGraph {
  const pairs = [...edges].sort((p, q) => p - q);
  const offsets = new Int32Array(n + 1);
  for (const key of pairs) {
    offsets[Math.floor(key / n) + 1]! += 1;
    offsets[(key % n) + 1]! += 1;
  }
  for (let i = 0; i < n; i++) offsets[i + 1]! += offsets[i]!;
  const fill = offsets.slice(0, n);
  const targets = new Int32Array(2 * pairs.length);
  for (const key of pairs) {
    const x = Math.floor(key / n);
    const y = key % n;
    targets[fill[x]!++] = y;
    targets[fill[y]!++] = x;
  }
  return { size: n, offsets, targets, weights: new Float64Array(targets.length).fill(1) };
}

/**
 * Spans of a phrase in the source of the sentences that hold it: its words in order, any case,
 * separated by anything that is not a letter or digit (markup, line breaks), never inside a word
 * (phrase-matches.ts).
 */
function occurrencesOf(a: AnalyzedDocument, phrase: string, sentences: ReadonlySet<number>, limit: number): Span[] {
  const { doc } = a;
  const spans: Span[] = [];
  for (const index of [...sentences].sort((x, y) => x - y)) {
    const { span } = doc.sentences[index]!;
    const source = doc.text.slice(span.start - doc.baseOffset, span.end - doc.baseOffset);
    for (const match of phraseMatches(source, phrase)) {
      if (spans.length >= limit) return spans;
      spans.push({ start: span.start + match.start, end: span.start + match.end });
    }
  }
  return spans;
}
