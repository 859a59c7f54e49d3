/**
 * `tersely train DIR... [--files LIST] --reference-heading Summary --out model.json`: learns a
 * sentence model from the user's own documents that carry their own summaries. This file only
 * gathers the files and writes the result; labelling, features and fitting are the engine's
 * (src/core/rank/trained).
 */
import { readFile, writeFile } from 'node:fs/promises';
import {
  exampleFromDocument,
  learnTemplateText,
  FORMATS,
  formatForFileName,
  inputProblem,
  LABEL_RULES,
  maxentFeatureReport,
  MODEL_KINDS,
  modelFeatureReport,
  SUMMARY_OPTIONS,
  trainMaxentModel,
  trainModel,
  type LabelRule,
  type SentenceModel,
  type TrainingExample,
} from '../core/index';
import { UsageError } from './args';
import { parseFlags } from './option-flags';
import { InputError, readInput } from './read-input';
import { warn } from './terminal-text';
import { filesPerFolder, trainingFiles } from './training-files';

export { documentFiles } from './training-files';

/** The `skipped` entry of files the reader refused (too large, binary, empty); each is also named on standard error. */
const UNREADABLE = 'not readable as text';

const TRAIN_FLAGS = {
  'reference-heading': { type: 'string' },
  'reference-introduction': { type: 'boolean' },
  kind: { type: 'string' },
  regularization: { type: 'string' },
  labels: { type: 'string' },
  files: { type: 'string' },
  out: { type: 'string' },
  match: { type: 'string' },
  quiet: { type: 'boolean' },
} as const;

const KNOWN_EXTENSIONS = FORMATS.flatMap((f) => f.extensions).join(', ');

type Kind = (typeof MODEL_KINDS)[number];

/** The feature values that most raise or lower the odds, for a one-screen report. */
export function strongestValues(model: SentenceModel, count = 6): string[] {
  const rows = [...(model.kind === 'naive-bayes' ? modelFeatureReport(model) : maxentFeatureReport(model))].sort((a, b) => b.odds - a.odds);
  const show = (r: { label: string; odds: number }) => `  ${r.odds >= 0 ? '+' : ''}${r.odds.toFixed(2)}  ${r.label}`;
  return ['raises the odds most:', ...rows.slice(0, count).map(show), 'lowers them most:', ...rows.slice(-count).reverse().map(show)];
}

/** Quotes a word for a POSIX shell when it needs it, so the recorded command can be pasted back. */
export function shellWord(word: string): string {
  return /^[\w./=:@%+-]+$/.test(word) ? word : `'${word.replace(/'/g, `'\\''`)}'`;
}

/** Pretty JSON with each number list on one line, so a model file reads as a table. */
export function modelJson(model: SentenceModel): string {
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

/** FNV-1a (32 bit) of a text, to record which version of a file list a model was trained from. */
function fingerprint(text: string): string {
  let hash = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) hash = Math.imul(hash ^ text.charCodeAt(i), 0x01000193) >>> 0;
  return hash.toString(16).padStart(8, '0');
}

function parseTrainArgs(args: string[]) {
  const { options, extra: values, positionals } = parseFlags('train', args, TRAIN_FLAGS);
  const list = values.files as string | undefined;
  if (positionals.length === 0 && list === undefined) throw new UsageError('train takes one or more folders of documents, or --files LIST');
  const heading = (values['reference-heading'] as string | undefined) ?? null;
  const introduction = values['reference-introduction'] === true;
  if (heading === null && !introduction) {
    throw new UsageError('--reference-heading names the section that holds each document’s own summary (e.g. Summary); --reference-introduction takes the introduction before the first section');
  }
  const out = values.out as string | undefined;
  if (!out) throw new UsageError('--out names the model file to write (e.g. model.json)');
  const kind = (values.kind as string | undefined) ?? MODEL_KINDS[0];
  if (!(MODEL_KINDS as readonly string[]).includes(kind)) throw new UsageError(`--kind takes ${MODEL_KINDS.join(' or ')}, not "${kind}"`);
  const regularizationText = values.regularization as string | undefined;
  const regularization = regularizationText === undefined ? undefined : Number(regularizationText);
  if (regularization !== undefined && !(Number.isFinite(regularization) && regularization >= 0 && regularizationText!.trim() !== '')) {
    throw new UsageError(`--regularization takes a number of at least 0 (the L2 penalty), not "${regularizationText}"`);
  }
  if (regularization !== undefined && kind !== 'maximum-entropy') throw new UsageError('--regularization applies to --kind maximum-entropy only');
  const labels = values.labels as string | undefined;
  if (labels !== undefined && !(LABEL_RULES as readonly string[]).includes(labels)) throw new UsageError(`--labels takes ${LABEL_RULES.join(', ')}, not "${labels}"`);
  if (labels !== undefined && kind !== 'maximum-entropy') throw new UsageError('--labels applies to --kind maximum-entropy only');
  let match: RegExp | null = null;
  if (typeof values.match === 'string') {
    try {
      match = new RegExp(values.match);
    } catch {
      throw new UsageError(`--match takes a regular expression over file names, not "${values.match}"`);
    }
  }
  return { options, positionals, list, heading, introduction, out, kind: kind as Kind, regularization, labels: labels as LabelRule | undefined, match, quiet: values.quiet === true };
}

export async function runTrain(args: string[]): Promise<number> {
  const parsed = parseTrainArgs(args);
  const { heading, introduction, out, kind, match } = parsed;
  const language = (parsed.options.language as string | undefined) ?? 'auto';
  const say = (line: string) => {
    if (!parsed.quiet) process.stderr.write(line);
  };

  const files = await trainingFiles(parsed.positionals, parsed.list, match);
  const where = [...parsed.positionals, ...(parsed.list ? [`the files listed in ${parsed.list}`] : [])].join(', ');
  if (files.length === 0) throw new InputError(`no ${KNOWN_EXTENSIONS} files in ${where}${match ? ` whose name matches ${match}` : ''}`);
  const examples: TrainingExample[] = [];
  const skipped: Record<string, number> = {};
  const maxChars = (parsed.options.maxChars as number | undefined) ?? SUMMARY_OPTIONS.maxChars.default;
  const refused: string[] = [];
  for (const [index, file] of files.entries()) {
    if ((index + 1) % 50 === 0 || index + 1 === files.length) say(`\rreading ${index + 1}/${files.length} files`);
    const format = formatForFileName(file.path)!.id;
    const text = await readTrainingFile(file.path, maxChars);
    if (typeof text !== 'string') {
      refused.push(`tersely train: ${file.path}: ${text.refused}`);
      skipped[UNREADABLE] = (skipped[UNREADABLE] ?? 0) + 1;
      continue;
    }
    const example = exampleFromDocument(text, { referenceHeading: heading, introductionFallback: introduction, format, language });
    if ('skipped' in example) skipped[example.skipped] = (skipped[example.skipped] ?? 0) + 1;
    else examples.push(example);
  }
  say('\n');
  for (const line of refused) warn(line);
  if (examples.length === 0) {
    throw new InputError(`none of the ${files.length} files has ${heading !== null ? `a "${heading}" section` : 'an introduction'} with prose in it`);
  }

  const trainedOn = {
    command: ['tersely', 'train', ...args].map(shellWord).join(' '),
    kind,
    referenceHeading: heading,
    ...(introduction ? { reference: heading === null ? 'the introduction' : 'the introduction when there is no such section' } : {}),
    data: {
      filesPerFolder: filesPerFolder(files, process.cwd()),
      ...(parsed.list ? { fileList: parsed.list, fileListFingerprint: `fnv1a:${fingerprint(await readFile(parsed.list, 'utf8'))}` } : {}),
    },
    files: files.length,
    skipped,
  };
  let model: SentenceModel;
  try {
    model = kind === 'naive-bayes' ? trainModel(examples, { trainedOn }) : trainMaxentModel(examples, {
            trainedOn,
            ...(parsed.regularization !== undefined ? { regularization: parsed.regularization } : {}),
            ...(parsed.labels !== undefined ? { labels: parsed.labels } : {}),
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
  const counts = model.kind === 'naive-bayes' ? model.classes : (model.trainedOn?.sentences as { positive: number; negative: number });
  say(`trained a ${kind} model on ${examples.length} documents (${counts.positive} summary-like sentences, ${counts.negative} others)`);
  say(skippedText ? `; skipped ${skippedText}\n` : '\n');
  say(strongestValues(model).join('\n') + '\n');
  say(`${templateText.length} template ${templateText.length === 1 ? 'sentence' : 'sentences'} found recurring across the documents (never picked)\n`);
  say(`model written to ${out}\n`);
  return 0;
}
