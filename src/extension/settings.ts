/**
 * Tersely's settings: one typed value read fresh from the `tersely.*` section, every field
 * validated and clamped here. Free of the editor API so the parsing can be tested under Node;
 * the caller passes a getter over the configuration.
 */
import type { DocumentFormat, RankerName } from '../core/index';

export type LengthUnit = 'sentences' | 'percent' | 'words';

export const LENGTH_UNITS: readonly LengthUnit[] = ['sentences', 'percent', 'words'];

export const METHOD_NAMES: readonly RankerName[] = ['blend', 'position', 'luhn', 'edmundson', 'lexrank', 'textrank', 'centroid', 'bayes', 'maxent'];

/** Bounds of the length value per unit (the webview's stepper uses the same bounds). */
export const LENGTH_BOUNDS: Readonly<Record<LengthUnit, { min: number; max: number; step: number }>> = {
  sentences: { min: 1, max: 500, step: 1 },
  percent: { min: 1, max: 100, step: 1 },
  words: { min: 10, max: 100_000, step: 10 },
};

export interface TerselySettings {
  readonly length: { readonly unit: LengthUnit; readonly value: number };
  readonly minSentences: number;
  readonly method: RankerName;
  readonly balance: { readonly enabled: boolean; readonly depth: number; readonly minPerSection: number };
  readonly excludeHeadings: readonly string[];
  readonly cueWords: { readonly bonus: readonly string[]; readonly stigma: readonly string[] };
  readonly language: string;
  readonly repair: 'suggest' | 'auto';
  /** Characters (UTF-16 code units); longer documents get a message instead of a summary. */
  readonly maxDocumentSize: number;
  readonly liveDelayMs: number;
  /** Path of a trained sentence model (JSON); '' for the built-in one. */
  readonly modelFile: string;
}

/** Defaults mirror package.json's `contributes.configuration` (a unit test keeps them in step). */
export const DEFAULT_SETTINGS: TerselySettings = {
  length: { unit: 'percent', value: 15 },
  minSentences: 3,
  method: 'blend',
  balance: { enabled: true, depth: 1, minPerSection: 1 },
  excludeHeadings: ['References', 'Changelog', 'Change log', 'Table of contents', 'Contents', 'License', 'Acknowledgements', 'Acknowledgments'],
  cueWords: { bonus: [], stigma: [] },
  language: 'auto',
  repair: 'suggest',
  maxDocumentSize: 3_000_000,
  liveDelayMs: 300,
  modelFile: '',
};

/** Setting keys below the `tersely` section. */
export const SETTING_KEYS = [
  'length.unit',
  'length.value',
  'length.minSentences',
  'method',
  'balance.enabled',
  'balance.headingDepth',
  'balance.minSentencesPerSection',
  'excludeHeadings',
  'cueWords.bonus',
  'cueWords.stigma',
  'language',
  'repair',
  'maxDocumentSize',
  'live.delay',
  'modelFile',
] as const;

export type SettingKey = (typeof SETTING_KEYS)[number];

export interface ParsedSettings {
  readonly settings: TerselySettings;
  /** One line per value that was out of range or of the wrong type (for the output channel). */
  readonly problems: readonly string[];
}

const MAX_LIST_ITEMS = 200;
const MAX_ITEM_LENGTH = 100;
const MAX_PATH_LENGTH = 1024;

/** Reads every setting through `get` (undefined = not set) and returns a complete, clamped value. */
export function parseSettings(get: (key: SettingKey) => unknown): ParsedSettings {
  const problems: string[] = [];
  const d = DEFAULT_SETTINGS;

  const number = (key: SettingKey, fallback: number, min: number, max: number, integer: boolean): number => {
    const raw = get(key);
    if (raw === undefined || raw === null) return fallback;
    if (typeof raw !== 'number' || !Number.isFinite(raw)) {
      problems.push(`tersely.${key}: expected a number, using ${fallback}`);
      return fallback;
    }
    const clamped = Math.min(max, Math.max(min, integer ? Math.round(raw) : raw));
    if (clamped !== raw) problems.push(`tersely.${key}: ${raw} is outside ${min}..${max}, using ${clamped}`);
    return clamped;
  };
  const choice = <T extends string>(key: SettingKey, allowed: readonly T[], fallback: T): T => {
    const raw = get(key);
    if (raw === undefined || raw === null) return fallback;
    if (typeof raw === 'string' && (allowed as readonly string[]).includes(raw)) return raw as T;
    problems.push(`tersely.${key}: expected one of ${allowed.join(', ')}, using ${fallback}`);
    return fallback;
  };
  const flag = (key: SettingKey, fallback: boolean): boolean => {
    const raw = get(key);
    if (raw === undefined || raw === null) return fallback;
    if (typeof raw === 'boolean') return raw;
    problems.push(`tersely.${key}: expected true or false, using ${fallback}`);
    return fallback;
  };
  const list = (key: SettingKey, fallback: readonly string[]): readonly string[] => {
    const raw = get(key);
    if (raw === undefined || raw === null) return fallback;
    if (!Array.isArray(raw)) {
      problems.push(`tersely.${key}: expected a list of words`);
      return fallback;
    }
    // Treated as plain words, never as patterns: nothing from settings is compiled to a RegExp.
    const words = raw
      .filter((item): item is string => typeof item === 'string')
      .map((item) => item.trim().slice(0, MAX_ITEM_LENGTH))
      .filter((item) => item.length > 0);
    if (words.length !== raw.length) problems.push(`tersely.${key}: ignored entries that are not words`);
    return [...new Set(words)].slice(0, MAX_LIST_ITEMS);
  };

  const unit = choice('length.unit', LENGTH_UNITS, d.length.unit);
  const bounds = LENGTH_BOUNDS[unit];
  const unitDefault = unit === d.length.unit ? d.length.value : unit === 'sentences' ? 5 : 150;
  const value = number('length.value', unitDefault, bounds.min, bounds.max, true);

  const rawLanguage = get('language');
  let language = d.language;
  if (typeof rawLanguage === 'string' && /^(auto|[a-z]{2,3})$/.test(rawLanguage.trim().toLowerCase())) {
    language = rawLanguage.trim().toLowerCase();
  } else if (rawLanguage !== undefined && rawLanguage !== null) {
    problems.push(`tersely.language: expected "auto" or a language code such as "en", using ${d.language}`);
  }

  const rawModel = get('modelFile');
  let modelFile = '';
  if (typeof rawModel === 'string' && rawModel.length <= MAX_PATH_LENGTH) modelFile = rawModel.trim();
  else if (rawModel !== undefined && rawModel !== null) problems.push('tersely.modelFile: expected a file path');

  const settings: TerselySettings = {
    length: { unit, value },
    minSentences: number('length.minSentences', d.minSentences, 0, 100, true),
    method: choice('method', METHOD_NAMES, d.method),
    balance: {
      enabled: flag('balance.enabled', d.balance.enabled),
      depth: number('balance.headingDepth', d.balance.depth, 1, 6, true),
      minPerSection: number('balance.minSentencesPerSection', d.balance.minPerSection, 0, 20, true),
    },
    excludeHeadings: list('excludeHeadings', d.excludeHeadings),
    cueWords: { bonus: list('cueWords.bonus', d.cueWords.bonus), stigma: list('cueWords.stigma', d.cueWords.stigma) },
    language,
    repair: choice('repair', ['suggest', 'auto'] as const, d.repair),
    maxDocumentSize: number('maxDocumentSize', d.maxDocumentSize, 1_000, 50_000_000, true),
    liveDelayMs: number('live.delay', d.liveDelayMs, 50, 5_000, true),
    modelFile,
  };
  return { settings, problems };
}

/** The engine's request for these settings (the shape `summarize(text, request)` accepts). */
export interface EngineRequestOptions {
  readonly budget: { readonly unit: 'sentences' | 'words' | 'ratio'; readonly value: number };
  readonly minSentences: number;
  readonly method: RankerName;
  readonly balance: boolean;
  readonly balanceDepth: number;
  readonly minPerSection: number;
  readonly excludeHeadings: readonly string[];
  readonly preferPhrases: readonly string[];
  readonly avoidPhrases: readonly string[];
  readonly language: string;
  readonly repair: 'suggest' | 'auto';
  readonly maxChars: number;
  readonly format: DocumentFormat;
  readonly baseOffset: number;
  readonly model?: unknown;
}

export function toEngineOptions(settings: TerselySettings, format: DocumentFormat, baseOffset: number, model?: unknown): EngineRequestOptions {
  const { unit, value } = settings.length;
  const budget = unit === 'percent' ? { unit: 'ratio' as const, value: value / 100 } : { unit, value };
  return {
    budget,
    // A sentence budget below the minimum would be overruled silently; the explicit count wins.
    minSentences: unit === 'sentences' ? Math.min(settings.minSentences, value) : settings.minSentences,
    method: settings.method,
    balance: settings.balance.enabled,
    balanceDepth: settings.balance.depth,
    minPerSection: settings.balance.minPerSection,
    excludeHeadings: settings.excludeHeadings,
    preferPhrases: settings.cueWords.bonus,
    avoidPhrases: settings.cueWords.stigma,
    language: settings.language,
    repair: settings.repair,
    maxChars: settings.maxDocumentSize,
    format,
    baseOffset,
    ...(model !== undefined ? { model } : {}),
  };
}

/** Markdown when the editor says so (or the file name does); everything else is plain text. */
export function formatFor(languageId: string, fileName: string): DocumentFormat {
  if (languageId === 'markdown' || languageId === 'mdx') return 'markdown';
  return /\.(md|markdown|mdown|mkd|mdx)$/i.test(fileName) && languageId === 'plaintext' ? 'markdown' : 'plaintext';
}
