/**
 * The input formats Tersely reads, described as data: file extensions and the editor's language ids.
 * The CLI, the extension's activation and menus, `train` and the benchmarks ask here; registry.ts
 * binds each format to its reader. Adding a format is one entry here, one in registry.ts, and its reader.
 */
import type { DocumentFormat } from '../types';

export interface FormatInfo {
  readonly id: DocumentFormat;
  /** For people: "Markdown". */
  readonly label: string;
  /** File name endings, lower case with the dot. */
  readonly extensions: readonly string[];
  /** The editor's language ids for documents in this format. */
  readonly languageIds: readonly string[];
}

export const FORMATS: readonly FormatInfo[] = [
  { id: 'markdown', label: 'Markdown', extensions: ['.md', '.markdown', '.mdown', '.mkd', '.mkdn', '.mdx'], languageIds: ['markdown', 'mdx'] },
  { id: 'restructuredtext', label: 'reStructuredText', extensions: ['.rst', '.rest'], languageIds: ['restructuredtext'] },
  { id: 'plaintext', label: 'plain text', extensions: ['.txt', '.text'], languageIds: ['plaintext'] },
];

/** Text with no known format (an unknown extension, an editor language we do not read) is plain text. */
export const GENERIC_FORMAT: DocumentFormat = 'plaintext';

export const FORMAT_IDS: readonly DocumentFormat[] = FORMATS.map((f) => f.id);

export function formatInfo(id: DocumentFormat): FormatInfo {
  const format = FORMATS.find((f) => f.id === id);
  if (!format) throw new Error(`unknown document format "${id}"`);
  return format;
}

/** The format a file name's extension names, or undefined for an extension no format claims. */
export function formatForFileName(name: string): FormatInfo | undefined {
  const lower = name.toLowerCase();
  return FORMATS.find((f) => f.extensions.some((extension) => lower.endsWith(extension)));
}

/** The format for an editor language id, or undefined when no format claims it. */
export function formatForLanguageId(languageId: string): FormatInfo | undefined {
  return FORMATS.find((f) => f.languageIds.includes(languageId));
}

/**
 * The format of an open editor document: its language id decides; a document the editor calls
 * plain text but whose name has a known extension (a .md file with no Markdown support installed)
 * goes by the extension.
 */
export function formatForEditorDocument(languageId: string, fileName: string): DocumentFormat {
  const byLanguage = formatForLanguageId(languageId);
  if (byLanguage && byLanguage.id !== GENERIC_FORMAT) return byLanguage.id;
  return formatForFileName(fileName)?.id ?? byLanguage?.id ?? GENERIC_FORMAT;
}
