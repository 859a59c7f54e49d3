/**
 * The one protocol between the extension and its engine host. Both hosts speak it: a Node worker
 * thread (desktop editor) and a Web Worker (browser editor). Messages are plain data, so they
 * survive structured cloning in either.
 *
 * The model travels once per host: `model` carries it with a key (file, modification time,
 * size), the host validates and keeps it, and each job names the key it expects. Document text
 * and settings travel with every job.
 */
import type { AbstractReport, CheckAbstractRequest, Digest, DigestRequest, DocumentFormat, Summary, SummaryStage as SummarizeStage } from '../core/index';
import type { EngineRequestOptions } from './settings';

export type EngineStage = SummarizeStage;

/** A trained sentence model as the extension read it, with the key the host caches it under. */
export interface EngineModel {
  readonly key: string;
  readonly model: unknown;
}

export type EngineTask =
  | {
      readonly kind: 'summarize';
      readonly text: string;
      readonly options: Omit<EngineRequestOptions, 'model'>;
      /**
       * Names the document and scope: the host keeps what it read of the last text under this name
       * and, for the next one, reads again only the pieces an edit touched (core/session.ts).
       */
      readonly session?: string;
    }
  | { readonly kind: 'checkAbstract'; readonly text: string; readonly options: Omit<CheckAbstractRequest, 'thresholds' | 'model'> }
  /** The document's headings in order (the abstract check's picker): read in the host, so the extension bundle carries no parser. */
  | { readonly kind: 'headings'; readonly text: string; readonly format: DocumentFormat }
  /** Several documents in one digest; the host reports each document as it is read (`progress`). */
  | { readonly kind: 'digest'; readonly documents: readonly EngineDigestDocument[]; readonly options: DigestRequest };

/** One document of a digest job; `file` is the name the digest shows and reports back. */
export interface EngineDigestDocument {
  readonly file: string;
  readonly text: string;
  readonly format: DocumentFormat;
}

/** One heading of a `headings` job: its text and nesting depth (1 = top level). */
export interface EngineHeading {
  readonly heading: string;
  readonly depth: number;
}

/** Extension → host. */
export type ToEngine =
  | { readonly type: 'model'; readonly key: string; readonly model: unknown }
  /** `modelKey`: the model a summarize job must use (the one last sent); absent means the built-in one. */
  | { readonly type: 'job'; readonly id: number; readonly task: EngineTask; readonly modelKey?: string };

export type EngineResult =
  | {
      readonly kind: 'summarize';
      /** `document.text` is left empty: the extension has the text already. */
      readonly summary: Summary;
      /** Set when the model was rejected and the built-in model was used instead. */
      readonly modelProblem?: string;
      readonly elapsedMs: number;
      /** For a job with a session: how much of the text was read again (for the log). */
      readonly reading?: { readonly read: 'unchanged' | 'pieces' | 'whole'; readonly pieces: number; readonly piecesRead: number; readonly reused?: true };
    }
  | { readonly kind: 'checkAbstract'; readonly report: AbstractReport; readonly elapsedMs: number }
  | { readonly kind: 'headings'; readonly headings: readonly EngineHeading[]; readonly elapsedMs: number }
  | { readonly kind: 'digest'; readonly digest: Digest; readonly elapsedMs: number; readonly modelProblem?: string };

/** Host → extension. */
export type FromEngine =
  | { readonly type: 'stage'; readonly id: number; readonly stage: EngineStage }
  /** A digest job has read `done` of its `total` documents. */
  | { readonly type: 'progress'; readonly id: number; readonly done: number; readonly total: number }
  | { readonly type: 'done'; readonly id: number; readonly result: EngineResult }
  | { readonly type: 'failed'; readonly id: number; readonly error: string };
