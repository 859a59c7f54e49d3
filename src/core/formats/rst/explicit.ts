/**
 * Explicit markup (lines starting with `.. `): footnotes, citations, hyperlink targets,
 * substitution definitions, directives and comments — in the specification's order, each with
 * the indented block that belongs to it.
 */
import type { Block, ContainerBlock, SkipBlock } from './blocks';
import type { BodyParser } from './body-parser';
import { directiveSpec, type DirectiveSpec } from './directives';
import { BODY, EXPLICIT } from './patterns';
import { Region } from './source-lines';
import { csvTable, listTable } from './tables';

/** A hyperlink target's name part, up to its colon (`_name:`, `` _`a name`: ``, `__:`). */
const TARGET_NAME = /^(?:_|(?!_)(`?)(?![ `]).+?(?<![\s\x00])\1)(?<!(?<!\x00):)(?<![\s\x00]) ?:(?: +|$)/;

export function explicitMarkup(parser: BodyParser, r: Region, i: number, out: Block[]): number {
  const text = r.text(i);
  const note = EXPLICIT.footnote.exec(text) ?? EXPLICIT.citation.exec(text);
  if (note !== null) return footnote(parser, r, i, note[0].length, out);
  const target = EXPLICIT.target.exec(text);
  if (target !== null) {
    const block = r.indented(i, { firstIndent: target[0].length, untilBlank: true, stripIndent: false });
    if (isTarget(block.region)) {
      parser.skip('definition', r, i, block.next, out, true);
      return block.next;
    }
  }
  const substitution = EXPLICIT.substitution.exec(text);
  if (substitution !== null) {
    const block = r.indented(i, { firstIndent: substitution[0].length, stripIndent: false });
    parser.skip('definition', r, i, block.next, out, true);
    return block.next;
  }
  const directive = EXPLICIT.directive.exec(text);
  if (directive !== null) return directiveBlock(parser, r, i, directive, out);
  return comment(parser, r, i, out);
}

/** Lines a target's name may run over; a longer block is no target (it keeps the check linear). */
const MAX_TARGET_NAME_LINES = 50;

function isTarget(block: Region): boolean {
  let joined = '';
  for (let k = 0; k < Math.min(block.length, MAX_TARGET_NAME_LINES); k++) {
    joined += block.text(k).replace(/\\./g, (e) => `\x00${e[1]}`);
    if (TARGET_NAME.test(joined)) return true;
  }
  return false;
}

function comment(parser: BodyParser, r: Region, i: number, out: Block[]): number {
  const marker = BODY.explicitMarkup.exec(r.text(i))!;
  const rest = r.text(i).slice(marker[0].length);
  // ".." alone before a blank line is an empty comment: it ends there.
  if (rest.trim().length === 0 && (i + 1 >= r.length || r.blank(i + 1))) {
    parser.skip('comment', r, i, i + 1, out, true);
    return i + 1;
  }
  const block = r.indented(i, { firstIndent: marker[0].length });
  parser.skip('comment', r, i, block.next, out, true);
  return block.next;
}

function footnote(parser: BodyParser, r: Region, i: number, markerLength: number, out: Block[]): number {
  const block = r.indented(i, { firstIndent: markerLength });
  if (!parser.settings.includeFootnotes) {
    parser.skip('definition', r, i, block.next, out);
    return block.next;
  }
  const span = r.span(i, block.next)!;
  const label: SkipBlock = { kind: 'skip', reason: 'definition', start: span.start, end: r.offset(i, markerLength - 1) + 1 };
  out.push({ kind: 'container', role: 'prose', body: parser.parse(block.region), skipped: [label], ...span });
  return block.next;
}

/** A directive's block split into arguments, options and content (the specification's rules). */
export interface DirectiveParts {
  readonly args: Region;
  readonly options: ReadonlyMap<string, string>;
  /** Arguments and options, as lines of the block. */
  readonly head: Region;
  readonly content: Region;
}

export function splitDirective(block: Region, spec: DirectiveSpec): DirectiveParts {
  let lines = Array.from({ length: block.length }, (_, k) => k);
  if (lines.length > 0 && block.blank(lines[0]!)) lines = lines.slice(1);
  while (lines.length > 0 && block.blank(lines[lines.length - 1]!)) lines.pop();
  let args: number[] = [];
  let content = lines;
  let rest: number[] = [];
  if (lines.length > 0 && (spec.args || spec.options)) {
    let k = lines.findIndex((l) => block.blank(l));
    if (k < 0) k = lines.length;
    args = lines.slice(0, k);
    content = lines.slice(k + 1);
    rest = lines.slice(k);
  }
  let optionLines: number[] = [];
  if (spec.options) {
    const first = args.findIndex((l) => BODY.fieldMarker.test(block.text(l)));
    if (first >= 0) {
      optionLines = args.slice(first);
      args = args.slice(0, first);
    }
  }
  if (args.length > 0 && !spec.args) {
    content = [...args, ...rest];
    args = [];
  }
  while (content.length > 0 && block.blank(content[0]!)) content = content.slice(1);
  const options = new Map<string, string>();
  for (const l of optionLines) {
    const option = /^:([^:]+):\s*(.*)$/.exec(block.text(l));
    if (option !== null) options.set(option[1]!.trim().toLowerCase(), option[2]!.trim());
  }
  const pick = (indices: readonly number[]) => new Region(block.src, indices.map((k) => block.lines[k]!));
  return { args: pick(args), options, head: pick([...args, ...optionLines]), content: pick(content) };
}

function directiveBlock(parser: BodyParser, r: Region, i: number, match: RegExpExecArray, out: Block[]): number {
  const name = match[1]!.toLowerCase();
  const spec = directiveSpec(name);
  const block = r.indented(i, { firstIndent: match[0].length, stripTop: false });
  const span = r.span(i, block.next)!;
  if (spec.kind === 'skip') {
    // Unknown directives, raw output and metadata leave nothing before a title in the reference parser's tree.
    const preamble = spec.reason === 'directive' || spec.reason === 'html' || spec.reason === 'metadata';
    out.push({ kind: 'skip', reason: spec.reason!, ...span, ...(preamble ? { preamble } : {}) });
    return block.next;
  }
  const parts = splitDirective(block.region, spec);
  if (spec.kind === 'table') {
    if (!parser.settings.includeTables) out.push({ kind: 'skip', reason: 'table', ...span });
    else if (name === 'list-table') out.push(listTable(parser, parts, span));
    else if (name === 'csv-table') out.push(csvTable(parser, parts, span));
    else out.push(container(parser, 'prose', parts, span, r.startOffset(i), 'table'));
    return block.next;
  }
  const headReason = spec.kind === 'figure' ? 'image' : 'directive';
  out.push(container(parser, spec.kind === 'quote' ? 'quote' : 'prose', parts, span, r.startOffset(i), headReason));
  return block.next;
}

/** The directive's content as a prose container; its marker, arguments and options are reported as skipped. */
function container(
  parser: BodyParser,
  role: ContainerBlock['role'],
  parts: DirectiveParts,
  span: { start: number; end: number },
  markerStart: number,
  headReason: SkipBlock['reason'],
): ContainerBlock {
  const skipped: SkipBlock[] = [];
  const head = parts.head.span(0, parts.head.length);
  if (head !== null) skipped.push({ kind: 'skip', reason: headReason, start: markerStart, end: head.end });
  return { kind: 'container', role, body: parser.parse(parts.content), skipped, ...span };
}
