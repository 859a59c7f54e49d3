/** Messages between the extension host and the engine worker. */
import type { AbstractReport, DocumentFormat, Summary } from '../core/index';
import type { EngineRequestOptions } from './settings';

export type EngineTask =
  | { readonly kind: 'summarize'; readonly text: string; readonly options: EngineRequestOptions }
  | { readonly kind: 'checkAbstract'; readonly text: string; readonly options: { readonly format: DocumentFormat; readonly language: string } };

export type EngineJob = EngineTask & { readonly id: number };

export type EngineReply =
  | {
      readonly id: number;
      readonly ok: true;
      readonly kind: 'summarize';
      readonly summary: Summary;
      /** Set when the model file was rejected and the built-in model was used instead. */
      readonly modelProblem?: string;
      readonly elapsedMs: number;
    }
  | { readonly id: number; readonly ok: true; readonly kind: 'checkAbstract'; readonly report: AbstractReport; readonly elapsedMs: number }
  | { readonly id: number; readonly ok: false; readonly error: string };

export type EngineResult = Extract<EngineReply, { ok: true }>;
