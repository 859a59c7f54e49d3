/**
 * Every sentence-ranking method, described as data: the CLI's --method, the `tersely.method`
 * setting and the panel's method menu read it, and so does the settings manifest (which must not
 * load the rankers themselves). A method is described in people's words (what it looks for); the
 * published name and citation go in the detail. registry.ts binds each name to its ranker.
 */
import type { RankerName } from '../types';

export interface MethodInfo {
  readonly name: RankerName;
  /** What the method looks for, in a few words (menus, settings). */
  readonly label: string;
  /** One sentence on how it works, with the published method it implements. */
  readonly detail: string;
  readonly citation: string;
  /** What the numbers behind "why this sentence" are for this method. */
  readonly numbers: string;
}

/** A trained model's numbers: each feature's share of the log-odds, relative to the document's average sentence. */
const CONTRIBUTIONS = 'Each line below: how far that feature puts this sentence above or below the document’s average sentence (above 0 towards picking, below 0 against).';
/** The other methods' numbers: the scores and counts they work from. */
const INPUTS = 'Each line below: a score or count the method works from (higher counts more).';

const INFO: Readonly<Record<RankerName, Omit<MethodInfo, 'name'>>> = {
  maxent: {
    label: 'Trained on your documents (default)',
    detail: 'A maximum-entropy (logistic regression) sentence model over position, headings, cue phrases and the other methods’ scores, trained by `tersely train --kind maximum-entropy` (the shipped one, or yours).',
    citation: 'Osborne 2002',
    numbers: CONTRIBUTIONS,
  },
  blend: {
    label: 'Balanced blend',
    detail: 'The naive Bayes sentence model, with LexRank centrality and closeness to the centroid added in.',
    citation: 'weights chosen on the benchmark’s train half (bench/RESULTS.md)',
    numbers: INPUTS,
  },
  position: {
    label: 'Opening sentences',
    detail: 'Prefers the first sentences of sections and paragraphs (position method).',
    citation: 'Baxendale 1958',
    numbers: INPUTS,
  },
  luhn: {
    label: 'Key-term density',
    detail: 'Prefers sentences with tight clusters of the document’s significant words (Luhn’s method).',
    citation: 'Luhn 1958',
    numbers: INPUTS,
  },
  edmundson: {
    label: 'Signal phrases',
    detail: 'Weighs cue phrases, title and heading words and position (Edmundson’s method).',
    citation: 'Edmundson 1969',
    numbers: INPUTS,
  },
  lexrank: {
    label: 'Central sentences',
    detail: 'Prefers sentences similar to many others (LexRank: PageRank over tf-idf cosine similarity).',
    citation: 'Erkan & Radev 2004',
    numbers: INPUTS,
  },
  textrank: {
    label: 'Connected sentences',
    detail: 'Prefers sentences that share words with many others (TextRank: PageRank over word overlap).',
    citation: 'Mihalcea & Tarau 2004',
    numbers: INPUTS,
  },
  centroid: {
    label: 'Closest to the main topic',
    detail: 'Prefers sentences close to the document’s average term vector (centroid method).',
    citation: 'Radev et al. 2004',
    numbers: INPUTS,
  },
  bayes: {
    label: 'Trained on your documents, feature by feature',
    detail: 'A naive Bayes sentence model trained by `tersely train --kind naive-bayes` (the shipped one, or yours).',
    citation: 'Kupiec, Pedersen & Chen 1995',
    numbers: CONTRIBUTIONS,
  },
};

/** In menu order: the default first. */
export const METHOD_INFO: readonly MethodInfo[] = (Object.keys(INFO) as RankerName[]).map((name) => ({ name, ...INFO[name] }));

export const METHOD_NAMES: readonly RankerName[] = METHOD_INFO.map((m) => m.name);
