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
  /** The text before the document's first section heading (an introduction serving as the abstract). */
  | { readonly kind: 'opening' }
  | { readonly kind: 'text'; readonly text: string; readonly format?: DocumentFormat };

/** What a consistency finding is about. */
export type FindingKind = 'number' | 'date' | 'version' | 'negation' | 'modality' | 'comparative' | 'identifier';

/** A place in the body: the sentence, the words cited in it, and its line. */
export interface BodyPlace {
  readonly sentence: number;
  /** The cited words (the whole sentence when markup splits them). */
  readonly span: Span;
  readonly sentenceSpan: Span;
  /** 1-based line of `span.start` in the checked text. */
  readonly line: number;
}

/** The abstract says one thing, the body another (or never says it). */
export interface ConsistencyFinding {
  readonly kind: FindingKind;
  /** Index into `AbstractCheck.abstract.sentences`. */
  readonly abstractSentence: number;
  /** The abstract's words, as written ("12 stations"). */
  readonly abstractSays: string;
  /** Where those words are in the checked document (null for an abstract supplied as separate text). */
  readonly abstractSpan: Span | null;
  readonly abstractLine: number | null;
  /** The body's words, or null when the body never says it. */
  readonly bodySays: string | null;
  /** Where the body says it (or says the nearest thing); null when nothing in the body is close. */
  readonly body: BodyPlace | null;
  /** One line for people: "abstract: 12 stations — body, line 40: 21 stations". */
  readonly message: string;
}

export interface SupportingSentence {
  readonly sentence: number;
  readonly text: string;
  readonly span: Span;
  /** 1-based line of the sentence's start in the checked text. */
  readonly line: number;
  /** Balance unit the sentence belongs to (its section index), and that unit's heading. */
  readonly section: number;
  readonly heading: string;
  /** Support strength of this sentence alone, 0-1 (see `AbstractSentenceCheck.similarity`). */
  readonly similarity: number;
  /** The claim's words this sentence supplies. */
  readonly words: readonly string[];
  /** Claim words matched through a word the document uses with them (latent semantic analysis). */
  readonly related: readonly { readonly abstract: string; readonly body: string }[];
}

/**
 * The one rule: a claim is *supported* when its support (one to three body sentences) contains at
 * least `thresholds.supported` of its content (tf-idf cosine, support.ts) and no finding
 * contradicts it; a section is *covered* when it holds a support sentence of a claim that reached
 * the threshold (a contradicted claim still speaks of the section).
 */
export type ClaimVerdict = 'supported' | 'contradicted' | 'unsupported' | 'notAClaim';

export interface CopiedFrom {
  readonly kind: 'verbatim' | 'nearVerbatim';
  /** One body sentence, or two consecutive ones. */
  readonly sentences: readonly number[];
  readonly span: Span;
  readonly line: number;
  /** Share of the claim's word 3-grams found there, 0-1. */
  readonly containment: number;
}

export interface AbstractSentenceCheck {
  readonly index: number;
  readonly text: string;
  /** Where the sentence is in the checked document; null for an abstract supplied as separate text. */
  readonly span: Span | null;
  readonly line: number | null;
  /**
   * Supported or contradicted: the support, best first (one to three sentences). Unsupported: the
   * closest body sentence, for a person to judge (it is not support).
   */
  readonly support: readonly SupportingSentence[];
  /** Support strength: the share of the claim's weighted content terms the support contains, 0-1. */
  readonly similarity: number;
  /** False for a lead-in ("as follows:") or a sentence with almost no content words; never flagged. */
  readonly claim: boolean;
  /** True for a supported sentence and for one that makes no claim; false when flagged. */
  readonly supported: boolean;
  readonly verdict: ClaimVerdict;
  /** Why, in words. */
  readonly reason: string;
  readonly findings: readonly ConsistencyFinding[];
  /** Set when the sentence repeats a body sentence (nearly) word for word. */
  readonly copy: CopiedFrom | null;
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
  /** 1-based line of the section's start. */
  readonly line: number;
  /** Content sentences of the unit (sub-sections included, the abstract itself excluded). */
  readonly sentenceCount: number;
  /** Strongest link (or, when uncovered, closest match) between a unit sentence and an abstract sentence, 0-1. */
  readonly similarity: number;
  /** The abstract sentence and the unit sentence behind `similarity` (null when nothing matches). */
  readonly abstractSentence: number | null;
  readonly sentence: number | null;
  readonly sentenceSpan: Span | null;
  /** True when the unit holds a sentence linked to some abstract sentence (the one rule). */
  readonly covered: boolean;
}

/** A balance unit too short to judge fairly (a one-line section is "uncovered" almost by definition). */
export interface UnjudgedSection {
  readonly section: number;
  readonly heading: string;
  readonly contentTerms: number;
}

/** A piece of key content: a term the body repeats across sections (pyramid-style weight). */
export interface KeyContent {
  /** The word as the body writes it most often. */
  readonly word: string;
  /** Number of sources that use it: balance units, plus the title. */
  readonly weight: number;
  /** Headings of those sources ('' for the opening text, the title as written). */
  readonly sources: readonly string[];
  readonly covered: boolean;
  /** First body sentence using it, and its line. */
  readonly sentence: number;
  readonly line: number;
}

/** Coverage weighted by importance (after Nenkova & Passonneau 2004's pyramid). */
export interface ContentCoverage {
  /** Covered weight / total weight of the key content, 0-1 (1 when there is no key content). */
  readonly share: number;
  readonly coveredWeight: number;
  readonly totalWeight: number;
  /** Heaviest first. */
  readonly items: readonly KeyContent[];
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
  /** Share of a claim's weighted content its support must contain (the one rule). */
  readonly supported: number;
  /** Units with fewer content terms are listed as unjudged. */
  readonly minSectionTerms: number;
}

export interface AbstractCheck {
  readonly ok: true;
  readonly language: string;
  readonly abstract: {
    readonly origin: 'section' | 'opening' | 'text';
    /** Heading of the abstract section (null for the opening text and separate text). */
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
  /** Indices of the abstract sentences that are flagged (`supported === false`: unsupported or contradicted). */
  readonly unsupportedSentences: readonly number[];
  /** Of those, the ones a finding contradicts. */
  readonly contradictedSentences: readonly number[];
  /** Every finding, in abstract order. */
  readonly findings: readonly ConsistencyFinding[];
  readonly content: ContentCoverage;
  /** Abstract sentences that copy the body, and the share of the abstract's words they hold. */
  readonly copied: { readonly sentences: readonly number[]; readonly share: number };
  /** The one rule for "supported" and "covered", in words (the same for every surface). */
  readonly rule: string;
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
