/** `tersely summarize FILE...` */
import { FORMAT_IDS, summarize, summaryToMarkdown, type DocumentFormat, type SummarizeRequest } from '../core/index';
import { choiceFlag, UsageError } from './args';
import { loadModelFile } from './model-file';
import { parseFlags } from './option-flags';
import { InputError, readInput } from './read-input';
import { renderText, summaryToJson } from './render-summary';
import { styleFor } from './style';

const OUTPUTS = ['text', 'markdown', 'json'] as const;

/** --input-format, or the deprecated --plain-text; undefined means "by file extension". */
export function forcedFormat(extra: Record<string, unknown>, notes: string[]): DocumentFormat | undefined {
  const chosen = choiceFlag('input-format', extra['input-format'] as string | undefined, FORMAT_IDS);
  if (extra['plain-text'] === true) {
    if (chosen !== undefined) throw new UsageError('choose one of --input-format and --plain-text');
    notes.push('--plain-text is deprecated and will be removed in the next release; use --input-format plaintext');
    return 'plaintext';
  }
  return chosen;
}

export async function runSummarize(args: string[]): Promise<number> {
  const { options, extra, positionals, notes } = parseFlags('summarize', args, {
    format: { type: 'string' },
    'input-format': { type: 'string' },
    'plain-text': { type: 'boolean' },
  });
  if (positionals.length === 0) throw new UsageError('summarize needs at least one FILE (or - for standard input)');
  const output = choiceFlag('format', extra.format as string | undefined, OUTPUTS) ?? 'text';
  const inputFormat = forcedFormat(extra, notes);
  for (const note of notes) process.stderr.write(`tersely: ${note}\n`);

  const { modelFile, ...summaryOptions } = options;
  const request: Record<string, unknown> = { ...summaryOptions };
  if (typeof modelFile === 'string' && modelFile !== '') request.model = await loadModelFile(modelFile);

  const style = styleFor(process.stdout);
  let failures = 0;
  let first = true;
  for (const path of positionals) {
    try {
      const input = await readInput(path, inputFormat ?? 'markdown');
      const summary = summarize(input.text, { ...(request as SummarizeRequest), format: inputFormat ?? input.format });
      if (summary.refused) throw new InputError(summary.refused);
      if (output === 'json') {
        process.stdout.write(JSON.stringify(summaryToJson(input.name, summary)) + '\n');
      } else if (output === 'markdown') {
        process.stdout.write((first ? '' : '\n') + (positionals.length > 1 ? `<!-- ${input.name} -->\n` : '') + summaryToMarkdown(summary));
      } else {
        process.stdout.write((first ? '' : '\n') + renderText(input.name, summary, style));
      }
      first = false;
    } catch (error) {
      if (!(error instanceof InputError)) throw error;
      failures++;
      process.stderr.write(`tersely: ${path}: ${error.message}\n`);
      if (output === 'json') process.stdout.write(JSON.stringify({ file: path, error: error.message }) + '\n');
    }
  }
  return failures > 0 ? 1 : 0;
}
