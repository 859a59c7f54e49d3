/**
 * `tersely digest FILE|DIR...`: one digest of several documents. Files are read (on several
 * threads from a handful of files on, digest-threads.ts) and handed in file order to the engine's
 * digest builder, which keeps only each document's best sentences, so memory stays bounded; a
 * progress line per document goes to standard error (unless --quiet).
 */
import { stat } from 'node:fs/promises';
import { digestReader, SUMMARY_OPTIONS, startDigest, type Digest, type DigestRequest } from '../core/index';
import { jobsFor, readOnThreads, readOne, type ReaderSetup, type ReadOutcome } from './digest-threads';
import { choiceFlag, UsageError } from './args';
import { documentFilesUnder } from './document-files';
import { engineRequest } from './engine-request';
import { parseFlags } from './option-flags';
import { digestToJson, digestToMarkdown, renderDigestText } from './render-digest';
import { styleFor } from './style';
import { forcedFormat } from './summarize-command';
import { neutralizeControls, terminalSafeJson, warn } from './terminal-text';

const OUTPUTS = ['text', 'markdown', 'json'] as const;
/** More files than this in one digest is almost certainly a wrong folder (ours). */
export const MAX_DIGEST_FILES = 20_000;

/**
 * The files named: a file as given, a folder walked in name order for the files a format claims
 * (Markdown, reStructuredText, text), as document-files.ts describes.
 */
export async function expandPaths(paths: readonly string[]): Promise<string[]> {
  const files: string[] = [];
  for (const path of paths) {
    let isFolder = false;
    try {
      isFolder = (await stat(path)).isDirectory();
    } catch {
      // Not there: readInput says so for this path, in the same words as for summarize.
    }
    if (!isFolder) files.push(path);
    else {
      for await (const file of documentFilesUnder(path)) {
        files.push(file);
        if (files.length > MAX_DIGEST_FILES) throw new UsageError(`more than ${MAX_DIGEST_FILES.toLocaleString('en-US')} files to digest; name fewer folders`);
      }
    }
  }
  return files;
}

export async function runDigest(args: string[]): Promise<number> {
  const { options, extra, positionals, notes } = parseFlags('digest', args, {
    format: { type: 'string' },
    'input-format': { type: 'string' },
    'plain-text': { type: 'boolean' },
    quiet: { type: 'boolean' },
    jobs: { type: 'string' },
  });
  if (positionals.length === 0) throw new UsageError('digest needs at least one FILE or folder');
  if (positionals.includes('-')) throw new UsageError('digest reads files and folders, not standard input');
  const output = choiceFlag('format', extra.format as string | undefined, OUTPUTS) ?? 'text';
  const inputFormat = forcedFormat(extra, notes);
  for (const note of notes) warn(`tersely: ${note}`);
  const quiet = extra.quiet === true;
  const maxChars = (options.maxChars as number | undefined) ?? SUMMARY_OPTIONS.maxChars.default;

  const files = await expandPaths(positionals);
  if (files.length === 0) throw new UsageError('no Markdown, reStructuredText or text files found in the folders given');
  const request = (await engineRequest(options)) as DigestRequest;
  const builder = startDigest(request);
  const setup: ReaderSetup = { options, inputFormat, maxChars };
  const jobs = jobsFor(extra.jobs, files.length);
  let failures = 0;
  const onRead = (outcome: ReadOutcome): void => {
    const path = files[outcome.index]!;
    const counter = `[${outcome.index + 1}/${files.length}]`;
    if (!outcome.ok) {
      if (!outcome.input) throw new Error(outcome.message);
      failures++;
      warn(`tersely: ${counter} ${path}: ${outcome.message}`);
      return;
    }
    const progress = builder.addRead(outcome.read);
    if (progress.refused) {
      failures++;
      warn(`tersely: ${counter} ${path}: ${progress.refused}`);
    } else if (!quiet) warn(`tersely: ${counter} ${path}: ${progress.kept} sentence${progress.kept === 1 ? '' : 's'} kept`);
  };
  if (jobs > 1) await readOnThreads(files, setup, jobs, onRead);
  else {
    const read = digestReader(request);
    for (const [k, path] of files.entries()) onRead(await readOne(read, setup, k, path));
  }
  const digest: Digest = builder.finish();
  if (output === 'json') process.stdout.write(terminalSafeJson(digestToJson(digest)) + '\n');
  else if (output === 'markdown') process.stdout.write(neutralizeControls(digestToMarkdown(digest)));
  else process.stdout.write(renderDigestText(digest, styleFor(process.stdout)));
  // The text view shows the notices itself; the others are for files and programs, so say them on stderr.
  if (output !== 'text') for (const notice of digest.notices) warn(`tersely: note: ${notice}`);
  if (digest.sentences.length === 0) {
    warn('tersely: no digest: no sentence could be picked from the documents given.');
    return 1;
  }
  return failures > 0 ? 1 : 0;
}
