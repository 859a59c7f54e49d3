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
import { barredKind } from '../select/sentence-kinds';
import { excludedSections } from '../select/units';
import { LineIndex } from '../text/lines';
import { wordTokens } from '../text/tokens';
import { withoutWebAddresses } from '../text/web-addresses';
import type { AnalyzedDocument } from '../types';
import { buildTermIndex, inverseFrequency } from '../vectors';
import type { AbstractSentence, LocatedAbstract } from './abstract-locator';
import type { AbstractSentenceCheck, AbstractThresholds, ContentCoverage, SectionCoverage, UnjudgedSection } from './abstract-report';
import { claimReport, type ClaimKind } from './claim-report';
import { checkedText } from './consistency/claim-tokens';
import type { BodyFacts, Evidence } from './consistency/detector';
import { runDetectors } from './consistency/index';
import { numbersInText, quantitiesIn } from './consistency/quantities';
import { identifiersIn } from './consistency/identifiers';
import { CopyIndex } from './copy';
import { contentCoverage, sectionCoverage } from './coverage';
import { termSpace } from './related-terms';
import { alignClaim, normalizedTerms, SUPPORT_DEFAULTS, type Alignment, type WeightedTerms } from './support';

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
  /** Per body sentence: a placeholder answer, boilerplate, byline, metadata or API line (select/sentence-kinds.ts). */
  readonly barred: readonly boolean[];
  readonly facts: BodyFacts;
  readonly lines: LineIndex;
}

/** Where the abstract is in the checked document: its sections, and the span its text covers (null for separate text). */
export type AbstractPlace = Pick<LocatedAbstract, 'sections' | 'span'>;

function readBody(analyzed: AnalyzedDocument, abstract: AbstractPlace, excludeHeadings: readonly string[]): CheckBody {
  const abstractSections = abstract.sections;
  const { doc, language } = analyzed;
  const excluded = excludedSections(doc, excludeHeadings);
  const sentences: number[] = [];
  const terms: Set<string>[] = [];
  const termLists: string[][] = [];
  const evidence: Evidence[] = [];
  const barred: boolean[] = [];
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
    barred.push(barredKind(sentence.text, analyzed.words[sentence.index]!.length) !== null);
    for (const q of quantitiesIn(checked)) {
      if (typeof q.value === 'number') numbers.add(q.value);
    }
  }
  // Identifiers and figures are looked up in the whole text outside the abstract (code blocks are
  // not sentences); the abstract's own span is left out, a section or the opening text alike.
  const span = abstract.span;
  const outside = span === null ? doc.text : doc.text.slice(0, span.start - doc.baseOffset) + '\n' + doc.text.slice(span.end - doc.baseOffset);
  return { sentences, terms, termLists, evidence, barred, facts: { numbers, textNumbers: numbersInText(outside.toLowerCase()), lowerSource: outside.toLowerCase(), sentences: evidence }, lines: new LineIndex(doc.text) };
}

/**
 * A sentence that holds a web address and, without it, fewer content terms than this points
 * elsewhere ("Documentation can be seen here: https://…"): the body cannot support it. Chosen on
 * the train half (bench/check.ts): it took 5 real sentences out of the unsupported ones and let
 * one replaced sentence through.
 */
const POINTER_TERMS = 5;

/** Whether an abstract sentence makes a claim of its own, or is a lead-in or a pointer to a link. */
function claimKind(sentence: AbstractSentence, terms: readonly string[], language: string): ClaimKind {
  if (new Set(terms).size < MIN_CLAIM_TERMS || /:\s*$/u.test(sentence.text)) return 'lead-in';
  const rest = withoutWebAddresses(sentence.text);
  if (rest !== sentence.text && new Set(normalizedTerms(wordTokens(rest), language)).size < POINTER_TERMS) return 'link';
  return 'claim';
}

/**
 * What the check reads from the body once, whatever abstract is checked against it: the body's
 * sentences, their tf·idf weights, the document's term space and the copy index.
 */
export interface BodyModel {
  readonly body: CheckBody;
  readonly index: ReturnType<typeof buildTermIndex>;
  readonly idf: Float64Array;
  readonly bodyWeights: readonly WeightedTerms[];
  readonly space: ReturnType<typeof termSpace>;
  readonly copies: CopyIndex;
  /** Body evidence → its position in the body list. */
  readonly positionOf: ReadonlyMap<Evidence, number>;
}

/** Null when the document has no prose outside the abstract. */
export function bodyModel(analyzed: AnalyzedDocument, abstract: AbstractPlace, excludeHeadings: readonly string[]): BodyModel | null {
  const body = readBody(analyzed, abstract, excludeHeadings);
  if (body.sentences.length === 0) return null;
  // idf over the body's sentences: a claim term the body never uses gets the largest weight.
  const index = buildTermIndex(body.termLists);
  const idf = inverseFrequency(index, 'smoothed');
  const bodyWeights = body.termLists.map((terms) => {
    const weights = new Map<string, number>();
    for (const t of terms) weights.set(t, (weights.get(t) ?? 0) + idf[index.vocabulary.get(t)!]!);
    return weights;
  });
  const space = termSpace(body.termLists);
  const copies = new CopyIndex(body.sentences.map((i) => analyzed.words[i]!));
  const positionOf = new Map(body.evidence.map((e, p) => [e, p] as const));
  return { body, index, idf, bodyWeights, space, copies, positionOf };
}

/** Body sentences whose words include `term`, closest to the claim first. */
function usingTerm(model: BodyModel, alignment: Alignment, term: string, n: number): Evidence[] {
  const positions: number[] = [];
  model.body.evidence.forEach((e, p) => {
    if (e.checked.terms.has(term)) positions.push(p);
  });
  return positions
    .sort((a, b) => alignment.single[b]! - alignment.single[a]! || a - b)
    .slice(0, n)
    .map((p) => model.body.evidence[p]!);
}

export function matchAbstract(analyzed: AnalyzedDocument, located: LocatedAbstract, thresholds: AbstractThresholds, model: BodyModel): AbstractMatch {
  const { language } = analyzed;
  const { body, index, idf, bodyWeights, space, copies } = model;
  const claimTerms = located.sentences.map((s) => normalizedTerms(s.wordList, language));
  const unseen = 1 + Math.log(Math.max(1, body.sentences.length));
  const weighted = (terms: readonly string[]) => {
    const weights = new Map<string, number>();
    for (const t of terms) {
      const id = index.vocabulary.get(t);
      weights.set(t, (weights.get(t) ?? 0) + (id === undefined ? unseen : idf[id]!));
    }
    return weights;
  };
  const settings = { ...SUPPORT_DEFAULTS, supported: thresholds.supported };

  const alignments: Alignment[] = [];
  const sentences = located.sentences.map((sentence, k) => {
    const terms = claimTerms[k]!;
    const weights = weighted(terms);
    const slots = new Set(terms.filter((t) => /\d/u.test(t)));
    for (const identifier of identifiersIn(sentence.source)) for (const t of normalizedTerms(wordTokens(identifier.text), language)) slots.add(t);
    const alignment = alignClaim({ weights, slots }, bodyWeights, space, settings);
    alignments.push(alignment);
    const kind = claimKind(sentence, terms, language);
    const claim = kind === 'claim';
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
          using: (term, n) => usingTerm(model, alignment, term, n),
          closeness: (e) => alignment.single[model.positionOf.get(e) ?? -1] ?? 0,
        })
      : [];
    const copy = copies.match(sentence.wordList);
    return claimReport({ analyzed, body, sentence, index: k, kind, alignment, findings, copy, settings });
  });

  const { sections, unjudged } = sectionCoverage(analyzed, located, body, alignments, sentences, thresholds);
  const content = contentCoverage(analyzed, located, body, claimTerms);
  return { sentences, sections, unjudged, content };
}
