/**
 * The engine's shared vocabulary.
 *
 * Position convention (one for the whole engine): offsets are 0-based UTF-16 code units into the
 * ORIGINAL document string (what the editor API uses), ranges are half-open `[start, end)`.
 * When a selection is summarized, the caller passes the selected substring and its start offset;
 * every span the engine returns is already in whole-document coordinates.
 */

/** Half-open `[start, end)` range of UTF-16 code units in the whole document. */
export interface Span {
  readonly start: number;
  readonly end: number;
}

export type DocumentFormat = 'markdown' | 'plaintext' | 'restructuredtext';

/** What kind of block a sentence came from; rankers and the coherence checker use it. */
export type BlockKind = 'paragraph' | 'listItem' | 'quote' | 'tableCell';

/** Why a stretch of the source was not treated as prose. Reported so users can see what was left out. */
export type SkipReason =
  | 'code'
  | 'html'
  | 'frontMatter'
  | 'definition'
  | 'image'
  | 'table'
  | 'tableOfContents'
  | 'thematicBreak'
  | 'metadata'
  | 'checklist'
  | 'linkList'
  | 'badge'
  | 'comment'
  | 'excludedSection'
  /** reStructuredText: a directive whose body is not prose (or that is not known to hold prose). */
  | 'directive'
  /** reStructuredText: command-line option lists. */
  | 'optionList'
  /** reStructuredText: line blocks (`| ` lines: addresses, verse). */
  | 'lineBlock'
  /** reStructuredText: the document subtitle (it belongs to the title, not to a section). */
  | 'subtitle'
  /** Markup the format's reference parser rejects (an inconsistent title level, a broken table). */
  | 'malformed';

export interface Skipped {
  readonly reason: SkipReason;
  readonly span: Span;
}

export interface Section {
  /** Position in `ParsedDocument.sections`; section 0 is always the root (depth 0, no heading). */
  readonly index: number;
  /** Heading text with inline markup stripped; '' for the root. */
  readonly heading: string;
  /** 1-6 for headings, 0 for the root. */
  readonly depth: number;
  /** The heading line itself, or null for the root. */
  readonly headingSpan: Span | null;
  /** From the heading's start to the start of the next heading of the same or lower depth. */
  readonly span: Span;
  /** Index of the enclosing section (the root's parent is null). */
  readonly parent: number | null;
}

export interface Paragraph {
  readonly index: number;
  readonly kind: BlockKind;
  readonly span: Span;
  readonly section: number;
  /** Nesting depth for list items (0 = top-level item); 0 otherwise. */
  readonly listDepth: number;
  /** For a list item: the index of the paragraph that introduces the list (the line just before it), or null. */
  readonly leadIn: number | null;
  /** Indices into `ParsedDocument.sentences`, in order. */
  readonly sentences: readonly number[];
}

export interface Sentence {
  /** Position in `ParsedDocument.sentences` (document order). */
  readonly index: number;
  /** Normalized text: inline markup stripped, link text kept, URLs dropped, inline code kept as text. */
  readonly text: string;
  readonly span: Span;
  readonly section: number;
  readonly paragraph: number;
  /** 0-based position of the sentence in its paragraph, and the paragraph's sentence count. */
  readonly positionInParagraph: number;
  readonly paragraphLength: number;
  /** 0-based position among the content sentences of its section, and their count. */
  readonly positionInSection: number;
  readonly sectionLength: number;
}

export interface ParsedDocument {
  /** The text that was analysed (a whole document or a selection). */
  readonly text: string;
  /** Offset of `text` in the whole document; all spans already include it. */
  readonly baseOffset: number;
  readonly format: DocumentFormat;
  /** First H1 (or plain-text equivalent), if any. */
  readonly title: string | null;
  readonly sections: readonly Section[];
  readonly paragraphs: readonly Paragraph[];
  readonly sentences: readonly Sentence[];
  readonly skipped: readonly Skipped[];
}

/** Per-sentence token views, built once and shared by every ranker. */
export interface AnalyzedDocument {
  readonly doc: ParsedDocument;
  /** Language code used for stop words and stemming (ISO 639-1, e.g. 'en'). */
  readonly language: string;
  /** Lower-cased word tokens of each sentence (stop words kept). */
  readonly words: readonly (readonly string[])[];
  /** Stemmed content terms of each sentence (stop words removed). */
  readonly terms: readonly (readonly string[])[];
  /** Stemmed content terms of the title. */
  readonly titleTerms: readonly string[];
  /** Stemmed content terms of each section's heading (index = section index). */
  readonly headingTerms: readonly (readonly string[])[];
}

export type RankerName =
  | 'position'
  | 'luhn'
  | 'edmundson'
  | 'lexrank'
  | 'textrank'
  | 'centroid'
  | 'bayes'
  | 'maxent'
  | 'blend';

/** Per discrete feature: each sentence's value (an index into `labels[feature]`) and what each value means. */
export interface FeatureValues {
  readonly bins: Readonly<Record<string, ArrayLike<number>>>;
  readonly labels: Readonly<Record<string, readonly string[]>>;
}

/** Scores of one ranker: one value per sentence, higher is better; plus named features for explanations. */
export interface RankResult {
  readonly scores: Float64Array;
  /** Optional per-feature values (same length as scores) that explain the score. */
  readonly features?: Readonly<Record<string, Float64Array>>;
  /** Discrete features of a trained model: which value each sentence has, to say what a contribution is for. */
  readonly featureValues?: FeatureValues;
  /** Iterative rankers report whether they converged. */
  readonly converged?: boolean;
  readonly iterations?: number;
}

export interface CueWords {
  readonly bonus: readonly string[];
  readonly stigma: readonly string[];
}

/**
 * 'minutes' is a reading time (WORDS_PER_MINUTE, reading.ts); 'auto' is the default length that
 * grows slowly with the document (reading.ts, autoWords). Both are soft limits like 'ratio'.
 */
export type BudgetUnit = 'sentences' | 'words' | 'ratio' | 'minutes' | 'auto';

export interface Budget {
  readonly unit: BudgetUnit;
  /** A count for sentences/words; a fraction in (0, 1] of the document's words for ratio; minutes; 0 for auto. */
  readonly value: number;
}

/** Why a summary sentence may not stand alone (filled by the coherence checker). */
export type StandAloneTrigger = 'connective' | 'pronoun' | 'demonstrative' | 'backReference' | 'additive';

/** A repair the user (or automatic repair) can apply to a flagged summary sentence. */
export type Repair =
  /** Add the sentence(s) that supply the missing context. */
  | { readonly kind: 'addContext'; readonly sentences: readonly number[] }
  /** Drop the flagged sentence; `replacement` is the next best candidate that does not dangle (or null). */
  | { readonly kind: 'replace'; readonly replacement: number | null }
  /** Show the sentence without its leading connective (display only, never written to the source). */
  | { readonly kind: 'trimConnective'; readonly text: string };

export interface StandAloneWarning {
  /** Index into `ParsedDocument.sentences` of the flagged summary sentence. */
  readonly sentence: number;
  readonly trigger: StandAloneTrigger;
  /** The words that triggered the flag, as written. */
  readonly words: string;
  /** Where those words are in the document. */
  readonly span: Span;
  /** Source sentence(s) that would supply the context. */
  readonly context: readonly number[];
  /** One-line explanation for people. */
  readonly message: string;
  readonly repairs: readonly Repair[];
}

export interface PickedSentence {
  /** Index into `ParsedDocument.sentences`. */
  readonly sentence: number;
  /** Text as shown; differs from the source sentence only when `edited` is set. */
  readonly text: string;
  readonly span: Span;
  /** Headings from the outermost section down to the sentence's own section. */
  readonly sectionPath: readonly string[];
  readonly section: number;
  readonly score: number;
  /** 1 = best-scored sentence of the document. */
  readonly rank: number;
  /** Named feature values behind the score (for "why this sentence"). */
  readonly features: Readonly<Record<string, number>>;
  /** For a trained model's discrete features, the sentence's value in words ("13-25" for length). */
  readonly featureValues?: Readonly<Record<string, string>>;
  /** Set when the displayed text was edited by a repair (e.g. a leading connective removed). */
  readonly edited?: { readonly reason: string };
}

export interface SummaryStats {
  readonly wordsIn: number;
  readonly wordsOut: number;
  /** wordsOut / wordsIn (0 for an empty document). */
  readonly compression: number;
  readonly sentencesIn: number;
  readonly sentencesOut: number;
  /** Balance units (sections at the balance depth) that have at least one picked sentence. */
  readonly sectionsCovered: number;
  /** Balance units that have any content sentence. */
  readonly sectionsWithContent: number;
  /** Minutes the summary and the whole document take to read at 230 words per minute (common practice, no source). */
  readonly minutesToRead: number;
  readonly documentMinutesToRead: number;
}

/** How the ranking went: iterative methods (LexRank, TextRank) report whether they converged. */
export interface RankingReport {
  readonly converged?: boolean;
  readonly iterations?: number;
}

/** One balance unit: a section at the balance depth with its sub-sections rolled up. */
export interface SectionShare {
  readonly section: number;
  readonly heading: string;
  /** Share of the document's content words (0-1). */
  readonly documentShare: number;
  /** Share of the summary's words (0-1). */
  readonly summaryShare: number;
  readonly picked: number;
  readonly quota: number;
}

/** A key phrase of the document (TextRank keyword extraction, keyphrases/textrank-keywords.ts). */
export interface KeyPhrase {
  /** The phrase as it is most often written (lower case). */
  readonly text: string;
  /** Sum of the TextRank scores of its words. */
  readonly score: number;
  /** How many times it occurs in the text. */
  readonly count: number;
  /** Where it occurs in the source (capped; a phrase interrupted by markup the reader rewrote may have fewer). */
  readonly occurrences: readonly Span[];
}

/** How a focus was applied (present only on a focused summary). */
export interface FocusReport {
  /** The focus as given. */
  readonly text: string;
  /** Its distinct content terms, and how many of them the document uses. */
  readonly terms: number;
  readonly termsFound: number;
  /** Sentences that share a term with the focus: the only ones a focused summary may pick. */
  readonly matchingSentences: number;
}

/** Why a section with content got no sentence in the summary (balance reports it; coverage stays a goal). */
export type LeftOutReason = 'belowQualityFloor' | 'onlyFragments' | 'onlyBarred';

export interface SectionLeftOut {
  /** The balance unit (a section index, as in `shares`). */
  readonly section: number;
  readonly heading: string;
  readonly reason: LeftOutReason;
  /** One line for people. */
  readonly message: string;
}

/** Why a sentence is never picked (select/sentence-kinds.ts). */
export type BarredKind = 'placeholder' | 'boilerplate' | 'byline' | 'metadata' | 'template' | 'apiLine';

export interface Summary {
  readonly document: ParsedDocument;
  readonly method: RankerName;
  readonly language: string;
  /** Picked sentences in document order. */
  readonly sentences: readonly PickedSentence[];
  readonly shares: readonly SectionShare[];
  /** Set when the summary was asked for with a focus. */
  readonly focus?: FocusReport;
  /** The document's key phrases, best first. */
  readonly keyPhrases: readonly KeyPhrase[];
  readonly stats: SummaryStats;
  readonly warnings: readonly StandAloneWarning[];
  readonly ranking: RankingReport;
  /** Plain-language notices (e.g. "the document has no prose sentences"). */
  readonly notices: readonly string[];
  /** Set when no summary was attempted (too large, binary content); the reason, for people. */
  readonly refused?: string;
  /** Sections with content left out as not summary-worthy, and why (set by the engine). */
  readonly leftOut?: readonly SectionLeftOut[];
  /** Sentences never picked because of what they are (placeholders, boilerplate, template text), set by the engine. */
  readonly barred?: readonly { readonly sentence: number; readonly kind: BarredKind }[];
}
