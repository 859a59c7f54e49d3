/**
 * Every option Tersely has, in one table: its kind, default, bounds or allowed values, a one-line
 * description, and which surfaces expose it (engine, editor setting, command-line flag, panel).
 * The engine's resolution, the extension's settings reader, the CLI's flags and `--help`, and
 * `contributes.configuration` in package.json (scripts/sync-manifest.mjs; a unit test keeps them
 * equal) all come from here.
 */
import { METHOD_INFO } from '../rank/methods';
import { LANGUAGE_CODES } from '../text/language-codes';

const SUPPORTED_LANGUAGES: readonly string[] = LANGUAGE_CODES;
import { DEFAULT_EXCLUDED_HEADINGS } from '../text/headings';
import type { Budget, RankerName } from '../types';
import { accept, booleanKind, choiceKind, describe, integerKind, numberKind, reject, textKind, wordListKind, type ValueKind } from './kinds';
import { lengthKind } from './length';

export interface SettingSurface {
  /** Key below the `tersely.` section. */
  readonly key: string;
  /** Position in the settings editor. */
  readonly order: number;
  /** Never read from an untrusted workspace (it names a file, or can cost a lot of CPU). */
  readonly restricted?: boolean;
  readonly scope?: 'machine-overridable' | 'application' | 'machine' | 'window' | 'resource';
}

export interface CliSurface {
  /** Long flag without the dashes. */
  readonly flag: string;
  /** Placeholder in --help; absent for a switch. */
  readonly placeholder?: string;
  /** A boolean whose default is true is switched off by this flag instead ("no-balance"). */
  readonly negated?: string;
  /** The flag may be given several times, one entry each (list options). */
  readonly repeatable?: boolean;
  /** Commands that take the flag. */
  readonly commands: readonly CliCommand[];
  /** --help text when the option's description does not fit the flag (a negated switch, a file path). */
  readonly help?: string;
}

export type CliCommand = 'summarize' | 'check' | 'train' | 'digest';

export interface OptionDefinition<T> {
  readonly kind: ValueKind<T>;
  readonly default: T;
  readonly description: string;
  readonly setting?: SettingSurface;
  readonly cli?: CliSurface;
  /** Shown as a control in the side panel. */
  readonly panel?: boolean;
}

const define = <T>(definition: OptionDefinition<T>): OptionDefinition<T> => definition;

const languageKind: ValueKind<string> = {
  expects: `auto, or one of ${SUPPORTED_LANGUAGES.join(', ')}`,
  json: { type: 'string', enum: ['auto', ...SUPPORTED_LANGUAGES] },
  check: (value) =>
    value === 'auto' || (typeof value === 'string' && SUPPORTED_LANGUAGES.includes(value))
      ? accept(value as string)
      : reject(`expected auto or a supported language code (${SUPPORTED_LANGUAGES.join(', ')}), got ${describe(value)}`),
  fromText: (text) => languageKind.check(text.trim().toLowerCase()),
  toText: String,
};

const methodKind = choiceKind<RankerName>(METHOD_INFO.map((m) => ({ value: m.name, description: `${m.label}: ${m.detail}` })));

/** Options of a summary (what the engine resolves). */
export const SUMMARY_OPTIONS = {
  budget: define<Budget>({
    kind: lengthKind,
    default: { unit: 'auto', value: 0 },
    description:
      'How long the summary is: auto (the default: a reading time that grows slowly with the document, from under a minute to two minutes at 230 words a minute), ' +
      'tldr (3 sentences), minute (about a one-minute read), detailed (25% of the words), a share of the words (15%), a reading time (2min), ' +
      'a number of words (120w, a hard limit: when no sentence fits, the summary is empty and says why) or of sentences (6s).',
    setting: { key: 'length', order: 1 },
    cli: { flag: 'length', placeholder: 'LENGTH', commands: ['summarize', 'digest'] },
    panel: true,
  }),
  minSentences: define({
    kind: integerKind(0, 100),
    default: 3,
    description: 'Never pick fewer sentences than this when the document has them (a length in sentences wins over it).',
    setting: { key: 'minSentences', order: 2 },
    cli: { flag: 'min-sentences', placeholder: 'N', commands: ['summarize'] },
  }),
  method: define<RankerName>({
    kind: methodKind,
    default: 'maxent',
    description: 'How sentences are scored.',
    setting: { key: 'method', order: 3 },
    cli: { flag: 'method', placeholder: 'NAME', commands: ['summarize', 'digest'] },
    panel: true,
  }),
  balance: define({
    kind: booleanKind,
    default: true,
    description: 'Spread the summary over the document’s sections.',
    setting: { key: 'balance.enabled', order: 4 },
    cli: { flag: 'balance', negated: 'no-balance', commands: ['summarize'], help: 'Do not spread the summary over the sections: take the best sentences wherever they are.' },
    panel: true,
  }),
  balanceDepth: define({
    kind: integerKind(1, 6),
    default: 1,
    description: 'How many heading levels below the document’s top section level count as separate sections for balance (1 = top sections only).',
    setting: { key: 'balance.headingDepth', order: 5 },
    cli: { flag: 'balance-depth', placeholder: 'N', commands: ['summarize'] },
  }),
  minPerSection: define({
    kind: integerKind(0, 20),
    default: 1,
    description: 'Sentences every section with content gets when the length allows.',
    setting: { key: 'balance.minSentencesPerSection', order: 6 },
    cli: { flag: 'min-per-section', placeholder: 'N', commands: ['summarize', 'digest'] },
  }),
  excludeHeadings: define<readonly string[]>({
    kind: wordListKind(200, 100),
    default: DEFAULT_EXCLUDED_HEADINGS,
    description: 'Sections with one of these headings (whole heading, any case, numbering ignored) are left out. Plain words, not patterns.',
    setting: { key: 'excludeHeadings', order: 7 },
    cli: { flag: 'exclude', placeholder: 'HEADING', repeatable: true, commands: ['summarize', 'check', 'digest'] },
  }),
  preferPhrases: define<readonly string[]>({
    kind: wordListKind(200, 100),
    default: [],
    description: 'Words or phrases that make a sentence more likely to be picked. Plain words, not patterns.',
    setting: { key: 'phrases.prefer', order: 8 },
    cli: { flag: 'prefer', placeholder: 'PHRASE', repeatable: true, commands: ['summarize'] },
  }),
  avoidPhrases: define<readonly string[]>({
    kind: wordListKind(200, 100),
    default: [],
    description: 'Words or phrases that make a sentence less likely to be picked. Plain words, not patterns.',
    setting: { key: 'phrases.avoid', order: 9 },
    cli: { flag: 'avoid', placeholder: 'PHRASE', repeatable: true, commands: ['summarize'] },
  }),
  language: define({
    kind: languageKind,
    default: 'auto',
    description: 'Language for stop words and stemming: auto to detect it, or a language code.',
    setting: { key: 'language', order: 10 },
    cli: { flag: 'lang', placeholder: 'CODE', commands: ['summarize', 'check', 'train', 'digest'] },
  }),
  repair: define<'suggest' | 'auto'>({
    kind: choiceKind([
      { value: 'suggest', description: 'Flag summary sentences that may not stand alone and offer repairs.' },
      { value: 'auto', description: 'Repair them automatically where possible.' },
    ]),
    default: 'suggest',
    description: 'What to do with summary sentences that may not stand alone.',
    setting: { key: 'repair', order: 11 },
    cli: { flag: 'repair', placeholder: 'MODE', commands: ['summarize'] },
  }),
  includeTables: define({
    kind: booleanKind,
    default: false,
    description: 'Read table cells as prose.',
    setting: { key: 'includeTables', order: 12 },
    cli: { flag: 'include-tables', commands: ['summarize', 'check', 'digest'] },
  }),
  includeFootnotes: define({
    kind: booleanKind,
    default: false,
    description: 'Read footnote and citation bodies as prose (reStructuredText).',
    setting: { key: 'includeFootnotes', order: 13 },
    cli: { flag: 'include-footnotes', commands: ['summarize', 'check', 'digest'] },
  }),
  maxChars: define({
    kind: integerKind(1_000, 20_000_000),
    default: 3_000_000,
    description: 'Largest document (or selection) to read, in characters; larger ones get a message instead.',
    setting: { key: 'maxDocumentSize', order: 14, restricted: true, scope: 'machine-overridable' },
    cli: { flag: 'max-size', placeholder: 'CHARS', commands: ['summarize', 'check', 'train', 'digest'] },
  }),
  focus: define({
    kind: textKind(500),
    default: '',
    description: 'A question or a few words to focus the summary on: only sentences that use its words are picked, ranked towards it; empty for a general summary.',
    cli: { flag: 'focus', placeholder: 'TEXT', commands: ['summarize'] },
  }),
  mmrLambda: define({
    kind: numberKind(0, 1),
    // Carbonell & Goldstein (1998) leave λ to the application; 0.7 favours relevance while still
    // pushing out near-duplicates (common practice, no source).
    default: 0.7,
    description: 'Maximal Marginal Relevance trade-off: 1 = relevance only, 0 = novelty only.',
  }),
} as const;

/**
 * Where hosting services conventionally keep pull-request and issue templates (from memory: the
 * GitHub and GitLab documentation on templates); a folder ends in "/".
 */
export const CONVENTIONAL_TEMPLATE_LOCATIONS: readonly string[] = [
  '.github/pull_request_template.md',
  '.github/PULL_REQUEST_TEMPLATE.md',
  'pull_request_template.md',
  'PULL_REQUEST_TEMPLATE.md',
  'docs/pull_request_template.md',
  'docs/PULL_REQUEST_TEMPLATE.md',
  '.github/PULL_REQUEST_TEMPLATE/',
  '.github/ISSUE_TEMPLATE/',
  '.gitlab/merge_request_templates/',
  '.gitlab/issue_templates/',
];

/** Options of the editor or the command line only (not part of a summary request). */
export const HOST_OPTIONS = {
  liveDelay: define({
    kind: integerKind(50, 5_000),
    default: 300,
    description: 'With the live summary on, how long typing must pause (milliseconds) before the summary follows.',
    setting: { key: 'live.delay', order: 15 },
  }),
  modelFile: define({
    kind: textKind(1024),
    default: '',
    description: 'A trained sentence model (JSON from `tersely train`) for the trained method; empty for the built-in one. Relative paths start at the first workspace folder.',
    setting: { key: 'modelFile', order: 16, restricted: true, scope: 'machine-overridable' },
    cli: { flag: 'model', placeholder: 'FILE', commands: ['summarize', 'digest'], help: 'A trained sentence model (JSON from `tersely train`) for the trained and balanced methods, instead of the built-in one.' },
  }),
  problemsView: define({
    kind: booleanKind,
    default: false,
    description: 'Also list the summary’s notes (sentences that may not stand alone) and abstract-check findings in the Problems view. They always show in the panel and as a faint mark in the editor.',
    setting: { key: 'problemsView', order: 17 },
  }),
  templateFiles: define<readonly string[]>({
    kind: wordListKind(50, 1024),
    default: CONVENTIONAL_TEMPLATE_LOCATIONS,
    description:
      'The team’s document templates: sentences that occur in one are never picked. Files, or folders (ending in /) whose Markdown, reStructuredText and text files are all templates; relative paths start at the workspace folder (the current folder on the command line). Locations that do not exist are passed over.',
    setting: { key: 'templateFiles', order: 18, restricted: true, scope: 'machine-overridable' },
    cli: { flag: 'template', placeholder: 'FILE', repeatable: true, commands: ['summarize', 'digest'], help: 'A document template (file, or folder ending in /) whose sentences are never picked; repeat for several. Without it, the conventional pull-request and issue template locations are read when present.' },
  }),
} as const;

export type SummaryOptionKey = keyof typeof SUMMARY_OPTIONS;
type ValueOf<D> = D extends OptionDefinition<infer T> ? T : never;

/** A complete, checked set of summary options. */
export type SummaryOptionValues = { readonly [K in SummaryOptionKey]: ValueOf<(typeof SUMMARY_OPTIONS)[K]> };
export type HostOptionKey = keyof typeof HOST_OPTIONS;
export type HostOptionValues = { readonly [K in HostOptionKey]: ValueOf<(typeof HOST_OPTIONS)[K]> };

/** Every option with a surface, engine and host alike, for the surfaces to iterate over. */
export const ALL_OPTIONS: readonly (readonly [string, OptionDefinition<unknown>])[] = [
  ...Object.entries(SUMMARY_OPTIONS),
  ...Object.entries(HOST_OPTIONS),
] as readonly (readonly [string, OptionDefinition<unknown>])[];
