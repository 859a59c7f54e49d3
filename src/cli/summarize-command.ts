/** `tersely summarize FILE...` */
import { FORMAT_IDS, SUMMARY_OPTIONS, summarize, summaryToMarkdown, type DocumentFormat, type Summary, type SummarizeRequest } from '../core/index';
import { choiceFlag, UsageError } from './args';
import { engineRequest } from './engine-request';
import { parseFlags } from './option-flags';
import { InputError, readInput } from './read-input';
import { renderText, summaryToJson } from './render-summary';
import { styleFor } from './style';
import { neutralizeControls, terminalSafeJson, warn } from './terminal-text';

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
  for (const note of notes) warn(`tersely: ${note}`);

  const request = await engineRequest(options);
  const maxChars = (options.maxChars as number | undefined) ?? SUMMARY_OPTIONS.maxChars.default;

  const style = styleFor(process.stdout);
  let failures = 0;
  let first = true;
  for (const path of positionals) {
    try {
      const input = await readInput(path, inputFormat ?? 'markdown', maxChars);
      const engineSummary = summarize(input.text, { ...(request as SummarizeRequest), format: inputFormat ?? input.format });
      if (engineSummary.refused) throw new InputError(engineSummary.refused);
      const summary: Summary = { ...engineSummary, notices: [...input.notices, ...engineSummary.notices] };
      const empty = summary.sentences.length === 0;
      if (output === 'json') {
        process.stdout.write(terminalSafeJson(summaryToJson(input.name, summary, input)) + '\n');
      } else if (!empty && output === 'markdown') {
        const label = positionals.length > 1 ? `<!-- ${input.name.replace(/--/g, '- -')} -->\n` : '';
        process.stdout.write(neutralizeControls((first ? '' : '\n') + label + summaryToMarkdown(summary)));
        for (const notice of summary.notices) warn(`tersely: ${path}: note: ${notice}`);
      } else if (!empty) {
        process.stdout.write((first ? '' : '\n') + renderText(input.name, summary, style));
      }
      if (!empty) first = false;
      else {
        // Asked for a summary and got none: say why on standard error and exit non-zero.
        failures++;
        warn(`tersely: ${path}: no summary: ${summary.notices.join(' ') || 'nothing could be picked.'}`);
      }
    } catch (error) {
      if (!(error instanceof InputError)) throw error;
      failures++;
      warn(`tersely: ${path}: ${error.message}`);
      if (output === 'json') process.stdout.write(terminalSafeJson({ file: path, error: error.message }) + '\n');
    }
  }
  return failures > 0 ? 1 : 0;
}
