/**
 * Matches an abstract against the body it summarizes:
 *   1. each abstract sentence is aligned with the body sentences that back it (support.ts), with
 *      paraphrase tolerance from stems, normalized numbers and the document's own related terms
 *      (related-terms.ts);
 *   2. the claim is compared with its support for numbers, dates and versions, negation, modality,
 *      comparatives and identifiers (consistency/);
 *   3. copies of body sentences are marked (copy.ts);
 *   4. sections and key content are judged covered by the same links (coverage.ts).
 * The body is what a summary reads: sentences outside the abstract and outside excluded sections.
 */
import { excludedSections } from '../select/units';
import { LineIndex } from '../text/lines';
import { wordTokens } from '../text/tokens';
import type { AnalyzedDocument } from '../types';
import { buildTermIndex, inverseFrequency } from '../vectors';
import type { AbstractSentence, LocatedAbstract } from './abstract-locator';
import type { AbstractSentenceCheck, AbstractThresholds, ContentCoverage, SectionCoverage, UnjudgedSection } from './abstract-report';
import { claimReport } from './claim-report';
import { checkedText } from './consistency/claim-tokens';
import type { BodyFacts, Evidence } from './consistency/detector';
import { runDetectors } from './consistency/index';
import { quantitiesIn } from './consistency/quantities';
import { identifiersIn } from './consistency/identifiers';
import { CopyIndex } from './copy';
import { contentCoverage, sectionCoverage } from './coverage';
import { termSpace } from './related-terms';
import { alignClaim, normalizedTerms, SUPPORT_DEFAULTS, type Alignment } from './support';

export const ABSTRACT_CHECK_DEFAULTS: AbstractThresholds = {
  supported: SUPPORT_DEFAULTS.supported,
  /** A unit with fewer content terms (a one-line "TBD" section) is listed as unjudged instead of being reported as left out. */
  minSectionTerms: 12,
};

/**
 * Abstract sentences with fewer content terms than this, or ending in a colon (a lead-in such as
 * "The changes are as follows:"), make no claim of their own and are never flagged.
 */
const MIN_CLAIM_TERMS = 2;

export interface AbstractMatch {
  readonly sentences: readonly AbstractSentenceCheck[];
  readonly sections: readonly SectionCoverage[];
  readonly unjudged: readonly UnjudgedSection[];
  readonly content: ContentCoverage;
}

/** The body as the check reads it: one entry per body sentence, in document order. */
export interface CheckBody {
  /** Sentence indices. */
  readonly sentences: readonly number[];
  readonly terms: readonly ReadonlySet<string>[];
  /** Normalized terms with repeats (tf). */
  readonly termLists: readonly (readonly string[])[];
  readonly evidence: readonly Evidence[];
  readonly facts: BodyFacts;
  readonly lines: LineIndex;
}

function readBody(analyzed: AnalyzedDocument, abstractSections: Uint8Array, excludeHeadings: readonly string[]): CheckBody {
  const { doc, language } = analyzed;
  const excluded = excludedSections(doc, excludeHeadings);
  const sentences: number[] = [];
  const terms: Set<string>[] = [];
  const termLists: string[][] = [];
  const evidence: Evidence[] = [];
  const numbers = new Set<number>();
  for (const sentence of doc.sentences) {
    if (abstractSections[sentence.section] === 1 || excluded[sentence.section] === 1) continue;
    if (analyzed.terms[sentence.index]!.length === 0) continue;
    const source = doc.text.slice(sentence.span.start - doc.baseOffset, sentence.span.end - doc.baseOffset);
    const checked = checkedText(sentence.text, language);
    sentences.push(sentence.index);
    const list = normalizedTerms(analyzed.words[sentence.index]!, language);
    termLists.push(list);
    terms.push(new Set(list));
    evidence.push({ sentence: sentence.index, checked, source, span: sentence.span });
    for (const q of quantitiesIn(checked)) {
      if (typeof q.value === 'number') numbers.add(q.value);
    }
  }
  // Identifiers are looked up in the whole text outside the abstract: code blocks are not sentences.
  const abstractSpans = doc.sections.filter((s) => abstractSections[s.index] === 1 && s.parent !== null && abstractSections[s.parent] !== 1).map((s) => s.span);
  let outside = doc.text;
  for (const span of abstractSpans.sort((a, b) => b.start - a.start)) outside = outside.slice(0, span.start - doc.baseOffset) + '\n' + outside.slice(span.end - doc.baseOffset);
  return { sentences, terms, termLists, evidence, facts: { numbers, lowerSource: outside.toLowerCase(), sentences: evidence }, lines: new LineIndex(doc.text) };
}

function isClaim(sentence: AbstractSentence, terms: readonly string[]): boolean {
  return new Set(terms).size >= MIN_CLAIM_TERMS && !/:\s*$/u.test(sentence.text);
}

/** Null when the document has no prose outside the abstract. */
export function matchAbstract(
  analyzed: AnalyzedDocument,
  located: LocatedAbstract,
  thresholds: AbstractThresholds,
  excludeHeadings: readonly string[],
): AbstractMatch | null {
  const { language } = analyzed;
  const body = readBody(analyzed, located.sections, excludeHeadings);
  if (body.sentences.length === 0) return null;

  const claimTerms = located.sentences.map((s) => normalizedTerms(s.wordList, language));
  // One idf over body and abstract, so a claim term the body never uses weighs the most.
  const index = buildTermIndex([...body.termLists, ...claimTerms]);
  const idf = inverseFrequency(index, 'smoothed');
  const weighted = (terms: readonly string[]) => {
    const weights = new Map<string, number>();
    for (const t of terms) weights.set(t, (weights.get(t) ?? 0) + idf[index.vocabulary.get(t)!]!);
    return weights;
  };
  const bodyWeights = body.termLists.map(weighted);
  const space = termSpace(body.termLists);
  const copies = new CopyIndex(body.sentences.map((i) => analyzed.words[i]!));
  const settings = { ...SUPPORT_DEFAULTS, supported: thresholds.supported };

  const alignments: Alignment[] = [];
  const sentences = located.sentences.map((sentence, k) => {
    const terms = claimTerms[k]!;
    const weights = weighted(terms);
    const slots = new Set(terms.filter((t) => /\d/u.test(t)));
    for (const identifier of identifiersIn(sentence.source)) for (const t of normalizedTerms(wordTokens(identifier.text), language)) slots.add(t);
    const alignment = alignClaim({ weights, slots }, bodyWeights, space, settings);
    alignments.push(alignment);
    const claim = isClaim(sentence, terms);
    const checked = checkedText(sentence.text, language);
    const evidenceAt = (p: number) => body.evidence[p]!;
    const findings = claim
      ? runDetectors({
          claim: checked,
          claimSource: sentence.source,
          support: alignment.picks.map((p) => evidenceAt(p.position)),
          pool: [...alignment.picks.map((p) => p.position), ...alignment.pool].map(evidenceAt),
          frame: alignment.frame === null ? null : evidenceAt(alignment.frame),
          body: body.facts,
          language,
        })
      : [];
    const copy = copies.match(sentence.wordList);
    return claimReport({ analyzed, body, sentence, index: k, claim, alignment, findings, copy, settings });
  });

  const { sections, unjudged } = sectionCoverage(analyzed, located, body, alignments, sentences, thresholds);
  const content = contentCoverage(analyzed, located, body, claimTerms);
  return { sentences, sections, unjudged, content };
}
