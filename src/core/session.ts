/**
 * Summary sessions: a host that summarizes one document again and again (a live summary while the
 * user types) keeps a session per document and hands it each new text. A Markdown text is read in
 * pieces cut before top-level headings (formats/markdown/pieces.ts); after an edit only the pieces
 * the edit touched are parsed and analysed again, the rest is reused, and the result is the same
 * as summarize() on the whole new text (test/unit/session.test.ts checks that).
 *
 * The whole text is read again, and `lastUpdate` says why, when: it is the first text; the format,
 * offset or a reading option changed; the edit changed the set of link or footnote labels the
 * document defines; or the format is not Markdown (other readers are not piece-wise yet).
 * Document-wide figures (term statistics, the similarity graph, ranking and selection) are
 * computed from the cached sentence analyses on every call, except that the same text under the
 * same request gets the previous summary back.
 */
import { assemblePieces } from './formats/markdown/assemble-pieces';
import type { MarkdownOptions } from './formats/markdown/markdown-walker';
import { labelsOutside, pieceLabelsEqual, readStretch, type MarkdownPiece } from './formats/markdown/pieces';
import { parseDocument } from './formats/registry';
import { withWellFormedTexts } from './input-guard';
import { checkRequest, summarizePrepared, type Preparation, type SummarizeRequest } from './summarize';
import { analyze, languageSample, resolveLanguage } from './analyze';
import { detectLanguage } from './text/tokens';
import { contentTerms, wordTokens } from './text/tokens';
import type { AnalyzedDocument, DocumentFormat, ParsedDocument, Summary } from './types';

/** What the last call did, so a host (and a test) can see how much was reused. */
export interface SessionUpdate {
  /** 'pieces': only the pieces an edit touched were read; 'whole': the whole text was read; 'unchanged': nothing was read. */
  readonly read: 'unchanged' | 'pieces' | 'whole';
  /** Why the whole text was read. */
  readonly reason?: 'first text' | 'reading options changed' | 'labels changed' | 'not Markdown';
  /** Pieces of the text, and how many of them were parsed in this call. */
  readonly pieces: number;
  readonly piecesRead: number;
  /** Sentences whose words and terms were computed in this call (the rest came from the cache). */
  readonly sentencesAnalyzed: number;
  /** Set when summarize() returned the previous summary: the same text under the same request. */
  readonly reused?: true;
}

export interface SummarySession {
  /** Checks, reads and analyses `text`, reusing what the previous text of this session shares with it. */
  prepare(text: string, request?: SummarizeRequest): Preparation;
  /** The summary of `text`: equal to summarize(text, request), usually much faster after a small edit. */
  summarize(text: string, request?: SummarizeRequest): Summary;
  readonly lastUpdate: SessionUpdate | null;
  /** Forgets the cached text (the next call reads the whole text). */
  clear(): void;
}

export function createSummarySession(): SummarySession {
  return new Session();
}

/** Words and terms of a piece's sentences and headings, for one language. */
interface PieceAnalysis {
  readonly language: string;
  readonly words: readonly (readonly string[])[];
  readonly terms: readonly (readonly string[])[];
  /** Per section of the piece (index 0, the piece's root, unused). */
  readonly headingTerms: readonly (readonly string[])[];
}

interface Cached {
  readonly text: string;
  /** Reading options the pieces were read under. */
  readonly key: string;
  readonly pieces: readonly MarkdownPiece[];
  /** Where each piece starts in `text`. */
  readonly starts: readonly number[];
}

/** A request as a key: everything but the stage callback; the model is compared by identity. */
function requestKey(request: SummarizeRequest): string {
  return JSON.stringify(request, (key, value: unknown) => (key === 'onStage' || key === 'model' ? undefined : value));
}

class Session implements SummarySession {
  private cached: Cached | null = null;
  /** The last summary, returned again for the same text and request (the engine is deterministic). */
  private last: { readonly text: string; readonly key: string; readonly model: unknown; readonly summary: Summary } | null = null;
  private detected: { readonly sample: string; readonly language: string } | null = null;
  private readonly analyses = new WeakMap<MarkdownPiece, PieceAnalysis>();
  lastUpdate: SessionUpdate | null = null;

  clear(): void {
    this.cached = null;
    this.last = null;
  }

  summarize(text: string, request: SummarizeRequest = {}): Summary {
    const key = requestKey(request);
    const last = this.last;
    if (last && last.text === text && last.key === key && last.model === request.model) {
      this.lastUpdate = { read: 'unchanged', pieces: this.cached?.pieces.length ?? 1, piecesRead: 0, sentencesAnalyzed: 0, reused: true };
      return last.summary;
    }
    const preparation = this.prepare(text, request);
    const summary = preparation.ok ? summarizePrepared(preparation.prepared, request) : preparation.refused;
    this.last = { text, key, model: request.model, summary };
    return summary;
  }

  prepare(text: string, request: SummarizeRequest = {}): Preparation {
    const checked = checkRequest(text, request);
    if (!checked.ok) return checked;
    const { options, format, baseOffset } = checked;
    request.onStage?.('reading');
    if (format !== 'markdown') {
      this.cached = null;
      const { doc, notices } = withWellFormedTexts(parseDocument(text, { format, baseOffset, includeTables: options.includeTables, includeFootnotes: options.includeFootnotes }));
      const analyzed = analyze(doc, resolveLanguage(doc, options.language));
      this.lastUpdate = { read: 'whole', reason: 'not Markdown', pieces: 1, piecesRead: 1, sentencesAnalyzed: doc.sentences.length };
      return { ok: true, prepared: { analyzed, options, ...(notices.length > 0 ? { notices } : {}) } };
    }
    const reading: MarkdownOptions = { baseOffset, includeTables: options.includeTables };
    const update = this.read(text, format, reading);
    const { doc, notices } = withWellFormedTexts(assemblePieces(text, baseOffset, update.placed));
    const language = this.language(doc, options.language);
    let analyzed: AnalyzedDocument;
    let sentencesAnalyzed = 0;
    if (notices.length > 0) {
      // Lone surrogates: the sentences' texts were made well-formed after reading, so analyse those.
      analyzed = analyze(doc, language);
      sentencesAnalyzed = doc.sentences.length;
    } else {
      const analyses = update.placed.map(({ piece }) => {
        const cached = this.analyses.get(piece);
        if (cached?.language === language) return cached;
        const fresh = analyzePiece(piece.doc, language);
        sentencesAnalyzed += piece.doc.sentences.length;
        this.analyses.set(piece, fresh);
        return fresh;
      });
      analyzed = joinAnalyses(doc, language, analyses);
    }
    this.lastUpdate = { ...update.summary, sentencesAnalyzed };
    return { ok: true, prepared: { analyzed, options, ...(notices.length > 0 ? { notices } : {}) } };
  }

  /** resolveLanguage(), reusing the last detection when the sample it reads has not changed. */
  private language(doc: ParsedDocument, requested: string): string {
    if (requested !== 'auto') return requested;
    const sample = languageSample(doc);
    if (this.detected?.sample !== sample) this.detected = { sample, language: detectLanguage(sample) };
    return this.detected.language;
  }

  /** The pieces of `text`: reused where the previous text had them, read where it changed. */
  private read(text: string, format: DocumentFormat, options: MarkdownOptions) {
    const key = JSON.stringify([format, options.baseOffset, options.includeTables]);
    const previous = this.cached;
    const whole = (reason: NonNullable<SessionUpdate['reason']>) => {
      const { pieces } = readStretch(text, 0, text.length, null, { links: [], footnotes: [] }, options);
      return this.remember(text, key, pieces, pieces.map((p) => p.readAt), { read: 'whole', reason, pieces: pieces.length, piecesRead: pieces.length });
    };
    if (previous === null) return whole('first text');
    if (previous.key !== key) return whole('reading options changed');
    if (previous.text === text) {
      return this.remember(text, key, previous.pieces, previous.starts, { read: 'unchanged', pieces: previous.pieces.length, piecesRead: 0 });
    }

    const old = previous.text;
    const { pieces, starts } = previous;
    const limit = Math.min(old.length, text.length);
    let prefix = 0;
    while (prefix < limit && old.charCodeAt(prefix) === text.charCodeAt(prefix)) prefix++;
    let suffix = 0;
    while (suffix < limit - prefix && old.charCodeAt(old.length - 1 - suffix) === text.charCodeAt(text.length - 1 - suffix)) suffix++;
    const delta = text.length - old.length;
    const changedEnd = old.length - suffix; // in the old text

    // The pieces the change touches: from the one holding its start (and the one before, when the
    // change starts right at a piece's start: text typed there may join the previous piece) to
    // the one holding its end.
    let first = lastAtOrBefore(starts, prefix);
    if (first > 0 && starts[first] === prefix) first--;
    let last = Math.max(first, lastBefore(starts, changedEnd));
    const endOf = (i: number) => (i + 1 < pieces.length ? starts[i + 1]! : old.length);
    for (;;) {
      const from = starts[first]!;
      const to = endOf(last) + delta;
      const next = last + 1 < pieces.length ? last + 1 : -1;
      const nextHeadingEnd = next < 0 ? null : starts[next]! + delta + pieces[next]!.headingLength;
      const stretch = readStretch(text, from, to, nextHeadingEnd, labelsOutside(pieces, first, last + 1), options);
      if (!stretch.startHolds && first > 0) {
        first--;
        continue;
      }
      if (!stretch.endHolds && next >= 0) {
        last++;
        continue;
      }
      const merged = [...pieces.slice(0, first), ...stretch.pieces, ...pieces.slice(last + 1)];
      if (!pieceLabelsEqual(pieces, merged)) return whole('labels changed');
      const mergedStarts = [
        ...starts.slice(0, first),
        ...stretch.pieces.map((p) => p.readAt),
        ...starts.slice(last + 1).map((s) => s + delta),
      ];
      return this.remember(text, key, merged, mergedStarts, { read: 'pieces', pieces: merged.length, piecesRead: stretch.pieces.length });
    }
  }

  private remember(text: string, key: string, pieces: readonly MarkdownPiece[], starts: readonly number[], summary: Omit<SessionUpdate, 'sentencesAnalyzed'>) {
    this.cached = { text, key, pieces, starts };
    return { placed: pieces.map((piece, i) => ({ piece, start: starts[i]! })), summary };
  }
}

/** Index of the last start ≤ at (starts ascend, the first is 0). */
function lastAtOrBefore(starts: readonly number[], at: number): number {
  let lo = 0;
  let hi = starts.length - 1;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (starts[mid]! <= at) lo = mid;
    else hi = mid - 1;
  }
  return lo;
}

/** Index of the last start < at, or 0. */
function lastBefore(starts: readonly number[], at: number): number {
  return at <= 0 ? 0 : lastAtOrBefore(starts, at - 1);
}

/** analyze() for one piece's sentences and headings. */
function analyzePiece(doc: ParsedDocument, language: string): PieceAnalysis {
  const words = doc.sentences.map((sentence) => wordTokens(sentence.text));
  return {
    language,
    words,
    terms: words.map((w) => contentTerms(w, language)),
    headingTerms: doc.sections.map((section, i) => (i === 0 ? [] : contentTerms(wordTokens(section.heading), language))),
  };
}

/** The analyses of the pieces, in order, as analyze() would give them for the assembled document. */
function joinAnalyses(doc: ParsedDocument, language: string, analyses: readonly PieceAnalysis[]): AnalyzedDocument {
  const words: (readonly string[])[] = [];
  const terms: (readonly string[])[] = [];
  const headingTerms: (readonly string[])[] = [[]];
  for (const analysis of analyses) {
    for (const w of analysis.words) words.push(w);
    for (const t of analysis.terms) terms.push(t);
    for (let s = 1; s < analysis.headingTerms.length; s++) headingTerms.push(analysis.headingTerms[s]!);
  }
  return {
    doc,
    language,
    words,
    terms,
    titleTerms: doc.title ? contentTerms(wordTokens(doc.title), language) : [],
    headingTerms,
  };
}
