/**
 * The abstract check's result: plain, JSON-serialisable data so the command line can print it as
 * JSON and the editor can post it to a webview unchanged.
 *
 * Indices: `sentence` fields are indices into the checked document's `ParsedDocument.sentences`;
 * `abstractSentence` fields are indices into `AbstractCheck.abstract.sentences`.
 */
import type { DocumentFormat, Span } from '../types';

/** Where the abstract comes from: a section of the document, or text supplied separately. */
export type AbstractSource =
  | { readonly kind: 'heading'; readonly heading: string }
  | { readonly kind: 'text'; readonly text: string; readonly format?: DocumentFormat };

export interface SupportingSentence {
  readonly sentence: number;
  readonly text: string;
  readonly span: Span;
  /** Balance unit the sentence belongs to (its section index), and that unit's heading. */
  readonly section: number;
  readonly heading: string;
  /** Tf-idf cosine with the abstract sentence, 0-1. */
  readonly similarity: number;
}

export interface AbstractSentenceCheck {
  readonly index: number;
  readonly text: string;
  /** Where the sentence is in the checked document; null for an abstract supplied as separate text. */
  readonly span: Span | null;
  /** The most similar body sentences, best first (at most three). */
  readonly support: readonly SupportingSentence[];
  /** Best support similarity (0 when nothing in the body shares a content term). */
  readonly similarity: number;
  /** False for a lead-in ("as follows:") or a sentence with almost no content words; never flagged. */
  readonly claim: boolean;
  /** False when a claim's best support is below `thresholds.supported`: the body may not back it. */
  readonly supported: boolean;
}

export interface SectionCoverage {
  /**
   * Section index of the balance unit. 0 is the text before the first section heading (under a
   * lone title); it is judged only when the abstract is not the document's opening section.
   */
  readonly section: number;
  /** The unit's heading; '' for unit 0. */
  readonly heading: string;
  readonly span: Span;
  /** Content sentences of the unit (sub-sections included, the abstract itself excluded). */
  readonly sentenceCount: number;
  /** Highest similarity between any of the unit's sentences and any abstract sentence. */
  readonly similarity: number;
  /** The abstract sentence and the unit sentence behind `similarity` (null when it is 0). */
  readonly abstractSentence: number | null;
  readonly sentence: number | null;
  readonly sentenceSpan: Span | null;
  /** False when `similarity` is below `thresholds.covered`: the abstract seems to leave this section out. */
  readonly covered: boolean;
}

/** A balance unit too short to judge fairly (a one-line section is "uncovered" almost by definition). */
export interface UnjudgedSection {
  readonly section: number;
  readonly heading: string;
  readonly contentTerms: number;
}

export interface RougeTriple {
  readonly rouge1: RougeFigures;
  readonly rouge2: RougeFigures;
  readonly rougeL: RougeFigures;
}

export interface RougeFigures {
  readonly precision: number;
  readonly recall: number;
  readonly f1: number;
}

/** How close the hand-written abstract is to Tersely's own summary of the same length. */
export interface AbstractRougeComparison {
  /** Word budget given to the summary: the abstract's word count. */
  readonly words: number;
  readonly summaryWords: number;
  /** The comparison summary's sentences, in document order. */
  readonly summary: readonly { readonly sentence: number; readonly text: string; readonly span: Span }[];
  /** The abstract as candidate, the summary as reference. */
  readonly abstractAgainstSummary: RougeTriple;
  /** The summary as candidate, the abstract as reference. */
  readonly summaryAgainstAbstract: RougeTriple;
}

export interface AbstractThresholds {
  readonly covered: number;
  readonly supported: number;
  readonly minSectionTerms: number;
}

export interface AbstractCheck {
  readonly ok: true;
  readonly language: string;
  readonly abstract: {
    readonly origin: 'section' | 'text';
    /** Heading of the abstract section (null for separate text). */
    readonly heading: string | null;
    readonly section: number | null;
    readonly span: Span | null;
    readonly words: number;
    readonly sentences: readonly AbstractSentenceCheck[];
  };
  /** One entry per judged balance unit of the body, in document order. */
  readonly sections: readonly SectionCoverage[];
  readonly unjudgedSections: readonly UnjudgedSection[];
  /** Section indices of the units the abstract leaves out (`covered === false`). */
  readonly uncoveredSections: readonly number[];
  /** Indices of the abstract sentences the body may not support (`supported === false`). */
  readonly unsupportedSentences: readonly number[];
  readonly thresholds: AbstractThresholds;
  /** Null when no comparison summary could be made (the reason is in `notices`). */
  readonly rouge: AbstractRougeComparison | null;
  readonly notices: readonly string[];
}

/** Why no check was made: `noAbstract` when the document has no abstract section to find (the caller says how to name one). */
export type AbstractCheckFailure = 'noAbstract' | 'missingHeading' | 'emptyAbstract' | 'noBody' | 'refused';

export interface AbstractCheckError {
  readonly ok: false;
  readonly reason: AbstractCheckFailure;
  readonly error: string;
}

export type AbstractReport = AbstractCheck | AbstractCheckError;
