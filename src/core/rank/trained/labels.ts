/**
 * Training labels: a body sentence is positive when it is the closest match of some reference
 * sentence. Kupiec et al. (1995) matched abstract sentences to document sentences by hand-checked
 * "direct match" and "direct join"; a best match by term overlap is the automatic stand-in.
 */
import { greedyOracle } from '../../evaluate/oracle';
import { tokenizeText } from '../../evaluate/rouge';
import { contentTerms, wordTokens } from '../../text/tokens';
import type { AnalyzedDocument } from '../../types';

/** Below this unigram F1 a "best" match shares too little to count as a match at all (ours). */
export const MIN_MATCH_F1 = 0.2;

/** Unigram F1 of two term lists, counting repeats up to the smaller frequency. */
export function termOverlapF1(a: readonly string[], b: readonly string[]): number {
  if (a.length === 0 || b.length === 0) return 0;
  const counts = new Map<string, number>();
  for (const term of b) counts.set(term, (counts.get(term) ?? 0) + 1);
  let shared = 0;
  for (const term of a) {
    const left = counts.get(term) ?? 0;
    if (left > 0) {
      shared++;
      counts.set(term, left - 1);
    }
  }
  if (shared === 0) return 0;
  const precision = shared / a.length;
  const recall = shared / b.length;
  return (2 * precision * recall) / (precision + recall);
}

/** One label per body sentence: 1 when it best matches at least one reference sentence. */
export function labelSentences(a: AnalyzedDocument, referenceSentences: readonly string[], minF1 = MIN_MATCH_F1): Uint8Array {
  const labels = new Uint8Array(a.doc.sentences.length);
  for (const reference of referenceSentences) {
    const terms = contentTerms(wordTokens(reference), a.language);
    let best = -1;
    let bestF1 = minF1;
    a.terms.forEach((sentenceTerms, i) => {
      const f1 = termOverlapF1(sentenceTerms, terms);
      // Strictly better only, so ties go to the earlier sentence.
      if (f1 > bestF1 || (best === -1 && f1 === bestF1 && f1 > 0)) {
        best = i;
        bestF1 = f1;
      }
    });
    if (best >= 0) labels[best] = 1;
  }
  return labels;
}

/** How training labels are chosen: Kupiec-style best matches, the greedy oracle's picks, or either. */
export type LabelRule = 'best-match' | 'oracle' | 'either';
export const LABEL_RULES: readonly LabelRule[] = ['best-match', 'oracle', 'either'];

/**
 * The sentences the greedy ROUGE oracle (evaluate/oracle.ts) picks at the reference's length:
 * the extract a ROUGE-scored summary should come closest to (stemmed tokens, as the benchmark scores).
 */
export function oracleLabels(a: AnalyzedDocument, referenceSentences: readonly string[]): Uint8Array {
  const labels = new Uint8Array(a.doc.sentences.length);
  const options = { stem: true };
  const picked = greedyOracle({
    sentences: a.doc.sentences.map((s) => tokenizeText([s.text], options).flat()),
    wordCounts: a.words.map((w) => w.length),
    reference: tokenizeText(referenceSentences, options).flat(),
    wordLimit: referenceSentences.reduce((sum, s) => sum + wordTokens(s).length, 0),
  });
  for (const i of picked) labels[i] = 1;
  return labels;
}

export function labelsBy(rule: LabelRule, a: AnalyzedDocument, referenceSentences: readonly string[]): Uint8Array {
  if (rule === 'best-match') return labelSentences(a, referenceSentences);
  const oracle = oracleLabels(a, referenceSentences);
  if (rule === 'oracle') return oracle;
  const match = labelSentences(a, referenceSentences);
  return oracle.map((label, i) => label | match[i]!);
}
