/**
 * Reads the team's document templates for --template (or, without it, the conventional
 * pull-request and issue template locations under the current folder). The engine gets their
 * text and never picks a sentence found in one. A template named on the command line that cannot
 * be read is an error; a conventional location that does not exist is simply not there.
 */
import { readdir, stat } from 'node:fs/promises';
import { join, resolve } from 'node:path';
import { formatForFileName, HOST_OPTIONS, TEMPLATE_LIMITS, type TemplateInput } from '../core/index';
import { InputError, readInput } from './read-input';

async function kindOf(path: string): Promise<'file' | 'folder' | null> {
  try {
    const info = await stat(path);
    return info.isDirectory() ? 'folder' : info.isFile() ? 'file' : null;
  } catch {
    return null;
  }
}

/** The files an entry names: the file itself, or a folder's document files (sorted, not recursive). */
async function filesOf(entry: string, base: string, explicit: boolean): Promise<string[]> {
  const path = resolve(base, entry);
  const kind = await kindOf(path);
  if (kind === null) {
    if (explicit) throw new InputError(`template ${entry} does not exist or cannot be read`);
    return [];
  }
  if (kind === 'file') return [path];
  const names = (await readdir(path)).filter((name) => !name.startsWith('.') && formatForFileName(name) !== undefined).sort();
  return names.map((name) => join(path, name));
}

/**
 * Template texts for the engine. `given` is what --template named (undefined: the conventional
 * locations). Paths are relative to `base`.
 */
export async function readTemplates(given: readonly string[] | undefined, base = process.cwd()): Promise<TemplateInput[]> {
  const explicit = given !== undefined;
  const entries = given ?? HOST_OPTIONS.templateFiles.default;
  const templates: TemplateInput[] = [];
  for (const entry of entries) {
    for (const file of await filesOf(entry, base, explicit)) {
      if (templates.length >= TEMPLATE_LIMITS.maxTemplates) throw new InputError(`more than ${TEMPLATE_LIMITS.maxTemplates} templates; name fewer with --template`);
      try {
        const input = await readInput(file, 'markdown', TEMPLATE_LIMITS.maxTemplateChars);
        templates.push({ text: input.text, format: input.format });
      } catch (error) {
        if (error instanceof InputError) throw new InputError(`template ${file}: ${error.message}`);
        throw error;
      }
    }
  }
  return templates;
}
