/**
 * Per-language resources: stop words from the `stopword` package and stemmers from `natural`.
 *
 * Each list and each stemmer is imported from its own module, never through a package index, so
 * a bundle carries only these and not the rest of either package.
 */

import { ara } from 'stopword/src/stopwords_ara.js';
import { dan } from 'stopword/src/stopwords_dan.js';
import { deu } from 'stopword/src/stopwords_deu.js';
import { eng } from 'stopword/src/stopwords_eng.js';
import { fas } from 'stopword/src/stopwords_fas.js';
import { fin } from 'stopword/src/stopwords_fin.js';
import { fra } from 'stopword/src/stopwords_fra.js';
import { ind } from 'stopword/src/stopwords_ind.js';
import { ita } from 'stopword/src/stopwords_ita.js';
import { jpn } from 'stopword/src/stopwords_jpn.js';
import { kor } from 'stopword/src/stopwords_kor.js';
import { nld } from 'stopword/src/stopwords_nld.js';
import { nob } from 'stopword/src/stopwords_nob.js';
import { pol } from 'stopword/src/stopwords_pol.js';
import { por } from 'stopword/src/stopwords_por.js';
import { rus } from 'stopword/src/stopwords_rus.js';
import { spa } from 'stopword/src/stopwords_spa.js';
import { swe } from 'stopword/src/stopwords_swe.js';
import { ukr } from 'stopword/src/stopwords_ukr.js';
import { zho } from 'stopword/src/stopwords_zho.js';
import type { LanguageCode } from './language-codes';
import porterDe from 'natural/lib/natural/stemmers/porter_stemmer_de.js';
import porterEn from 'natural/lib/natural/stemmers/porter_stemmer.js';
import porterEs from 'natural/lib/natural/stemmers/porter_stemmer_es.js';
import porterFa from 'natural/lib/natural/stemmers/porter_stemmer_fa.js';
import porterFr from 'natural/lib/natural/stemmers/porter_stemmer_fr.js';
import porterIt from 'natural/lib/natural/stemmers/porter_stemmer_it.js';
import porterNl from 'natural/lib/natural/stemmers/porter_stemmer_nl.js';
import porterNo from 'natural/lib/natural/stemmers/porter_stemmer_no.js';
import porterPt from 'natural/lib/natural/stemmers/porter_stemmer_pt.js';
import porterRu from 'natural/lib/natural/stemmers/porter_stemmer_ru.js';
import porterSv from 'natural/lib/natural/stemmers/porter_stemmer_sv.js';
import porterUk from 'natural/lib/natural/stemmers/porter_stemmer_uk.js';

/** Writing system, used to narrow language detection before counting stop words. */
export type Script = 'latin' | 'cyrillic' | 'arabic' | 'han' | 'kana' | 'hangul';

export interface Language {
  /** ISO 639-1 code. */
  readonly code: LanguageCode;
  readonly script: Script;
  readonly stopWords: readonly string[];
  /** null: no stemmer available (natural's Polish stemmer, for one, returns words unchanged). */
  readonly stem: ((word: string) => string) | null;
}

/**
 * English function words missing from the package's short English list, plus Latin abbreviations
 * ("e.g"); without them words such as "she", "will" or "not" would count as content (common
 * practice, no source).
 */
const ENGLISH_EXTRA = [
  'she', 'its', 'will', 'not', 'no', 'nor', 'so', 'us', 'ours', 'yours', 'hers', 'theirs', 'itself',
  'themselves', 'ourselves', 'yourself', 'yourselves', 'myself', 'herself', 'does', 'doing', 'done',
  'having', 'just', 'why', 'when', 'whom', 'whose', 'again', 'against', 'above', 'below', 'down',
  'off', 'once', 'few', 'own', 'until', 'upon', 'onto', 'within', 'without', 'across', 'among',
  'per', 'via', 'yet', 'however', 'although', 'though', 'shall', 'may', 'cannot', 'every',
  'either', 'neither', 'whether', 'even', 'ever', 'else', 'also', 'there', 'then', 'too', 'let',
  "can't", "don't", "doesn't", "didn't", "isn't", "aren't", "wasn't", "weren't", "won't",
  "wouldn't", "shouldn't", "couldn't", "haven't", "hasn't", "hadn't", "it's", "i'm", "you're",
  "we're", "they're", "i've", "you've", "we've", "they've", "i'll", "you'll", "we'll", "they'll",
  "he's", "she's", "that's", "there's", "what's", "let's", "i'd", "you'd", "he'd", "she'd",
  'e.g', 'i.e', 'etc', 'vs', 'cf', 'viz',
];

/** Ordered by preference: on a tie, detection picks the earlier language. */
export const LANGUAGES: readonly Language[] = [
  { code: 'en', script: 'latin', stopWords: [...eng, ...ENGLISH_EXTRA], stem: (w) => porterEn.stem(w) },
  { code: 'de', script: 'latin', stopWords: deu, stem: (w) => porterDe.stem(w) },
  { code: 'fr', script: 'latin', stopWords: fra, stem: (w) => porterFr.stem(w) },
  { code: 'es', script: 'latin', stopWords: spa, stem: (w) => porterEs.stem(w) },
  { code: 'it', script: 'latin', stopWords: ita, stem: (w) => porterIt.stem(w) },
  { code: 'pt', script: 'latin', stopWords: por, stem: (w) => porterPt.stem(w) },
  { code: 'nl', script: 'latin', stopWords: nld, stem: (w) => porterNl.stem(w) },
  { code: 'sv', script: 'latin', stopWords: swe, stem: (w) => porterSv.stem(w) },
  { code: 'no', script: 'latin', stopWords: nob, stem: (w) => porterNo.stem(w) },
  { code: 'da', script: 'latin', stopWords: dan, stem: null },
  { code: 'fi', script: 'latin', stopWords: fin, stem: null },
  { code: 'pl', script: 'latin', stopWords: pol, stem: null },
  // natural's Indonesian stemmer carries a 300 KB dictionary; stop words alone keep the bundle small.
  { code: 'id', script: 'latin', stopWords: ind, stem: null },
  { code: 'ru', script: 'cyrillic', stopWords: rus, stem: (w) => porterRu.stem(w) },
  { code: 'uk', script: 'cyrillic', stopWords: ukr, stem: (w) => porterUk.stem(w) },
  { code: 'fa', script: 'arabic', stopWords: fas, stem: (w) => porterFa.stem(w) },
  { code: 'ar', script: 'arabic', stopWords: ara, stem: null },
  { code: 'ja', script: 'kana', stopWords: jpn, stem: null },
  { code: 'zh', script: 'han', stopWords: zho, stem: null },
  { code: 'ko', script: 'hangul', stopWords: kor, stem: null },
];

const BY_CODE: ReadonlyMap<string, Language> = new Map(LANGUAGES.map((language) => [language.code, language]));

/** The language for an ISO 639-1 code (region suffixes such as "en-GB" ignored), or undefined. */
export function languageFor(code: string): Language | undefined {
  // Called for every stem and stop-word lookup, so each code string is resolved once.
  if (resolved.has(code)) return resolved.get(code);
  const language = BY_CODE.get(code.toLowerCase().split(/[-_]/)[0] ?? '');
  if (resolved.size >= MAX_RESOLVED_CODES) resolved.clear();
  resolved.set(code, language);
  return language;
}

const resolved = new Map<string, Language | undefined>();
/** Codes come from settings and detection, a handful; the bound only guards against odd callers. */
const MAX_RESOLVED_CODES = 64;
