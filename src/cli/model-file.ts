/** Loads a trained model file for --model: a regular file under the engine's size cap; the engine validates its contents. */
import { MODEL_LIMITS } from '../core/index';
import { InputError, readBytes } from './bounded-read';
import { decodeUtf8 } from './utf8';

export async function loadModelFile(path: string): Promise<unknown> {
  const limit = MODEL_LIMITS.maxFileBytes;
  let bytes: Buffer;
  try {
    bytes = await readBytes(path, limit, (size, complete) => `is ${complete ? '' : 'more than '}${size.toLocaleString('en-US')} bytes, above the ${limit.toLocaleString('en-US')}-byte limit for a model (a trained model is a few KB)`);
  } catch (error) {
    if (error instanceof InputError) throw new InputError(`model file ${path} ${error.message.replace(/^cannot read the file/, 'cannot be read')}`);
    throw error;
  }
  const { text, invalidBytes } = decodeUtf8(bytes);
  if (invalidBytes > 0) throw new InputError(`model file ${path} is not valid UTF-8 JSON (${invalidBytes} invalid bytes)`);
  try {
    return JSON.parse(text) as unknown;
  } catch {
    throw new InputError(`model file ${path} is not valid JSON`);
  }
}
