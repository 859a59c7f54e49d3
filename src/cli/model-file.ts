/** Loads a trained model file for --model; the engine validates its contents. */
import { readFile } from 'node:fs/promises';
import { InputError } from './read-input';

export async function loadModelFile(path: string): Promise<unknown> {
  let raw: string;
  try {
    raw = await readFile(path, 'utf8');
  } catch {
    throw new InputError(`model file ${path} cannot be read`);
  }
  try {
    return JSON.parse(raw) as unknown;
  } catch {
    throw new InputError(`model file ${path} is not valid JSON`);
  }
}
