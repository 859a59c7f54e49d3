/** The `tersely` command line: one table of commands, one place that turns errors into messages. */
import { OptionsError, SUMMARY_OPTIONS, HOST_OPTIONS } from '../core/index';
import { UsageError } from './args';
import { InputError } from './read-input';
import { runSummarize } from './summarize-command';
import { helpText } from './help';
import { warn } from './terminal-text';
// package.json's own field; the bundler copies only this field into dist/cli.cjs.
import { version } from '../../package.json';

type Command = (args: string[]) => Promise<number>;

const COMMANDS: Record<string, () => Promise<Command>> = {
  summarize: async () => runSummarize,
  check: async () => (await import('./check-command')).runCheck,
  train: async () => (await import('./train')).runTrain,
  digest: async () => (await import('./digest-command')).runDigest,
};

export async function main(argv: string[]): Promise<number> {
  const [name, ...rest] = argv;
  if (name === undefined || name === '--help' || name === '-h' || name === 'help') {
    process.stdout.write(helpText());
    return name === undefined ? 2 : 0;
  }
  if (name === '--version' || name === '-v') {
    process.stdout.write(`${version}\n`);
    return 0;
  }
  const load = COMMANDS[name];
  if (!load) {
    warn(`tersely: unknown command "${name}" (commands: ${Object.keys(COMMANDS).join(', ')}; see tersely --help)`);
    return 2;
  }
  if (rest.includes('--help') || rest.includes('-h')) {
    process.stdout.write(helpText());
    return 0;
  }
  try {
    return await (await load())(rest);
  } catch (error) {
    if (error instanceof UsageError) {
      warn(`tersely ${name}: ${error.message} (see tersely --help)`);
      return 2;
    }
    if (error instanceof OptionsError) {
      for (const problem of error.problems) warn(`tersely ${name}: ${flagFor(problem.key)}: ${problem.reason}`);
      return 2;
    }
    if (error instanceof InputError) {
      warn(`tersely ${name}: ${error.message}`);
      return 1;
    }
    throw error;
  }
}

/** The flag people typed for a schema key ("budget" → "--length"), for messages. */
function flagFor(key: string): string {
  if (key === 'model') return '--model';
  const definition = (SUMMARY_OPTIONS as Record<string, { cli?: { flag: string } }>)[key] ?? (HOST_OPTIONS as Record<string, { cli?: { flag: string } }>)[key];
  return definition?.cli ? `--${definition.cli.flag}` : key;
}
