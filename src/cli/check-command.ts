/** `tersely check FILE [--abstract-heading TEXT | --abstract FILE] [--format text|json]` */
import { checkAbstract, LineIndex, type AbstractReport, type AbstractSource } from '../core/index';
import { choiceFlag, UsageError } from './args';
import { parseFlags } from './option-flags';
import { InputError, readInput } from './read-input';
import { styleFor, type Style } from './style';
import { forcedFormat } from './summarize-command';

/** How the command line names the abstract, added to the engine's message when none was found. */
const HOW_TO_NAME_ABSTRACT = 'Name its heading with --abstract-heading TEXT, or give it in a file with --abstract FILE.';

export async function runCheck(args: string[]): Promise<number> {
  const { options, extra, positionals, notes } = parseFlags('check', args, {
    'abstract-heading': { type: 'string' },
    abstract: { type: 'string' },
    format: { type: 'string' },
    'input-format': { type: 'string' },
  });
  if (positionals.length !== 1) throw new UsageError('check takes exactly one FILE');
  const heading = extra['abstract-heading'] as string | undefined;
  const abstractFile = extra.abstract as string | undefined;
  if (heading !== undefined && abstractFile !== undefined) throw new UsageError('choose one of --abstract-heading and --abstract');
  const format = choiceFlag('format', extra.format as string | undefined, ['text', 'json'] as const) ?? 'text';
  const inputFormat = forcedFormat(extra, notes);
  for (const note of notes) process.stderr.write(`tersely: ${note}\n`);
  const input = await readInput(positionals[0]!, inputFormat ?? 'markdown');
  let abstract: AbstractSource | undefined;
  if (heading !== undefined) abstract = { kind: 'heading', heading };
  if (abstractFile !== undefined) {
    const file = await readInput(abstractFile);
    abstract = { kind: 'text', text: file.text, format: file.format };
  }
  const report = checkAbstract(input.text, { ...options, format: inputFormat ?? input.format, ...(abstract ? { abstract } : {}) });
  if (!report.ok) throw new InputError(report.reason === 'noAbstract' || report.reason === 'missingHeading' ? `${report.error} ${HOW_TO_NAME_ABSTRACT}` : report.error);
  if (format === 'json') process.stdout.write(JSON.stringify({ file: input.name, ...report }) + '\n');
  else process.stdout.write(renderCheck(input.name, input.text, report, styleFor(process.stdout)));
  return 0;
}

function pct(x: number): string {
  return `${Math.round(x * 100)}%`;
}

export function renderCheck(name: string, text: string, report: Extract<AbstractReport, { ok: true }>, style: Style): string {
  const lines = new LineIndex(text);
  const at = (offset: number) => `line ${lines.lineNumber(offset)}`;
  const out: string[] = [];
  const where = report.abstract.heading ? `the "${report.abstract.heading}" section` : 'the separate abstract';
  out.push(style.bold(`Abstract check: ${name}`), style.dim(`Checking ${where} (${report.abstract.words} words, ${report.abstract.sentences.length} sentences) against the body.`));

  out.push('', style.accent('Sections of the body'));
  for (const section of report.sections) {
    const mark = section.covered ? '✓' : style.warn('✗');
    const heading = section.heading || '(opening text)';
    const detail = section.covered
      ? style.dim(`similarity ${section.similarity.toFixed(2)}, best matched by abstract sentence ${(section.abstractSentence ?? 0) + 1}`)
      : style.warn(`not covered by the abstract (best similarity ${section.similarity.toFixed(2)}) — ${at(section.span.start)}`);
    out.push(`  ${mark} ${heading}: ${detail}`);
  }
  for (const skipped of report.unjudgedSections) out.push(style.dim(`  · ${skipped.heading || '(opening text)'}: too short to judge`));

  out.push('', style.accent('Sentences of the abstract'));
  report.abstract.sentences.forEach((sentence, k) => {
    const mark = sentence.supported ? '✓' : style.warn('?');
    out.push(`  ${mark} ${k + 1}. ${sentence.text}`);
    if (!sentence.supported) {
      out.push(style.warn(`       nothing in the body clearly supports this (best similarity ${sentence.similarity.toFixed(2)})`));
    } else {
      const best = sentence.support[0]!;
      out.push(style.dim(`       supported by ${at(best.span.start)} (${best.heading || 'opening text'}, similarity ${best.similarity.toFixed(2)})`));
    }
  });

  if (report.rouge) {
    const r = report.rouge;
    out.push(
      '',
      style.accent(`Compared with Tersely's own ${r.summaryWords}-word summary`),
      `  abstract vs summary: ROUGE-1 F1 ${pct(r.abstractAgainstSummary.rouge1.f1)}, ROUGE-2 F1 ${pct(r.abstractAgainstSummary.rouge2.f1)}, ROUGE-L F1 ${pct(r.abstractAgainstSummary.rougeL.f1)}`,
      `  summary vs abstract: ROUGE-1 recall ${pct(r.summaryAgainstAbstract.rouge1.recall)}, ROUGE-2 recall ${pct(r.summaryAgainstAbstract.rouge2.recall)}`,
    );
  }
  for (const notice of report.notices) out.push(style.warn(`note: ${notice}`));
  const missing = report.uncoveredSections.length;
  const unsupported = report.unsupportedSentences.length;
  out.push('', missing + unsupported === 0 ? 'The abstract covers every section and each of its sentences has support in the body.' : `${missing} section(s) not covered, ${unsupported} abstract sentence(s) without clear support.`);
  return out.join('\n') + '\n';
}
