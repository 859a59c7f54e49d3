/**
 * Turns what a caller passes (a partial request from the CLI, the editor, a webview message or a
 * program) into complete summary options. Every value is checked against the schema; an invalid
 * one is reported with the option's name and the reason, never clamped or replaced in silence.
 */
import { loadModel, modelMismatch, type SentenceModel } from '../rank/trained/sentence-model';
import { SUMMARY_OPTIONS, type SummaryOptionKey, type SummaryOptionValues } from './schema';

export interface SummaryOptions extends SummaryOptionValues {
  /** A validated trained sentence model for the trained methods; the shipped one of each kind when absent. */
  readonly model?: SentenceModel;
}

export type SummaryRequestOptions = { readonly [K in SummaryOptionKey]?: unknown } & { readonly model?: unknown };

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
  return { options: options as unknown as SummaryOptions, problems };
}

/** Complete options, or an OptionsError that names every invalid value. */
export function resolveOptions(partial: SummaryRequestOptions = {}): SummaryOptions {
  const { options, problems } = checkOptions(partial);
  if (problems.length > 0) throw new OptionsError(problems);
  return options;
}
