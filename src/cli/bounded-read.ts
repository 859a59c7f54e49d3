/**
 * Reads a regular file, or standard input, with a byte limit checked while reading: a device
 * (/dev/zero), a named pipe that nobody writes to or a file of gigabytes gets a one-line refusal
 * instead of a hang or a full memory.
 */
import { constants, type Stats } from 'node:fs';
import { open, stat } from 'node:fs/promises';

export class InputError extends Error {}

const CHUNK_BYTES = 64 * 1024;

/** What a path is when it is not a regular file, in people's words; null for a regular file. */
function notAFile(info: Stats): string | null {
  if (info.isFile()) return null;
  if (info.isDirectory()) return 'is a folder, not a file';
  if (info.isFIFO()) return 'is a named pipe (FIFO), not a regular file; to read it, redirect it: tersely summarize - < FILE';
  if (info.isCharacterDevice() || info.isBlockDevice()) return 'is a device, not a regular file';
  if (info.isSocket()) return 'is a socket, not a regular file';
  return 'is not a regular file';
}

/** Says how large the input is in words `tooLarge` gives (the limit it broke, how to raise it). */
export type TooLarge = (bytes: number, complete: boolean) => string;

/**
 * The bytes of the regular file at `path`, or of standard input for "-". More than `byteLimit`
 * bytes is refused with `tooLarge` before they are all read. Throws InputError.
 */
export async function readBytes(path: string, byteLimit: number, tooLarge: TooLarge): Promise<Buffer> {
  if (path === '-') return readStdin(byteLimit, tooLarge);
  let info: Stats;
  try {
    info = await stat(path);
  } catch {
    throw new InputError('cannot read the file (it does not exist or is not accessible)');
  }
  const kind = notAFile(info);
  if (kind !== null) throw new InputError(kind);
  if (info.size > byteLimit) throw new InputError(tooLarge(info.size, true));
  let handle;
  try {
    // Non-blocking, so a path swapped for a named pipe after the check cannot make open() wait.
    handle = await open(path, constants.O_RDONLY | constants.O_NONBLOCK);
  } catch (error) {
    throw new InputError(`cannot read the file (${(error as NodeJS.ErrnoException).code ?? 'open error'})`);
  }
  try {
    const opened = notAFile(await handle.stat());
    if (opened !== null) throw new InputError(opened);
    const chunks: Buffer[] = [];
    let total = 0;
    for (;;) {
      const chunk = Buffer.allocUnsafe(CHUNK_BYTES);
      const { bytesRead } = await handle.read(chunk, 0, CHUNK_BYTES, null);
      if (bytesRead === 0) break;
      total += bytesRead;
      // The file grew since it was measured.
      if (total > byteLimit) throw new InputError(tooLarge(total, false));
      chunks.push(chunk.subarray(0, bytesRead));
    }
    return Buffer.concat(chunks, total);
  } catch (error) {
    if (error instanceof InputError) throw error;
    throw new InputError(`cannot read the file (${(error as NodeJS.ErrnoException).code ?? 'read error'})`);
  } finally {
    await handle.close();
  }
}

async function readStdin(byteLimit: number, tooLarge: TooLarge): Promise<Buffer> {
  const chunks: Buffer[] = [];
  let total = 0;
  try {
    for await (const chunk of process.stdin) {
      const bytes = chunk as Buffer;
      total += bytes.length;
      if (total > byteLimit) {
        process.stdin.destroy();
        throw new InputError(tooLarge(total, false));
      }
      chunks.push(bytes);
    }
  } catch (error) {
    if (error instanceof InputError) throw error;
    throw new InputError(`cannot read standard input (${(error as NodeJS.ErrnoException).code ?? 'read error'})`);
  }
  return Buffer.concat(chunks, total);
}
