/**
 * A digest of several documents: one extractive summary across a set, grouped by document.
 *
 * Documents are added one at a time (`startDigest().add(...)`), so a caller can read, report
 * progress and drop each one; only each document's best sentences are kept (collect.ts). `finish`
 * compares them across the set (cross-document.ts: LexRank and centroid over the set, pyramid
 * weighting, near-duplicate groups) and selects with the single-document selector: documents play
 * the part of sections, so the budget is shared among them by Hamilton apportionment with a floor
 * of `minPerSection` each when the length allows (the importance-and-floor rule of sections,
 * importance = the document's candidate words), and Maximal Marginal Relevance keeps the picks apart.
 */
import { checkOptions, OptionsError, type SummaryRequestOptions } from '../options/resolve';
import { selectSentences } from '../select/select';
import type { Budget, DocumentFormat, Span } from '../types';
import { collectDocument, type CollectedDocument, type PoolSentence } from './collect';
import { crossDocument } from './cross-document';

export const DIGEST_DEFAULTS = {
  /** Best sentences kept per document for the comparison across the set (ours). */
  keepPerDocument: 8,
  /** Without a length: this many sentences per document, up to `maxDefaultSentences` (ours). */
  sentencesPerDocument: 2,
  maxDefaultSentences: 40,
} as const;

export interface DigestRequest extends SummaryRequestOptions {
  /** Sentences kept per document for the comparison; bounds memory. */
  readonly keepPerDocument?: number;
}

export interface DigestOccurrence {
  readonly file: string;
  readonly line: number;
  readonly span: Span;
}

export interface DigestSentence {
  /** Index into `Digest.documents`. */
  readonly document: number;
  readonly file: string;
  readonly text: string;
  readonly span: Span;
  readonly line: number;
  readonly sectionPath: readonly string[];
  readonly score: number;
  /** Documents that express the same content, its own included (pyramid tier). */
  readonly sharedBy: number;
  /** The same sentence, near enough, in other documents. */
  readonly alsoIn: readonly DigestOccurrence[];
}

export interface DigestDocument {
  readonly file: string;
  readonly title: string | null;
  readonly sentencesIn: number;
  readonly wordsIn: number;
  /** Sentences of this document in the digest. */
  readonly picked: number;
  readonly notices: readonly string[];
  readonly refused?: string;
}

export interface Digest {
  readonly documents: readonly DigestDocument[];
  /** Grouped by document (in the order added), then in document order. */
  readonly sentences: readonly DigestSentence[];
  readonly stats: {
    readonly documents: number;
    readonly documentsRead: number;
    readonly documentsRepresented: number;
    readonly wordsIn: number;
    readonly wordsOut: number;
    readonly sentencesOut: number;
    /** Sentences left out because a near-duplicate from another document stands for them. */
    readonly duplicatesMerged: number;
  };
  readonly notices: readonly string[];
}

/** What `add` reports for progress. */
export interface DocumentProgress {
  readonly index: number;
  readonly file: string;
  readonly kept: number;
  readonly refused?: string;
}

export interface DigestBuilder {
  add(file: string, text: string, format: DocumentFormat): DocumentProgress;
  /**
   * A document read by a `digestReader` made from the same request (on another thread, say), as
   * the next document (whatever index it was read with: a file that could not be read leaves no gap).
   */
  addRead(read: ReadForDigest): DocumentProgress;
  finish(): Digest;
}

/** One document as a digest keeps it (its best sentences and its weight); plain data. */
export type ReadForDigest = CollectedDocument;

/** Reads one document for a digest: `index` is its place among the digest's documents. */
export type DigestReader = (index: number, file: string, text: string, format: DocumentFormat) => ReadForDigest;

/** The request checked once: throws OptionsError on invalid options. */
function checkDigestRequest(request: DigestRequest) {
  const { keepPerDocument = DIGEST_DEFAULTS.keepPerDocument, ...summaryRequest } = request;
  const { options, problems: checked } = checkOptions(summaryRequest);
  const problems = [...checked];
  if (!(Number.isInteger(keepPerDocument) && keepPerDocument >= 1 && keepPerDocument <= 1000)) {
    problems.push({ key: 'keepPerDocument', reason: 'expected a whole number from 1 to 1,000' });
  }
  if (problems.length > 0) throw new OptionsError(problems);
  if (options.focus !== '') throw new OptionsError([{ key: 'focus', reason: 'is not supported by digests yet' }]);
  return { options, summaryRequest, keepPerDocument };
}

function readerOf({ summaryRequest, keepPerDocument }: ReturnType<typeof checkDigestRequest>): DigestReader {
  return (index, file, text, format) => collectDocument(index, file, text, { ...summaryRequest, format }, keepPerDocument);
}

/** What a builder's `add` does to read a document, for hosts that read documents on several threads. */
export function digestReader(request: DigestRequest = {}): DigestReader {
  return readerOf(checkDigestRequest(request));
}

/** Starts a digest. Throws OptionsError on invalid options (checked once, before any document). */
export function startDigest(request: DigestRequest = {}): DigestBuilder {
  const checked = checkDigestRequest(request);
  const { options } = checked;
  const read = readerOf(checked);
  const documents: CollectedDocument[] = [];
  const addRead = (given: CollectedDocument, file: string): DocumentProgress => {
    const index = documents.length;
    const collected = given.kept.every((s) => s.document === index) ? given : { ...given, kept: given.kept.map((s) => ({ ...s, document: index })) };
    documents.push(collected);
    return { index, file, kept: collected.kept.length, ...(collected.refused ? { refused: collected.refused } : {}) };
  };
  return {
    add: (file, text, format) => addRead(read(documents.length, file, text, format), file),
    addRead: (collected) => addRead(collected, collected.name),
    finish() {
      return finishDigest(documents, request.budget === undefined ? null : options.budget, options);
    },
  };
}

/** Digest of documents given at once (the builder underneath). */
export function digestDocuments(inputs: readonly { readonly file: string; readonly text: string; readonly format: DocumentFormat }[], request: DigestRequest = {}): Digest {
  const builder = startDigest(request);
  for (const input of inputs) builder.add(input.file, input.text, input.format);
  return builder.finish();
}

function defaultBudget(documents: number): Budget {
  return { unit: 'sentences', value: Math.max(1, Math.min(DIGEST_DEFAULTS.maxDefaultSentences, DIGEST_DEFAULTS.sentencesPerDocument * documents)) };
}

function finishDigest(
  documents: readonly CollectedDocument[],
  asked: Budget | null,
  options: { readonly minSentences: number; readonly minPerSection: number; readonly mmrLambda: number },
): Digest {
  const pool: PoolSentence[] = documents.flatMap((d) => d.kept);
  const read = documents.filter((d) => !d.refused);
  const cross = crossDocument(pool, read.length);
  const unitOf = new Int32Array(pool.length);
  pool.forEach((s, i) => (unitOf[i] = cross.representative[i] === i ? s.document : -1));
  const unitWeights = new Map<number, number>();
  documents.forEach((d, k) => {
    if (d.kept.length > 0) unitWeights.set(k, d.candidateWords);
  });
  const setWords = documents.reduce((sum, d) => sum + d.candidateWords, 0);
  // A share of the words means a share of the whole set's words, not of the kept sentences.
  let budget = asked ?? defaultBudget(read.length);
  if (budget.unit === 'ratio') budget = { unit: 'words', value: Math.max(1, Math.round(budget.value * setWords)) };
  const selection =
    pool.length === 0
      ? { picked: [] as number[] }
      : selectSentences({
          relevance: cross.relevance,
          wordCounts: pool.map((s) => s.words),
          vectors: cross.vectors,
          vocabularySize: cross.vocabularySize,
          unitOf,
          unitWeights,
          budget,
          minSentences: options.minSentences,
          minPerSection: options.minPerSection,
          balance: true,
          mmrLambda: options.mmrLambda,
        });

  const alsoIn = new Map<number, DigestOccurrence[]>();
  pool.forEach((s, i) => {
    const representative = cross.representative[i]!;
    if (representative === i) return;
    const list = alsoIn.get(representative) ?? [];
    list.push({ file: documents[s.document]!.name, line: s.line, span: s.span });
    alsoIn.set(representative, list);
  });
  const picked = [...selection.picked].sort((x, y) => pool[x]!.document - pool[y]!.document || pool[x]!.order - pool[y]!.order);
  const sentences: DigestSentence[] = picked.map((i) => {
    const s = pool[i]!;
    return {
      document: s.document,
      file: documents[s.document]!.name,
      text: s.text,
      span: s.span,
      line: s.line,
      sectionPath: s.sectionPath,
      score: cross.relevance[i]!,
      sharedBy: cross.tier[i]!,
      alsoIn: alsoIn.get(i) ?? [],
    };
  });
  const pickedPer = new Map<number, number>();
  for (const s of sentences) pickedPer.set(s.document, (pickedPer.get(s.document) ?? 0) + 1);
  const notices: string[] = [];
  const unrepresented = read.length - pickedPer.size;
  if (unrepresented > 0 && sentences.length > 0) {
    notices.push(`${unrepresented} of ${read.length} documents have no sentence of their own in the digest: the length allows too few sentences, or what they say appears under another document ("also in").`);
  }
  if (read.length === 0) notices.push('No document could be read, so there is nothing to digest.');
  return {
    documents: documents.map((d, k) => ({
      file: d.name,
      title: d.title,
      sentencesIn: d.sentencesIn,
      wordsIn: d.wordsIn,
      picked: pickedPer.get(k) ?? 0,
      notices: d.notices,
      ...(d.refused ? { refused: d.refused } : {}),
    })),
    sentences,
    stats: {
      documents: documents.length,
      documentsRead: read.length,
      documentsRepresented: pickedPer.size,
      wordsIn: documents.reduce((sum, d) => sum + d.wordsIn, 0),
      wordsOut: picked.reduce((sum, i) => sum + pool[i]!.words, 0),
      sentencesOut: sentences.length,
      duplicatesMerged: pool.reduce((count, _, i) => count + (cross.representative[i] !== i ? 1 : 0), 0),
    },
    notices,
  };
}
