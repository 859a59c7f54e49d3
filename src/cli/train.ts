/**
 * `tersely train DIR --reference-heading Summary --out model.json`: learns the sentence model from
 * a folder of the user's own documents that carry their own summaries. This file only walks the
 * folder and writes the result; labelling, features and counting are the engine's (src/core/learn).
 */
import { readdir, writeFile } from 'node:fs/promises';
import { join, relative } from 'node:path';
import { exampleFromDocument, FORMATS, learnTemplateText, formatForFileName, inputProblem, modelFeatureReport, SUMMARY_OPTIONS, trainModel, type BayesModel, type TrainingExample } from '../core/index';
import { UsageError } from './args';
import { parseFlags } from './option-flags';
import { InputError, readInput } from './read-input';
import { warn } from './terminal-text';

/** The `skipped` entry of files the reader refused (too large, binary, empty); each is also named on standard error. */
const UNREADABLE = 'not readable as text';

const TRAIN_FLAGS = {
  'reference-heading': { type: 'string' },
  out: { type: 'string' },
  match: { type: 'string' },
  quiet: { type: 'boolean' },
} as const;

const KNOWN_EXTENSIONS = FORMATS.flatMap((f) => f.extensions).join(', ');

/** Document files under `root`, sorted, skipping hidden folders and node_modules. */
export async function documentFiles(root: string): Promise<string[]> {
  const found: string[] = [];
  const walk = async (folder: string) => {
    const entries = await readdir(folder, { withFileTypes: true });
    for (const entry of entries.sort((a, b) => (a.name < b.name ? -1 : a.name > b.name ? 1 : 0))) {
      if (entry.name.startsWith('.') || entry.name === 'node_modules') continue;
      const path = join(folder, entry.name);
      if (entry.isDirectory()) await walk(path);
      else if (entry.isFile() && formatForFileName(entry.name)) found.push(path);
    }
  };
  try {
    await walk(root);
  } catch {
    throw new InputError(`folder ${root} cannot be read`);
  }
  return found;
}

/** The feature values that most raise or lower the odds, for a one-screen report. */
export function strongestValues(model: BayesModel, count = 6): string[] {
  const rows = [...modelFeatureReport(model)].sort((a, b) => b.odds - a.odds);
  const show = (r: { label: string; odds: number }) => `  ${r.odds >= 0 ? '+' : ''}${r.odds.toFixed(2)}  ${r.label}`;
  return ['raises the odds most:', ...rows.slice(0, count).map(show), 'lowers them most:', ...rows.slice(-count).reverse().map(show)];
}

/** Quotes a word for a POSIX shell when it needs it, so the recorded command can be pasted back. */
export function shellWord(word: string): string {
  return /^[\w./=:@%+-]+$/.test(word) ? word : `'${word.replace(/'/g, `'\\''`)}'`;
}

/** Pretty JSON with each count list on one line, so a model file reads as a table. */
export function modelJson(model: BayesModel): string {
  return JSON.stringify(model, null, 2).replace(/\[\s*([-\d.e+,\s]*?)\s*\]/g, (_, inner: string) => `[${inner.split(/,\s*/).join(', ')}]`) + '\n';
}

/** A document's text through the same checks as `summarize` (size while reading, binary, empty, length), or why not. */
async function readTrainingFile(path: string, maxChars: number): Promise<string | { readonly refused: string }> {
  try {
    const input = await readInput(path, 'markdown', maxChars);
    const problem = inputProblem(input.text, maxChars);
    return problem === null ? input.text : { refused: problem };
  } catch (error) {
    if (error instanceof InputError) return { refused: error.message };
    throw error;
  }
}

export async function runTrain(args: string[]): Promise<number> {
  const { options, extra: values, positionals } = parseFlags('train', args, TRAIN_FLAGS);
  if (positionals.length !== 1) throw new UsageError('train takes one folder of documents');
  const root = positionals[0]!;
  const heading = values['reference-heading'] as string | undefined;
  if (!heading) throw new UsageError('--reference-heading names the section that holds each document’s own summary (e.g. Summary)');
  const out = values.out as string | undefined;
  if (!out) throw new UsageError('--out names the model file to write (e.g. model.json)');
  let match: RegExp | null = null;
  if (typeof values.match === 'string') {
    try {
      match = new RegExp(values.match);
    } catch {
      throw new UsageError(`--match takes a regular expression over file names, not "${values.match}"`);
    }
  }
  const language = (options.language as string | undefined) ?? 'auto';
  const say = (line: string) => {
    if (!values.quiet) process.stderr.write(line);
  };

  const files = (await documentFiles(root)).filter((path) => match === null || match.test(relative(root, path)));
  if (files.length === 0) throw new InputError(`no ${KNOWN_EXTENSIONS} files in ${root}${match ? ` whose name matches ${match}` : ''}`);
  const examples: TrainingExample[] = [];
  const skipped: Record<string, number> = {};
  const maxChars = (options.maxChars as number | undefined) ?? SUMMARY_OPTIONS.maxChars.default;
  const refused: string[] = [];
  for (const [index, path] of files.entries()) {
    if ((index + 1) % 50 === 0 || index + 1 === files.length) say(`\rreading ${index + 1}/${files.length} files`);
    const format = formatForFileName(path)!.id;
    const text = await readTrainingFile(path, maxChars);
    if (typeof text !== 'string') {
      refused.push(`tersely train: ${path}: ${text.refused}`);
      skipped[UNREADABLE] = (skipped[UNREADABLE] ?? 0) + 1;
      continue;
    }
    const example = exampleFromDocument(text, { referenceHeading: heading, format, language });
    if ('skipped' in example) skipped[example.skipped] = (skipped[example.skipped] ?? 0) + 1;
    else examples.push(example);
  }
  say('\n');
  for (const line of refused) warn(line);
  if (examples.length === 0) throw new InputError(`none of the ${files.length} files has a "${heading}" section with prose in it`);

  let model: BayesModel;
  try {
    model = trainModel(examples, {
      trainedOn: {
        command: ['tersely', 'train', ...args].map(shellWord).join(' '),
        referenceHeading: heading,
        files: files.length,
        skipped,
      },
    });
  } catch (error) {
    if (error instanceof RangeError) throw new InputError(error.message);
    throw error;
  }
  // Sentences recurring across independent documents are template text: the model carries them so they are never picked.
  const templateText = learnTemplateText(examples.map((example) => example.analyzed.doc));
  if (templateText.length > 0) model = { ...model, templateText };
  await writeFile(out, modelJson(model));
  const skippedText = Object.entries(skipped).map(([reason, n]) => `${n} × ${reason}`).join(', ');
  say(`trained on ${examples.length} documents (${model.classes.positive} summary-like sentences, ${model.classes.negative} others)`);
  say(skippedText ? `; skipped ${skippedText}\n` : '\n');
  say(strongestValues(model).join('\n') + '\n');
  say(`${templateText.length} template ${templateText.length === 1 ? 'sentence' : 'sentences'} found recurring across the documents (never picked)\n`);
  say(`model written to ${out}\n`);
  return 0;
}
