/**
 * Position ranking after Baxendale (1958), "Machine-made index for technical literature — an
 * experiment", IBM Journal of Research and Development 2(4).
 *
 * Baxendale found the topic sentence of a paragraph was its first sentence in about 85% of the
 * paragraphs he examined and its last in about 7% (from memory). We turn each structural position
 * into a 0/1 feature (the document lead decays linearly instead) and add them with weights:
 * the paragraph weights are his percentages; the section and lead weights are ours.
 * List items and table cells are not paragraphs in his sense — a list of twenty one-line items
 * would otherwise hold twenty "topic sentences" — so they get no paragraph start/end bonus.
 */
import type { AnalyzedDocument, BlockKind, ParsedDocument, RankResult } from '../types';

export interface PositionWeights {
  /** First sentence of its paragraph. */
  readonly paragraphStart: number;
  /** Last sentence of a paragraph with more than one sentence. */
  readonly paragraphEnd: number;
  /** In the first paragraph of its section. */
  readonly sectionStart: number;
  /** In the last paragraph of a section with more than one paragraph. */
  readonly sectionEnd: number;
  /** Among the first `leadSentences` sentences of the document, fading linearly. */
  readonly documentLead: number;
}

export interface PositionSettings {
  readonly weights: PositionWeights;
  readonly leadSentences: number;
}

export const POSITION_DEFAULTS: PositionSettings = {
  weights: {
    paragraphStart: 0.85, // Baxendale (1958), from memory
    paragraphEnd: 0.07, // Baxendale (1958), from memory
    sectionStart: 0.3, // ours: a section's opening paragraph usually states its subject
    sectionEnd: 0.1, // ours: closing paragraphs often conclude
    documentLead: 0.5, // ours: the lead of a document tends to summarise it
  },
  leadSentences: 5,
};

export interface PositionOptions {
  readonly position?: { readonly weights?: Partial<PositionWeights>; readonly leadSentences?: number };
}

/** Blocks whose first and last sentences can be topic sentences (prose paragraphs and quotes). */
export function isProseBlock(kind: BlockKind): boolean {
  return kind === 'paragraph' || kind === 'quote';
}

/** For every paragraph: is it the first / last paragraph with sentences in its section? */
export function paragraphPlaces(doc: ParsedDocument): { first: Uint8Array; last: Uint8Array } {
  const first = new Uint8Array(doc.paragraphs.length);
  const last = new Uint8Array(doc.paragraphs.length);
  const firstOfSection = new Map<number, number>();
  const lastOfSection = new Map<number, number>();
  for (const paragraph of doc.paragraphs) {
    if (paragraph.sentences.length === 0) continue;
    if (!firstOfSection.has(paragraph.section)) firstOfSection.set(paragraph.section, paragraph.index);
    lastOfSection.set(paragraph.section, paragraph.index);
  }
  for (const [section, p] of firstOfSection) {
    first[p] = 1;
    const end = lastOfSection.get(section)!;
    // A lone paragraph is only "first": one sentence should not collect both bonuses.
    if (end !== p) last[end] = 1;
  }
  return { first, last };
}

export function positionRank(a: AnalyzedDocument, options: PositionOptions = {}): RankResult {
  const weights: PositionWeights = { ...POSITION_DEFAULTS.weights, ...options.position?.weights };
  const leadSentences = Math.max(0, options.position?.leadSentences ?? POSITION_DEFAULTS.leadSentences);
  const { sentences } = a.doc;
  const n = sentences.length;
  const places = paragraphPlaces(a.doc);
  const features = {
    paragraphStart: new Float64Array(n),
    paragraphEnd: new Float64Array(n),
    sectionStart: new Float64Array(n),
    sectionEnd: new Float64Array(n),
    documentLead: new Float64Array(n),
  };
  const scores = new Float64Array(n);
  for (const sentence of sentences) {
    const i = sentence.index;
    const prose = isProseBlock(a.doc.paragraphs[sentence.paragraph]?.kind ?? 'paragraph');
    features.paragraphStart[i] = prose && sentence.positionInParagraph === 0 ? 1 : 0;
    features.paragraphEnd[i] = prose && sentence.paragraphLength > 1 && sentence.positionInParagraph === sentence.paragraphLength - 1 ? 1 : 0;
    features.sectionStart[i] = places.first[sentence.paragraph] ?? 0;
    features.sectionEnd[i] = places.last[sentence.paragraph] ?? 0;
    features.documentLead[i] = i < leadSentences ? (leadSentences - i) / leadSentences : 0;
    let score = 0;
    for (const name of Object.keys(features) as (keyof PositionWeights)[]) score += weights[name] * features[name][i]!;
    scores[i] = score;
  }
  return { scores, features };
}
