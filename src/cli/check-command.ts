/** `tersely check FILE [--abstract-heading TEXT | --abstract-opening | --abstract FILE] [--format text|json] [--strict]` */
import { checkAbstract, SUMMARY_OPTIONS, type AbstractReport, type AbstractSentenceCheck, type AbstractSource } from '../core/index';
import { choiceFlag, UsageError } from './args';
import { parseFlags } from './option-flags';
import { InputError, readInput } from './read-input';
import { styleFor, type Style } from './style';
import { forcedFormat } from './summarize-command';
import { neutralizeControls, plural, terminalSafeJson, warn } from './terminal-text';

/** How the command line names the abstract, added to the engine's message when none was found. */
const HOW_TO_NAME_ABSTRACT = 'Name its heading with --abstract-heading TEXT, check the text before the first heading with --abstract-opening, or give it in a file with --abstract FILE.';

/** What ROUGE means here, in one sentence. */
export const ROUGE_EXPLAINED =
  'ROUGE counts the words (ROUGE-1), word pairs (ROUGE-2) and longest word sequence (ROUGE-L) the abstract shares with the summary Tersely would pick at the same length: high means the abstract dwells on what Tersely finds central, not that either is right.';

type Check = Extract<AbstractReport, { ok: true }>;

/** Exit status under --strict: 1 when a section is uncovered or a claim is unsupported or contradicted. */
export function strictStatus(report: Check): 0 | 1 {
  return report.uncoveredSections.length > 0 || report.unsupportedSentences.length > 0 ? 1 : 0;
}

/** readInput, with the file named in its refusal as `summarize` does. */
async function readNamed(path: string, stdinFormat: Parameters<typeof readInput>[1], maxChars: number) {
  try {
    return await readInput(path, stdinFormat, maxChars);
  } catch (error) {
    if (error instanceof InputError) throw new InputError(`${path}: ${error.message}`);
    throw error;
  }
}

export async function runCheck(args: string[]): Promise<number> {
  const { options, extra, positionals, notes } = parseFlags('check', args, {
    'abstract-heading': { type: 'string' },
    'abstract-opening': { type: 'boolean' },
    abstract: { type: 'string' },
    format: { type: 'string' },
    'input-format': { type: 'string' },
    strict: { type: 'boolean' },
  });
  if (positionals.length !== 1) throw new UsageError('check takes exactly one FILE');
  const heading = extra['abstract-heading'] as string | undefined;
  const abstractFile = extra.abstract as string | undefined;
  const opening = extra['abstract-opening'] === true;
  if ([heading !== undefined, abstractFile !== undefined, opening].filter(Boolean).length > 1) throw new UsageError('choose one of --abstract-heading, --abstract-opening and --abstract');
  const format = choiceFlag('format', extra.format as string | undefined, ['text', 'json'] as const) ?? 'text';
  const strict = extra.strict === true;
  const inputFormat = forcedFormat(extra, notes);
  for (const note of notes) warn(`tersely: ${note}`);
  // The same size cap as a summary (--max-size), applied while reading.
  const maxChars = (options.maxChars as number | undefined) ?? SUMMARY_OPTIONS.maxChars.default;
  const input = await readNamed(positionals[0]!, inputFormat ?? 'markdown', maxChars);
  let abstract: AbstractSource | undefined;
  if (heading !== undefined) abstract = { kind: 'heading', heading };
  if (opening) abstract = { kind: 'opening' };
  if (abstractFile !== undefined) {
    const file = await readNamed(abstractFile, 'markdown', maxChars);
    abstract = { kind: 'text', text: file.text, format: file.format };
  }
  const report = checkAbstract(input.text, { ...options, format: inputFormat ?? input.format, ...(abstract ? { abstract } : {}) });
  if (!report.ok) throw new InputError(report.reason === 'noAbstract' || report.reason === 'missingHeading' ? `${report.error} ${HOW_TO_NAME_ABSTRACT}` : report.error);
  if (format === 'json') process.stdout.write(terminalSafeJson({ file: input.name, ...report, notices: [...input.notices, ...report.notices] }) + '\n');
  else {
    // Document text is neutralized before styling, so the document cannot drive the terminal.
    process.stdout.write(renderCheck(neutralizeControls(input.name), neutralizedReport(report), styleFor(process.stdout)));
    for (const notice of input.notices) warn(`tersely: ${input.name}: note: ${notice}`);
  }
  return strict ? strictStatus(report) : 0;
}

/** The report with every string from the document neutralized for a terminal (see terminal-text.ts). */
function neutralizedReport(report: Check): Check {
  const walk = (value: unknown): unknown => {
    if (typeof value === 'string') return neutralizeControls(value);
    if (Array.isArray(value)) return value.map(walk);
    if (value !== null && typeof value === 'object') return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, walk(v)]));
    return value;
  };
  return walk(report) as Check;
}

const pct = (x: number) => `${Math.round(x * 100)}%`;

const MARKS: Readonly<Record<AbstractSentenceCheck['verdict'], string>> = { supported: '✓', contradicted: '✗', unsupported: '?', notAClaim: '·' };
const VERDICT_WORDS: Readonly<Record<AbstractSentenceCheck['verdict'], string>> = {
  supported: 'supported',
  contradicted: 'contradicted',
  unsupported: 'unsupported',
  notAClaim: 'not judged',
};

function sentenceLines(sentence: AbstractSentenceCheck, style: Style): string[] {
  const flagged = !sentence.supported;
  const mark = flagged ? style.warn(MARKS[sentence.verdict]) : MARKS[sentence.verdict];
  const where = sentence.line !== null ? `line ${sentence.line}` : `sentence ${sentence.index + 1}`;
  const out = [`  ${mark} ${sentence.index + 1}. ${sentence.text}`];
  const paint = flagged ? style.warn : style.dim;
  out.push(paint(`       ${VERDICT_WORDS[sentence.verdict]} (${where}): ${sentence.reason}`));
  // A contradicted sentence's first finding is already in its reason.
  for (const finding of sentence.verdict === 'contradicted' ? sentence.findings.slice(1) : sentence.findings) out.push(style.warn(`       ${finding.message}`));
  if (sentence.copy) {
    const how = sentence.copy.kind === 'verbatim' ? 'copies' : 'nearly copies';
    out.push(style.dim(`       ${how} line ${sentence.copy.line} (${pct(sentence.copy.containment)} of its word triples)`));
  }
  return out;
}

export function renderCheck(name: string, report: Check, style: Style): string {
  const out: string[] = [];
  const where = report.abstract.heading ? `the "${report.abstract.heading}" section` : report.abstract.origin === 'opening' ? 'the opening text before the first heading' : 'the separate abstract';
  out.push(style.bold(`Abstract check: ${name}`), style.dim(`Checking ${where} (${report.abstract.words} words, ${plural(report.abstract.sentences.length, 'sentence')}) against the body.`));
  out.push(style.dim(report.rule));

  out.push('', style.accent('Sentences of the abstract'));
  for (const sentence of report.abstract.sentences) out.push(...sentenceLines(sentence, style));

  out.push('', style.accent('Sections of the body'));
  for (const section of report.sections) {
    const heading = section.heading || '(opening text)';
    if (section.covered) {
      out.push(`  ✓ ${heading} (line ${section.line}): covered — abstract sentence ${(section.abstractSentence ?? 0) + 1} draws its support from it`);
    } else {
      let closest = '';
      if (section.abstractSentence !== null) {
        const k = section.abstractSentence + 1;
        closest = section.similarity >= report.thresholds.supported
          ? `; closest: abstract sentence ${k} (${pct(section.similarity)}), whose support comes from other sections`
          : `; closest: abstract sentence ${k} at ${pct(section.similarity)}, below the ${pct(report.thresholds.supported)} the rule asks`;
      }
      out.push(style.warn(`  ✗ ${heading} (line ${section.line}): not covered — no abstract sentence draws its support from it${closest}`));
    }
  }
  for (const skipped of report.unjudgedSections) out.push(style.dim(`  · ${skipped.heading || '(opening text)'}: too short to judge`));

  const content = report.content;
  if (content.items.length > 0) {
    out.push('', style.accent('Key content (terms the body repeats across sections; weight = sections using it, plus the title)'));
    out.push(`  covers ${pct(content.share)} of the weight (${content.coveredWeight} of ${content.totalWeight})`);
    const missing = content.items.filter((i) => !i.covered);
    if (missing.length > 0) out.push(`  missing: ${missing.map((i) => `${i.word} (${i.weight}, first line ${i.line})`).join(', ')}`);
  }

  if (report.copied.sentences.length > 0) {
    out.push('', style.accent('Copied from the body'));
    out.push(`  ${plural(report.copied.sentences.length, 'sentence')} (${report.copied.sentences.map((k) => k + 1).join(', ')}) repeat body sentences nearly word for word: ${pct(report.copied.share)} of the abstract's words.`);
  }

  if (report.rouge) {
    const r = report.rouge;
    out.push(
      '',
      style.accent(`Compared with Tersely's own ${r.summaryWords}-word summary`),
      style.dim(`  ${ROUGE_EXPLAINED}`),
      `  ROUGE-1 F1 ${pct(r.abstractAgainstSummary.rouge1.f1)}, ROUGE-2 F1 ${pct(r.abstractAgainstSummary.rouge2.f1)}, ROUGE-L F1 ${pct(r.abstractAgainstSummary.rougeL.f1)}`,
    );
  }
  for (const notice of report.notices) out.push(style.warn(`note: ${notice}`));

  const missing = report.uncoveredSections.length;
  const contradicted = report.contradictedSentences.length;
  const unsupported = report.unsupportedSentences.length - contradicted;
  out.push('');
  if (missing + unsupported + contradicted === 0) out.push('Every section is covered and every abstract sentence is supported by the body.');
  else out.push(`${plural(contradicted, 'sentence')} contradicted, ${plural(unsupported, 'sentence')} unsupported, ${plural(missing, 'section')} not covered.`);
  return out.join('\n') + '\n';
}
