/** `tersely summarize FILE...` */
import { summaryToMarkdown } from '../core/format/markdown';
import { METHODS } from '../core/options';
import { summarize, type SummarizeRequest } from '../core/summarize';
import { choiceFlag, numberFlag, parseCommandArgs, UsageError } from './args';
import { loadModelFile } from './model-file';
import { InputError, readInput } from './read-input';
import { renderText, summaryToJson } from './render-summary';
import { styleFor } from './style';

const FORMATS = ['text', 'markdown', 'json'] as const;

export async function runSummarize(args: string[]): Promise<number> {
  const { values, positionals } = parseCommandArgs(args, {
    sentences: { type: 'string' },
    words: { type: 'string' },
    ratio: { type: 'string' },
    method: { type: 'string' },
    'no-balance': { type: 'boolean' },
    'balance-depth': { type: 'string' },
    exclude: { type: 'string', multiple: true },
    format: { type: 'string' },
    lang: { type: 'string' },
    repair: { type: 'string' },
    'include-tables': { type: 'boolean' },
    model: { type: 'string' },
    'plain-text': { type: 'boolean' },
  });
  if (positionals.length === 0) throw new UsageError('summarize needs at least one FILE (or - for standard input)');
  const budgetFlags = (['sentences', 'words', 'ratio'] as const).filter((k) => values[k] !== undefined);
  if (budgetFlags.length > 1) throw new UsageError(`choose one of --sentences, --words, --ratio (got ${budgetFlags.map((f) => '--' + f).join(' and ')})`);

  const request: Record<string, unknown> = {};
  const sentences = numberFlag('sentences', values.sentences, 1, 100_000, true);
  const words = numberFlag('words', values.words, 1, 10_000_000, true);
  const ratio = numberFlag('ratio', values.ratio, 0.01, 1, false);
  if (sentences !== undefined) request.budget = { unit: 'sentences', value: sentences };
  if (words !== undefined) request.budget = { unit: 'words', value: words };
  if (ratio !== undefined) request.budget = { unit: 'ratio', value: ratio };
  const method = choiceFlag('method', values.method, METHODS);
  if (method) request.method = method;
  if (values['no-balance']) request.balance = false;
  const depth = numberFlag('balance-depth', values['balance-depth'], 1, 6, true);
  if (depth !== undefined) request.balanceDepth = depth;
  if (values.exclude) request.excludeHeadings = values.exclude;
  if (values.lang !== undefined) {
    if (!/^(auto|[a-z]{2,3})$/.test(values.lang)) throw new UsageError(`--lang takes "auto" or a language code such as en, de, fr, not "${values.lang}"`);
    request.language = values.lang;
  }
  const repair = choiceFlag('repair', values.repair, ['suggest', 'auto'] as const);
  if (repair) request.repair = repair;
  if (values['include-tables']) request.includeTables = true;
  if (values.model !== undefined) request.model = await loadModelFile(values.model);
  const format = choiceFlag('format', values.format, FORMATS) ?? 'text';

  const style = styleFor(process.stdout);
  let failures = 0;
  let first = true;
  for (const path of positionals) {
    try {
      const input = await readInput(path, values['plain-text'] ? 'plaintext' : 'markdown');
      const summary = summarize(input.text, { ...(request as SummarizeRequest), format: values['plain-text'] ? 'plaintext' : input.format });
      if (summary.refused) throw new InputError(summary.refused);
      if (format === 'json') {
        process.stdout.write(JSON.stringify(summaryToJson(input.name, summary)) + '\n');
      } else if (format === 'markdown') {
        process.stdout.write((first ? '' : '\n') + (positionals.length > 1 ? `<!-- ${input.name} -->\n` : '') + summaryToMarkdown(summary));
      } else {
        process.stdout.write((first ? '' : '\n') + renderText(input.name, summary, style));
      }
      first = false;
    } catch (error) {
      if (!(error instanceof InputError)) throw error;
      failures++;
      process.stderr.write(`tersely: ${path}: ${error.message}\n`);
      if (format === 'json') process.stdout.write(JSON.stringify({ file: path, error: error.message }) + '\n');
    }
  }
  return failures > 0 ? 1 : 0;
}
