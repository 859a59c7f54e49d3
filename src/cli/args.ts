/** Flag parsing on top of node:util's parseArgs, with one-line messages people can act on. */
import { parseArgs, type ParseArgsConfig } from 'node:util';

export class UsageError extends Error {}

export type OptionSpec = NonNullable<ParseArgsConfig['options']>;

export function parseCommandArgs<const T extends OptionSpec>(args: string[], options: T) {
  try {
    return parseArgs({ args, options, allowPositionals: true as const, strict: true as const });
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
