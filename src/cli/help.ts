/** `tersely --help`: the schema options of each command (option-flags.ts) and its own flags. */
import { FORMATS, METHODS } from '../core/index';
import { helpLine, optionHelp } from './option-flags';
import { THREADS_FROM_FILES } from './digest-threads';
import { JSON_OFFSETS } from './render-summary';

const inputFormats = FORMATS.map((f) => f.id).join(', ');

/** Text wrapped to 100 columns, indented by two. */
function paragraph(text: string): string[] {
  const lines: string[] = [];
  let line = '';
  for (const word of text.split(/\s+/)) {
    if (line && 2 + line.length + 1 + word.length > 100) {
      lines.push(`  ${line}`);
      line = word;
    } else line = line ? `${line} ${word}` : word;
  }
  if (line) lines.push(`  ${line}`);
  return lines;
}

export function helpText(): string {
  return [
    'tersely — short, faithful, extractive summaries of Markdown, reStructuredText and plain text',
    '',
    'Usage',
    '  tersely summarize FILE... [options]   summarize files ("-" reads standard input)',
    '  tersely check FILE [options]          check a hand-written abstract against its document',
    '  tersely train DIR [options]           learn sentence weights from documents with their own summaries',
    '  tersely digest FILE|DIR... [options]  one digest of several documents, grouped by document',
    '  tersely --version                     print the version',
    '',
    'summarize options',
    ...optionHelp('summarize'),
    helpLine('--input-format FORMAT', `read every input as ${inputFormats} (default: by file extension; standard input is markdown)`),
    helpLine('--format FORMAT', 'output: text (default), markdown, or json (one object per file, one per line)'),
    helpLine('--sentences N, --words N, --ratio R', 'deprecated spellings of --length Ns, Nw and (100·R)%'),
    '',
    '  Methods (--method):',
    ...METHODS.map((m) => helpLine(`    ${m.name}`, `${m.label}. ${m.detail} (${m.citation})`)),
    '',
    'check options',
    helpLine('--abstract-heading TEXT', 'the section holding the abstract (default: Summary, Abstract or TL;DR)'),
    helpLine('--abstract-opening', 'the text before the first section heading is the abstract (an introduction, as in many specifications)'),
    helpLine('--abstract FILE', 'read the abstract from a separate file instead'),
    ...optionHelp('check'),
    helpLine('--input-format FORMAT', `read the document as ${inputFormats}`),
    helpLine('--format FORMAT', 'output: text (default) or json'),
    helpLine('--strict', 'exit 1 when a section is not covered or an abstract sentence is unsupported or contradicted (2 on usage errors)'),
    '',
    'digest options',
    ...optionHelp('digest'),
    helpLine('--input-format FORMAT', `read every input as ${inputFormats} (default: by file extension)`),
    helpLine('--format FORMAT', 'output: text (default), markdown, or json (one object, a file per sentence)'),
    helpLine('--quiet', 'no progress lines on standard error'),
    helpLine('--jobs N', `read the files on N threads (default: one per core, at most 4, from ${THREADS_FROM_FILES} files on); the digest is the same`),
    ...paragraph(
      'Folders are read recursively for Markdown, reStructuredText and text files (hidden entries and node_modules skipped). ' +
        'Without --length the digest has 2 sentences per document, at most 40; a percentage is of all the documents\u2019 words. ' +
        'A sentence that other documents repeat appears once, with "also in: FILE line N".',
    ),
    '',
    'train options',
    helpLine('--reference-heading TEXT', 'heading of the section holding each document’s own summary (required)'),
    helpLine('--out FILE', 'where to write the model (required)'),
    helpLine('--match REGEX', "only files whose path below DIR matches (e.g. '^\\d*[02468]-')"),
    ...optionHelp('train'),
    helpLine('--quiet', 'no progress lines'),
    '',
    'Input',
    ...paragraph(
      'Regular files and standard input ("-") only: folders, devices and named pipes are refused. --max-size counts characters ' +
        '(UTF-16 code units); a file of more than 3 bytes per allowed character is refused before it is read, any other file ' +
        'once decoded. Bytes that are not valid UTF-8 read as U+FFFD (�), with a note. ' +
        `JSON offsets (start, end) are ${JSON_OFFSETS}; each object says so ("offsets", "byteOrderMark").`,
    ),
    '',
    'Exit status',
    '  0  every file was summarized',
    '  1  a file could not be read, or gave no summary (the reason is on standard error)',
    '  2  a usage or option error (including a model file that does not validate)',
    '',
    'A summary quotes sentences from the document; it can drop context that a sentence relied on.',
    'Colour is used on terminals unless NO_COLOR is set.',
    '',
  ].join('\n');
}
