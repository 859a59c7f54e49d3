/**
 * Word lists that decide whether a period after a word ends a sentence.
 *
 * The lists are mostly English, with a few German, French and Spanish entries (common practice,
 * no source). Each word is in one list, stored lower-cased without its final period.
 */

/** What a period after this word means for the sentence boundary. */
export type AbbreviationKind =
  /** Stands before a name ("Dr. Lee", "Mt. Fuji"): the next capital does not start a sentence. */
  | 'title'
  /** Usually followed by a number ("p. 55", "Fig. 3", "Jan. 5"). */
  | 'numeric'
  /** Introduces what follows ("e.g.", "vs.", "cf."): never ends a sentence. */
  | 'introducer'
  /**
   * Any other known abbreviation ("Inc.", "Jr.", "etc."): ends a sentence before a capital, and
   * unlike an ordinary word not before a number or symbol ("et al. 2020").
   */
  | 'plain';

const TITLES = [
  'mr', 'mrs', 'ms', 'mx', 'dr', 'prof', 'st', 'mt', 'ft', 'messrs', 'mme', 'mlle', 'rev', 'hon',
  'gen', 'col', 'capt', 'cpt', 'lt', 'sgt', 'cmdr', 'adm', 'maj', 'gov', 'sen', 'rep', 'pres',
  'supt', 'insp', 'fr', 'sr', 'sra', 'srta',
];

const NUMERIC = [
  'p', 'pp', 'no', 'nos', 'nr', 'n°', 'vol', 'vols', 'fig', 'figs', 'ch', 'chap', 'sec', 'sect',
  'art', 'para', 'eq', 'eqs', 'ex', 'tab', 'op', 'ed', 'eds', 'ver', 'pt', 'pts',
  'jan', 'feb', 'mar', 'apr', 'jun', 'jul', 'aug', 'sep', 'sept', 'oct', 'nov', 'dec', 'c',
  'tel', 'min', 'max', 'hr', 'hrs', 'mins', 'secs', 'km', 'kg', 'lb', 'lbs', 'oz',
];

const INTRODUCERS = [
  'e.g', 'i.e', 'eg', 'ie', 'cf', 'vs', 'v', 'viz', 'incl', 'esp', 'resp', 'w.r.t', 'wrt', 'a.k.a',
  'aka', 'approx', 'ca', 'circa', 'nb', 'n.b', 'z.b', 'd.h', 'u.a', 'bzw', 'bspw', 'p.ex', 'cad', 'vgl',
];

const PLAIN = [
  'co', 'corp', 'inc', 'ltd', 'llc', 'plc', 'bros', 'jr', 'etc', 'al', 'dept', 'univ', 'assn',
  'est', 'ave', 'blvd', 'rd', 'hwy', 'sq', 'mon', 'tue', 'tues', 'wed', 'thu', 'thur', 'thurs',
  'fri', 'sat', 'sun', 'govt', 'intl', 'natl', 'misc', 'dist', 'div', 'mfg', 'yr', 'yrs', 'wk',
  'mo', 'mos', 'ibid', 'seq', 'ff', 'abbr', 'usw',
];

const KINDS = new Map<string, AbbreviationKind>();
for (const [kind, words] of [
  ['plain', PLAIN],
  ['numeric', NUMERIC],
  ['title', TITLES],
  ['introducer', INTRODUCERS],
] as const) {
  for (const word of words) KINDS.set(word, kind);
}

/** The kind of a known abbreviation (`word` without its final period, any case), or null. */
export function abbreviationKind(word: string): AbbreviationKind | null {
  return KINDS.get(word.toLowerCase()) ?? null;
}

/**
 * Capitalised words that nearly always begin a sentence. After an ambiguous period (an initial,
 * an acronym such as "U.S.", a title) one of these tips the decision towards a boundary
 * (common practice, no source).
 */
const SENTENCE_STARTERS = new Set([
  'A', 'An', 'The', 'This', 'That', 'These', 'Those', 'It', 'Its', 'He', 'She', 'They', 'We', 'You',
  'I', 'Our', 'My', 'His', 'Her', 'Their', 'There', 'Here', 'What', 'When', 'Where', 'Why', 'Who',
  'How', 'Which', 'However', 'But', 'And', 'So', 'Then', 'Thus', 'Hence', 'Also', 'In', 'On', 'At',
  'For', 'If', 'As', 'After', 'Before', 'Once', 'Since', 'While', 'Although', 'Because', 'Did',
  'Do', 'Does', 'Is', 'Are', 'Was', 'Were', 'Can', 'Could', 'Will', 'Would', 'Should', 'Must',
  'May', 'Not', 'Nor', 'Yet', 'Still', 'Today', 'Yesterday', 'Tomorrow', 'Now', 'Each', 'Every',
  'All', 'Some', 'Many', 'Most', 'Both', 'Neither', 'Either', 'Such', 'Let', 'Please', 'Note',
  'First', 'Second', 'Third', 'Next', 'Finally', 'Other', 'Another', 'One', 'Two', 'Yes', 'No',
]);

export function isSentenceStarter(word: string): boolean {
  return SENTENCE_STARTERS.has(word);
}
