/**
 * Writes the list of training documents for `tersely train --files`: the usable documents of the
 * train half of both collections (the same split and skip rules as the quality benchmark), one
 * path a line, relative to the list's folder. The shipped maximum-entropy model is trained from it.
 *
 *   node dist/bench.cjs training-list [--out bench/training-files.txt]
 */
import { writeFile } from 'node:fs/promises';
import { dirname, join, relative, resolve } from 'node:path';
import { COLLECTIONS } from './collections';

export const TRAINING_LIST = 'bench/training-files.txt';

export async function run(argv: readonly string[]): Promise<number> {
  const at = argv.indexOf('--out');
  const out = at >= 0 && argv[at + 1] ? argv[at + 1]! : TRAINING_LIST;
  const lines = [
    '# Training documents: the train halves of the benchmark collections (bench/collections.ts), usable documents only.',
    '# Written by `node dist/bench.cjs training-list`; paths are relative to this file. The corpora are read in place.',
  ];
  for (const collection of Object.values(COLLECTIONS)) {
    const directory = collection.directory(argv);
    const corpus = await collection.load(directory, 'train');
    const files = corpus.documents.filter((d) => d.half === 'train').map((d) => d.file);
    lines.push(`# ${collection.id}: ${files.length} documents`);
    for (const file of files) lines.push(relative(dirname(resolve(out)), join(directory, file)));
  }
  await writeFile(out, lines.join('\n') + '\n');
  console.log(`written ${out}`);
  return 0;
}
