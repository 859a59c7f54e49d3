/**
 * Turns what a caller passes (a partial request from the CLI, the editor, a webview message or a
 * program) into complete summary options. Every value is checked against the schema; an invalid
 * one is reported with the option's name and the reason, never clamped or replaced in silence.
 */
import { loadModel, modelMismatch, type SentenceModel } from '../rank/trained/sentence-model';
import { checkTemplates } from '../select/template-text';
import type { DocumentFormat, Span } from '../types';
import { SUMMARY_OPTIONS, type SummaryOptionKey, type SummaryOptionValues } from './schema';

export interface SummaryOptions extends SummaryOptionValues {
  /** A validated trained sentence model for the trained methods; the shipped one of each kind when absent. */
  readonly model?: SentenceModel;
  /** The team's document templates (their text): sentences found in them are never picked. */
  readonly templates?: readonly { readonly text: string; readonly format: DocumentFormat }[];
  /**
   * The previous summary's picks (their texts, or their spans in the current document), for live
   * mode: they are kept unless a new sentence is clearly better (hysteresis.ts).
   */
  readonly previous?: readonly (string | Span)[];
}

export type SummaryRequestOptions = { readonly [K in SummaryOptionKey]?: unknown } & { readonly model?: unknown; readonly templates?: unknown; readonly previous?: unknown };

export interface OptionProblem {
  /** The option's key in the schema (`budget`, `method`, …), or `model`. */
  readonly key: string;
  readonly reason: string;
}

export class OptionsError extends Error {
  override readonly name = 'OptionsError';
  constructor(readonly problems: readonly OptionProblem[]) {
    super(problems.map((p) => `${p.key}: ${p.reason}`).join('; '));
  }
}

export const DEFAULT_OPTIONS: SummaryOptions = Object.fromEntries(
  Object.entries(SUMMARY_OPTIONS).map(([key, definition]) => [key, definition.default]),
) as unknown as SummaryOptions;

export interface CheckedOptions {
  /** Complete options; an invalid value is replaced by its default here, and listed in `problems`. */
  readonly options: SummaryOptions;
  readonly problems: readonly OptionProblem[];
}

/** Checks every given value; `undefined` means "not given" and takes the default. */
export function checkOptions(partial: SummaryRequestOptions = {}): CheckedOptions {
  const problems: OptionProblem[] = [];
  const options: Record<string, unknown> = {};
  for (const key of Object.keys(SUMMARY_OPTIONS) as SummaryOptionKey[]) {
    const definition = SUMMARY_OPTIONS[key];
    const raw = Object.prototype.hasOwnProperty.call(partial, key) ? partial[key] : undefined;
    if (raw === undefined) {
      options[key] = definition.default;
      continue;
    }
    const checked = (definition.kind as { check(value: unknown): { ok: boolean; value?: unknown; reason?: string } }).check(raw);
    if (checked.ok) options[key] = checked.value;
    else {
      options[key] = definition.default;
      problems.push({ key, reason: checked.reason! });
    }
  }
  if (partial.model !== undefined) {
    const loaded = loadModel(partial.model);
    if (!loaded.ok) problems.push({ key: 'model', reason: loaded.error });
    else {
      const mismatch = modelMismatch(options.method as SummaryOptions['method'], loaded.model);
      if (mismatch === null) options.model = loaded.model;
      else problems.push({ key: 'model', reason: mismatch });
    }
  }
  if (partial.templates !== undefined) {
    try {
      options.templates = checkTemplates(partial.templates);
    } catch (error) {
      problems.push({ key: 'templates', reason: (error as Error).message });
    }
  }
  if (partial.previous !== undefined) {
    const previous = checkPrevious(partial.previous);
    if (typeof previous === 'string') problems.push({ key: 'previous', reason: previous });
    else options.previous = previous;
  }
  return { options: options as unknown as SummaryOptions, problems };
}

/** At most this many previous picks (a summary has far fewer; the bound keeps a message cheap). */
const MAX_PREVIOUS = 10_000;

function checkPrevious(value: unknown): readonly (string | Span)[] | string {
  if (!Array.isArray(value)) return 'expected a list of sentence texts or spans';
  if (value.length > MAX_PREVIOUS) return `has ${value.length} entries, more than ${MAX_PREVIOUS}`;
  const out: (string | Span)[] = [];
  for (const [k, entry] of value.entries()) {
    if (typeof entry === 'string') out.push(entry);
    else if (typeof entry === 'object' && entry !== null && Number.isSafeInteger((entry as Span).start) && Number.isSafeInteger((entry as Span).end) && (entry as Span).start >= 0 && (entry as Span).end >= (entry as Span).start) {
      out.push({ start: (entry as Span).start, end: (entry as Span).end });
    } else return `entry ${k + 1} must be a sentence's text or a span { start, end }`;
  }
  return out;
}

/** Complete options, or an OptionsError that names every invalid value. */
export function resolveOptions(partial: SummaryRequestOptions = {}): SummaryOptions {
  const { options, problems } = checkOptions(partial);
  if (problems.length > 0) throw new OptionsError(problems);
  return options;
}
