/**
 * Tersely's settings, read from the `tersely.*` section through the engine's option schema
 * (src/core/options/schema.ts): keys, defaults, bounds and allowed values come from there and
 * nowhere else. Free of the editor API so the parsing can be tested under Node; the caller passes
 * a getter over the configuration. An invalid value is never clamped or guessed at: the option's
 * default is used and the setting is reported with the reason (settings-access.ts shows it once).
 */
import { formatForEditorDocument, HOST_OPTIONS, SUMMARY_OPTIONS, type DocumentFormat, type HostOptionValues, type OptionDefinition, type SummaryOptions } from '../core/index';

export const SETTINGS_SECTION = 'tersely';

/** The summary options the settings decide (the engine's own shape), without a model. */
export type SummaryOptionValues = Omit<SummaryOptions, 'model'>;

export interface TerselySettings {
  readonly summary: SummaryOptionValues;
  readonly host: HostOptionValues;
}

export interface SettingProblem {
  /** Full setting id, `tersely.length`. */
  readonly setting: string;
  readonly reason: string;
  /** What is used instead, as a person would type it. */
  readonly using: string;
}

export interface ParsedSettings {
  readonly settings: TerselySettings;
  readonly problems: readonly SettingProblem[];
}

type Definitions = Record<string, OptionDefinition<unknown>>;

/** Every setting key below `tersely.`, in the settings editor's order. */
export const SETTING_KEYS: readonly string[] = [...Object.values(SUMMARY_OPTIONS as Definitions), ...Object.values(HOST_OPTIONS as Definitions)]
  .filter((definition) => definition.setting)
  .sort((a, b) => a.setting!.order - b.setting!.order)
  .map((definition) => definition.setting!.key);

/** Setting key of a schema option (`budget` → `length`), or undefined when it is not a setting. */
export function settingKeyOf(option: keyof typeof SUMMARY_OPTIONS | keyof typeof HOST_OPTIONS): string | undefined {
  const definition = ((SUMMARY_OPTIONS as Definitions)[option] ?? (HOST_OPTIONS as Definitions)[option])!;
  return definition.setting?.key;
}

function readTable(table: Definitions, get: (key: string) => unknown, problems: SettingProblem[]): Record<string, unknown> {
  const values: Record<string, unknown> = {};
  for (const [name, definition] of Object.entries(table)) {
    const key = definition.setting?.key;
    const raw = key === undefined ? undefined : get(key);
    if (raw === undefined || raw === null) {
      values[name] = definition.default;
      continue;
    }
    const checked = definition.kind.check(raw);
    if (checked.ok) values[name] = checked.value;
    else {
      values[name] = definition.default;
      problems.push({ setting: `${SETTINGS_SECTION}.${key}`, reason: checked.reason, using: definition.kind.toText(definition.default) || '(empty)' });
    }
  }
  return values;
}

/** Reads every setting through `get` (undefined = not set) and returns complete, checked values. */
export function parseSettings(get: (key: string) => unknown): ParsedSettings {
  const problems: SettingProblem[] = [];
  const summary = readTable(SUMMARY_OPTIONS as Definitions, get, problems) as unknown as SummaryOptionValues;
  const host = readTable(HOST_OPTIONS as Definitions, get, problems) as unknown as HostOptionValues;
  return { settings: { summary, host }, problems };
}

/** One line for a person: which setting, what is wrong, what is used instead. */
export function describeProblem(problem: SettingProblem): string {
  return `The setting ${problem.setting} is not valid (${problem.reason}); Tersely uses ${problem.using} until it is fixed.`;
}

/** The engine's request for these settings (the shape `summarize(text, request)` accepts). */
export interface EngineRequestOptions extends SummaryOptionValues {
  readonly format: DocumentFormat;
  readonly baseOffset: number;
}

export function toEngineOptions(settings: TerselySettings, format: DocumentFormat, baseOffset: number): EngineRequestOptions {
  const { summary } = settings;
  // A sentence length below the minimum would be overruled silently; the explicit count wins.
  const minSentences = summary.budget.unit === 'sentences' ? Math.min(summary.minSentences, summary.budget.value) : summary.minSentences;
  return { ...summary, minSentences, format, baseOffset };
}

/** The format of an editor document, from the engine's format catalog. */
export function formatFor(languageId: string, fileName: string): DocumentFormat {
  return formatForEditorDocument(languageId, fileName);
}
