/**
 * Reads a file (or standard input for "-") as text, refusing what is not text with a one-line reason.
 *
 * Size: the limit is the option schema's `maxChars` (--max-size), in UTF-16 code units as the
 * engine counts them. Before decoding, a file of more than 3 × maxChars + 3 bytes is refused
 * unread: a UTF-8 sequence of n bytes decodes to at least n/3 code units (3 bytes → 1 unit,
 * 4 bytes → 2; an invalid byte → 1), and a byte-order mark adds 3 bytes and no unit, so such a
 * file is certainly over the limit. Below that, the engine's exact character check decides.
 */
import { formatForFileName, GENERIC_FORMAT, SUMMARY_OPTIONS, type DocumentFormat } from '../core/index';
import { InputError, readBytes } from './bounded-read';
import { decodeUtf8 } from './utf8';

export { InputError };

export interface InputText {
  readonly name: string;
  readonly text: string;
  readonly format: DocumentFormat;
  /** The input began with a byte-order mark, which is not part of `text` (offsets count from after it). */
  readonly byteOrderMark: boolean;
  /** What reading changed or noticed (invalid UTF-8), for people. */
  readonly notices: readonly string[];
}

/** Most UTF-8 bytes that decode to one UTF-16 code unit, and the bytes of a byte-order mark. */
const MAX_BYTES_PER_UNIT = 3;
const BOM_BYTES = 3;

/** The largest character limit the schema allows: the default for callers that pass none. */
export const LARGEST_MAX_CHARS = SUMMARY_OPTIONS.maxChars.kind.json.maximum ?? SUMMARY_OPTIONS.maxChars.default;

export function byteLimitFor(maxChars: number): number {
  return MAX_BYTES_PER_UNIT * maxChars + BOM_BYTES;
}

const count = (n: number) => n.toLocaleString('en-US');

/** A file's format by its extension; a file no format claims is read as plain text. */
export function formatForPath(path: string): DocumentFormat {
  return formatForFileName(path)?.id ?? GENERIC_FORMAT;
}

export async function readInput(path: string, stdinFormat: DocumentFormat = 'markdown', maxChars: number = LARGEST_MAX_CHARS): Promise<InputText> {
  const tooLarge = (bytes: number, complete: boolean) =>
    `is larger than the ${count(maxChars)}-character limit (${complete ? '' : 'more than '}${count(bytes)} bytes); raise it with --max-size (at most ${count(LARGEST_MAX_CHARS)})`;
  const bytes = await readBytes(path, byteLimitFor(maxChars), tooLarge);
  if (bytes.subarray(0, 8192).includes(0)) throw new InputError('looks like a binary file (it contains NUL bytes), not text');
  const decoded = decodeUtf8(bytes);
  if (decoded.text.trim().length === 0) throw new InputError('is empty (no text to summarize)');
  const notices: string[] = [];
  if (decoded.invalidBytes > 0) {
    notices.push(`${count(decoded.invalidBytes)} byte${decoded.invalidBytes === 1 ? ' is' : 's are'} not valid UTF-8 and read as U+FFFD (�); the file itself is unchanged.`);
  }
  return {
    name: path === '-' ? '<stdin>' : path,
    text: decoded.text,
    format: path === '-' ? stdinFormat : formatForPath(path),
    byteOrderMark: decoded.byteOrderMark,
    notices,
  };
}
