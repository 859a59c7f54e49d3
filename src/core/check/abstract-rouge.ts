/**
 * Compares a hand-written abstract with Tersely's own summary of the same length, in both
 * directions, with ROUGE-1, ROUGE-2 and ROUGE-L (Lin 2004; see evaluate/rouge.ts).
 *
 * Both texts are passed as sentence lists so ROUGE-L can use its summary-level (union LCS) form.
 * Tokens are Porter-stemmed, stop words kept: the usual reporting setting (Lin's `-m`; common
 * practice, no source).
 */
import { rougeL, rougeN, type RougeOptions } from '../evaluate/rouge';
import type { Span } from '../types';
import type { AbstractRougeComparison, RougeTriple } from './abstract-report';

export interface RougeComparisonInput {
  readonly abstractSentences: readonly string[];
  readonly summary: readonly { readonly sentence: number; readonly text: string; readonly span: Span }[];
  readonly words: number;
  readonly summaryWords: number;
  readonly language: string;
}

export function compareWithSummary(input: RougeComparisonInput): AbstractRougeComparison {
  const options: RougeOptions = { stem: true, language: input.language };
  const summarySentences = input.summary.map((s) => s.text);
  return {
    words: input.words,
    summaryWords: input.summaryWords,
    summary: input.summary.map(({ sentence, text, span }) => ({ sentence, text, span: { start: span.start, end: span.end } })),
    abstractAgainstSummary: rougeTriple(input.abstractSentences, summarySentences, options),
    summaryAgainstAbstract: rougeTriple(summarySentences, input.abstractSentences, options),
  };
}

function rougeTriple(candidate: readonly string[], reference: readonly string[], options: RougeOptions): RougeTriple {
  // A bare string[] would mean "several references"; wrap it so it is one reference of several sentences.
  const references = [reference];
  return {
    rouge1: plain(rougeN(candidate, references, 1, options)),
    rouge2: plain(rougeN(candidate, references, 2, options)),
    rougeL: plain(rougeL(candidate, references, options)),
  };
}

/** Copies the three figures so the report holds plain data whatever the scorer returns. */
function plain(score: { precision: number; recall: number; f1: number }): RougeTriple['rouge1'] {
  return { precision: score.precision, recall: score.recall, f1: score.f1 };
}
