/**
 * Command-line flags for the options in the engine's schema: their parseArgs configuration, their
 * --help lines, and the conversion of what was typed into a request. Command-specific flags
 * (--format, --out, …) are declared by each command and passed in as `extra`.
 */
import { ALL_OPTIONS, type CliCommand, type OptionDefinition } from '../core/index';
import { parseCommandArgs, UsageError, type OptionSpec } from './args';

interface FlagOption {
  readonly key: string;
  readonly definition: OptionDefinition<unknown>;
}

/** Old length flags, kept working for one release: each becomes a --length value. */
const DEPRECATED_LENGTH_FLAGS: Readonly<Record<string, (raw: string) => string>> = {
  sentences: (raw) => `${raw}s`,
  words: (raw) => `${raw}w`,
  ratio: (raw) => (/^\d*\.?\d+$/.test(raw) ? `${Math.round(Number(raw) * 100 * 1000) / 1000}%` : raw),
};

export function flagOptionsFor(command: CliCommand): FlagOption[] {
  return ALL_OPTIONS.filter(([, d]) => d.cli?.commands.includes(command)).map(([key, definition]) => ({ key, definition }));
}

/** parseArgs configuration: every flag `multiple`, so a flag given twice is caught, not silently overwritten. */
function parseConfig(command: CliCommand, extra: OptionSpec): OptionSpec {
  const config: Record<string, { type: 'string' | 'boolean'; multiple: true }> = {};
  for (const { definition } of flagOptionsFor(command)) {
    const cli = definition.cli!;
    if (cli.negated) config[cli.negated] = { type: 'boolean', multiple: true };
    else config[cli.flag] = { type: cli.placeholder ? 'string' : 'boolean', multiple: true };
  }
  if (command === 'summarize') for (const flag of Object.keys(DEPRECATED_LENGTH_FLAGS)) config[flag] = { type: 'string', multiple: true };
  for (const [flag, spec] of Object.entries(extra)) config[flag] = { type: spec.type, multiple: true };
  return config;
}

export interface ParsedFlags {
  /** Engine and host option values by schema key (only the ones given). */
  readonly options: Record<string, unknown>;
  /** Command-specific flags: the one value given (a list for repeatable ones declared with `multiple`). */
  readonly extra: Record<string, string | boolean | string[] | undefined>;
  readonly positionals: string[];
  /** Deprecation notes for stderr. */
  readonly notes: string[];
}

function single<T>(flag: string, values: readonly T[] | undefined): T | undefined {
  if (values === undefined || values.length === 0) return undefined;
  if (values.length > 1) throw new UsageError(`--${flag} was given ${values.length} times; give it once`);
  return values[0];
}

/** "expected a whole number from 0 to 100, got "0x5"" → "got "0x5"": the flag's message already says what it takes. */
function withoutExpects(reason: string): string {
  return reason.replace(/^expected .*?, got /, 'got ');
}

/**
 * Parses `args` for `command`. Values are checked by the schema's kinds; a bad one is a UsageError
 * that names the flag and says what it takes.
 */
export function parseFlags(command: CliCommand, args: string[], extra: OptionSpec = {}): ParsedFlags {
  const { values, positionals } = parseCommandArgs(args, parseConfig(command, extra));
  const raw = values as Record<string, (string | boolean)[] | undefined>;
  const options: Record<string, unknown> = {};
  const notes: string[] = [];

  for (const { key, definition } of flagOptionsFor(command)) {
    const cli = definition.cli!;
    if (cli.negated) {
      if (single(cli.negated, raw[cli.negated]) === true) options[key] = false;
      continue;
    }
    if (!cli.placeholder) {
      if (single(cli.flag, raw[cli.flag]) === true) options[key] = true;
      continue;
    }
    const given = raw[cli.flag] as string[] | undefined;
    if (given === undefined) continue;
    const texts = cli.repeatable ? given : [single(cli.flag, given)!];
    const checked = texts.map((text) => definition.kind.fromText(text));
    const bad = checked.find((c) => !c.ok);
    if (bad && !bad.ok) throw new UsageError(`--${cli.flag} takes ${definition.kind.expects}: ${withoutExpects(bad.reason)}`);
    options[key] = cli.repeatable ? checked.flatMap((c) => (c.ok ? (c.value as readonly string[]) : [])) : (checked[0] as { value: unknown }).value;
  }

  if (command === 'summarize') {
    const lengthFlag = flagOptionsFor(command).find((f) => f.key === 'budget')!.definition;
    const old = Object.keys(DEPRECATED_LENGTH_FLAGS).filter((flag) => raw[flag] !== undefined);
    if (old.length + (options.budget !== undefined ? 1 : 0) > 1) {
      throw new UsageError(`choose one length (got ${[...(options.budget !== undefined ? ['--length'] : []), ...old.map((f) => '--' + f)].join(' and ')})`);
    }
    for (const flag of old) {
      const text = DEPRECATED_LENGTH_FLAGS[flag]!(single(flag, raw[flag] as string[])!);
      const checked = lengthFlag.kind.fromText(text);
      if (!checked.ok) throw new UsageError(`--${flag} (now --length ${text}): ${checked.reason}`);
      options.budget = checked.value;
      notes.push(`--${flag} is deprecated and will be removed in the next release; use --length ${text}`);
    }
  }

  const extraValues: ParsedFlags['extra'] = {};
  for (const [flag, spec] of Object.entries(extra)) {
    const given = raw[flag];
    extraValues[flag] = spec.multiple ? (given as string[] | undefined) : (single(flag, given) as string | boolean | undefined);
  }
  return { options, extra: extraValues, positionals, notes };
}

/** `--help` lines for a command's schema options: flag, placeholder, description, default. */
export function optionHelp(command: CliCommand): string[] {
  return flagOptionsFor(command).map(({ definition }) => {
    const cli = definition.cli!;
    const flag = cli.negated ? `--${cli.negated}` : `--${cli.flag}${cli.placeholder ? ' ' + cli.placeholder : ''}`;
    const shownDefault =
      cli.negated || !cli.placeholder
        ? ''
        : Array.isArray(definition.default) && definition.default.length === 0
          ? ''
          : definition.default === ''
            ? ''
            : ` (default: ${definition.kind.toText(definition.default)})`;
    const repeat = cli.repeatable ? ' Repeatable.' : '';
    return helpLine(flag, `${cli.help ?? definition.description}${repeat}${shownDefault}`);
  });
}

/** One --help row: the flag padded to a column, the text wrapped under it. */
export function helpLine(flag: string, text: string): string {
  const column = 24;
  const width = 100;
  const words = text.split(/\s+/);
  const lines: string[] = [];
  let line = '';
  for (const word of words) {
    if (line && column + line.length + 1 + word.length > width) {
      lines.push(line);
      line = word;
    } else line = line ? `${line} ${word}` : word;
  }
  if (line) lines.push(line);
  const head = `  ${flag}`;
  const first = head.length < column ? head.padEnd(column) + (lines[0] ?? '') : `${head}\n${' '.repeat(column)}${lines[0] ?? ''}`;
  return [first, ...lines.slice(1).map((l) => ' '.repeat(column) + l)].join('\n');
}
