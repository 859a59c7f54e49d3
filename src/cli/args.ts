/** Flag parsing on top of node:util's parseArgs, with one-line messages people can act on. */
import { parseArgs, type ParseArgsConfig } from 'node:util';

export class UsageError extends Error {}

export type OptionSpec = NonNullable<ParseArgsConfig['options']>;

/** A value that starts with a dash but is a number ("-3", "-3s", "-0.5"), not a flag. */
const NEGATIVE_NUMBER = /^-\.?\d/;

/**
 * `--length -3` becomes `--length=-3`, so a negative number reaches the option's own check and is
 * reported as out of range rather than as a missing value.
 */
function attachNegativeValues(args: readonly string[], options: OptionSpec): string[] {
  const out: string[] = [];
  for (let k = 0; k < args.length; k++) {
    const arg = args[k]!;
    const next = args[k + 1];
    const name = arg.startsWith('--') ? arg.slice(2) : null;
    if (name !== null && options[name]?.type === 'string' && next !== undefined && NEGATIVE_NUMBER.test(next)) {
      out.push(`${arg}=${next}`);
      k++;
    } else out.push(arg);
  }
  return out;
}

export function parseCommandArgs<const T extends OptionSpec>(args: string[], options: T) {
  try {
    return parseArgs({ args: attachNegativeValues(args, options), options, allowPositionals: true as const, strict: true as const });
  } catch (error) {
    const e = error as { code?: string; message: string };
    const flag = /'(-{1,2}[^'\s]+)/.exec(e.message)?.[1];
    if (e.code === 'ERR_PARSE_ARGS_UNKNOWN_OPTION') throw new UsageError(`unknown option ${flag ?? ''}`.trim());
    if (e.code === 'ERR_PARSE_ARGS_INVALID_OPTION_VALUE') throw new UsageError(`option ${flag ?? ''} needs a value`.replace('  ', ' '));
    throw new UsageError(e.message.split('\n')[0] ?? 'invalid arguments');
  }
}

export function choiceFlag<T extends string>(name: string, raw: string | undefined, choices: readonly T[]): T | undefined {
  if (raw === undefined) return undefined;
  if (!choices.includes(raw as T)) throw new UsageError(`--${name} takes one of ${choices.join(', ')}, not "${raw}"`);
  return raw as T;
}
