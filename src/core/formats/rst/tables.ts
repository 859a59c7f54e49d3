/**
 * Tables: grid tables, simple tables, `list-table` and `csv-table`. Each is found the way the
 * specification delimits it; it is skipped as a whole unless tables are read, in which case the
 * header rows are left out (labels, not statements) and the body cells are read:
 * - `list-table` and `csv-table` cells are stretches of their own in the source: parsed as body
 *   elements;
 * - grid and simple table cells sit side by side, so a cell over several lines has the text of
 *   its neighbours between its lines. Each line of such a cell is read as a paragraph of its own,
 *   in reading order, so that sentence ranges never overlap (a sentence that wraps inside a cell
 *   is cut at the line end).
 */
import type { Block, Spanned, TableBlock } from './blocks';
import type { BodyParser } from './body-parser';
import type { DirectiveParts } from './explicit';
import { BODY, SIMPLE_TABLE_BORDER } from './patterns';
import { Region, type RegionLine } from './source-lines';

const HEAD_SEPARATOR = /^\+=[=+]+=\+ *$/;

export function gridTable(parser: BodyParser, r: Region, i: number, out: Block[]): number {
  const end = r.textBlockEnd(i, true);
  let bottom = end;
  for (let k = i; k < end; k++) {
    const first = r.text(k)[0];
    if (first !== '+' && first !== '|') {
      bottom = k;
      break;
    }
  }
  if (!BODY.gridTableTop.test(r.text(bottom - 1))) {
    let found = -1;
    for (let k = bottom - 2; k > i + 1 && found < 0; k--) if (BODY.gridTableTop.test(r.text(k))) found = k;
    if (found < 0) {
      parser.skip('malformed', r, i, bottom, out);
      return bottom;
    }
    bottom = found + 1;
  }
  const width = r.text(i).length;
  for (let k = i; k < bottom; k++) {
    const text = r.text(k);
    if (text.length !== width || !'+|'.includes(text[text.length - 1]!)) {
      parser.skip('malformed', r, i, bottom, out);
      return bottom;
    }
  }
  if (!parser.settings.includeTables) parser.skip('table', r, i, bottom, out);
  else out.push(gridCells(r.slice(i, bottom)));
  return bottom;
}

/** Finds the cells of a grid table by following each cell's border clockwise from its top-left corner. */
function gridCells(t: Region): TableBlock {
  const lines = Array.from({ length: t.length }, (_, k) => t.text(k));
  const headSeparator = lines.findIndex((line) => HEAD_SEPARATOR.test(line));
  if (headSeparator >= 0) lines[headSeparator] = lines[headSeparator]!.replace(/=/g, '-');
  const bottom = lines.length - 1;
  const right = lines[0]!.length - 1;
  const at = (row: number, col: number) => lines[row]![col] ?? ' ';
  const done = new Array<number>(right + 1).fill(-1);
  const corners: [number, number][] = [[0, 0]];
  const lineCells: LineCell[] = [];
  while (corners.length > 0) {
    const [top, left] = corners.shift()!;
    if (top === bottom || left === right || top <= done[left]!) continue;
    const cell = scanCell(at, top, left, bottom, right);
    if (cell === null) continue;
    for (let col = left; col < cell.right; col++) done[col] = cell.bottom - 1;
    if (top >= headSeparator) lineCells.push(...cellLines(cellRegion(t, top + 1, cell.bottom, left + 1, cell.right), top + 1, left));
    corners.push([top, cell.right], [cell.bottom, left]);
    corners.sort((a, b) => a[0] - b[0] || a[1] - b[1]);
  }
  const span = t.span(0, t.length)!;
  return { kind: 'table', cells: inReadingOrder(lineCells), header: headSeparator > 0 ? t.span(0, headSeparator + 1) : null, ...span };
}

/** One line of a side-by-side cell, with its place in the table (row of the line, left column of the cell). */
interface LineCell {
  readonly row: number;
  readonly col: number;
  readonly block: Block;
}

function cellLines(cell: Region, firstRow: number, col: number): LineCell[] {
  const out: LineCell[] = [];
  for (let k = 0; k < cell.length; k++) {
    if (cell.blank(k)) continue;
    const line = cell.slice(k, k + 1);
    out.push({ row: firstRow + k, col, block: { kind: 'paragraph', text: { region: line, cut: 0 }, start: line.startOffset(0), end: line.endOffset(0) } });
  }
  return out;
}

function inReadingOrder(cells: LineCell[]): Block[][] {
  return [...cells].sort((a, b) => a.row - b.row || a.col - b.col).map((c) => [c.block]);
}

type CellAt = (row: number, col: number) => string;

function scanCell(at: CellAt, top: number, left: number, bottom: number, right: number): { bottom: number; right: number } | null {
  if (at(top, left) !== '+') return null;
  for (let c = left + 1; c <= right; c++) {
    const ch = at(top, c);
    if (ch === '+') {
      const b = scanDown(at, top, left, c, bottom);
      if (b !== null) return { bottom: b, right: c };
    } else if (ch !== '-') {
      return null;
    }
  }
  return null;
}

function scanDown(at: CellAt, top: number, left: number, right: number, bottom: number): number | null {
  for (let row = top + 1; row <= bottom; row++) {
    const ch = at(row, right);
    if (ch === '+') {
      if (closesCell(at, top, left, row, right)) return row;
    } else if (ch !== '|') {
      return null;
    }
  }
  return null;
}

/** The bottom edge back to the left corner, then the left edge up to the top. */
function closesCell(at: CellAt, top: number, left: number, bottom: number, right: number): boolean {
  for (let c = right - 1; c > left; c--) {
    const ch = at(bottom, c);
    if (ch !== '+' && ch !== '-') return false;
  }
  if (at(bottom, left) !== '+') return false;
  for (let row = bottom - 1; row > top; row--) {
    const ch = at(row, left);
    if (ch !== '+' && ch !== '|') return false;
  }
  return true;
}

/** Rows [from, to) and columns [left, right) of a table region, with their common indentation removed. */
function cellRegion(t: Region, from: number, to: number, left: number, right?: number): Region {
  const lines: RegionLine[] = [];
  for (let k = from; k < to; k++) {
    const l = t.lines[k]!;
    lines.push({ line: l.line, col: l.col + left, ...(right === undefined ? {} : { endCol: l.col + right }) });
  }
  const raw = new Region(t.src, lines);
  let indent = Infinity;
  for (let k = 0; k < raw.length; k++) if (!raw.blank(k)) indent = Math.min(indent, raw.indentOf(k));
  return Number.isFinite(indent) && indent > 0 ? raw.shifted(0, raw.length, indent) : raw;
}

export function simpleTable(parser: BodyParser, r: Region, i: number, out: Block[]): number {
  const topLength = r.text(i).length;
  let found = 0;
  let foundAt = -1;
  let end = -1;
  for (let k = i + 1; k < r.length && end < 0; k++) {
    const text = r.text(k);
    if (!SIMPLE_TABLE_BORDER.test(text)) continue;
    if (text.trim().length !== topLength) {
      parser.skip('malformed', r, i, k + 1, out);
      return k + 1;
    }
    found++;
    foundAt = k;
    if (found === 2 || k === r.length - 1 || r.blank(k + 1)) end = k;
  }
  if (end < 0) {
    const to = found > 0 ? foundAt + 1 : r.length;
    parser.skip('malformed', r, i, to, out);
    return to;
  }
  if (!parser.settings.includeTables) parser.skip('table', r, i, end + 1, out);
  else out.push(simpleCells(r.slice(i, end + 1)));
  return end + 1;
}

/** Columns come from the top border; a line with an empty first column continues the row above. */
function simpleCells(t: Region): TableBlock {
  const columns: number[] = [];
  for (const m of t.text(0).matchAll(/=+/g)) columns.push(m.index!);
  const borders: number[] = [];
  for (let k = 0; k < t.length; k++) if (SIMPLE_TABLE_BORDER.test(t.text(k))) borders.push(k);
  const headSeparator = borders.length >= 3 ? borders[1]! : -1;
  const rows: { header: boolean; from: number; to: number }[] = [];
  for (let k = 1; k < t.length - 1; k++) {
    const text = t.text(k);
    if (borders.includes(k) || (/^[-= ]+$/.test(text) && text.includes('-'))) continue;
    const current = rows[rows.length - 1];
    const firstCell = text.slice(0, columns[1] ?? text.length).trim();
    if (current !== undefined && current.to === k && (text.length === 0 || firstCell.length === 0)) current.to = k + 1;
    else if (text.length > 0) rows.push({ header: k < headSeparator, from: k, to: k + 1 });
  }
  const lineCells: LineCell[] = [];
  for (const row of rows) {
    if (row.header) continue;
    columns.forEach((left, c) => lineCells.push(...cellLines(cellRegion(t, row.from, row.to, left, columns[c + 1]), row.from, left)));
  }
  const span = t.span(0, t.length)!;
  return { kind: 'table', cells: inReadingOrder(lineCells), header: headSeparator > 0 ? t.span(0, headSeparator + 1) : null, ...span };
}

function headerRows(parts: DirectiveParts): number {
  const n = Number.parseInt(parts.options.get('header-rows') ?? '0', 10);
  return Number.isFinite(n) && n > 0 ? n : 0;
}

/** `list-table`: a bullet list of rows, each a bullet list of cells. */
export function listTable(parser: BodyParser, parts: DirectiveParts, span: Spanned): TableBlock {
  const list = parser.parse(parts.content).find((b) => b.kind === 'list');
  const cells: (readonly Block[])[] = [];
  const skipRows = headerRows(parts);
  let header = null as Spanned | null;
  const rows = list?.kind === 'list' ? list.items : [];
  for (const [index, row] of rows.entries()) {
    const inner = row.find((b) => b.kind === 'list');
    if (inner?.kind !== 'list') continue;
    if (index < skipRows) header = { start: header?.start ?? inner.start, end: inner.end };
    else cells.push(...inner.items);
  }
  return { kind: 'table', cells, header, ...span };
}

/** `csv-table`: one row per line, cells separated by commas outside double quotes. */
export function csvTable(parser: BodyParser, parts: DirectiveParts, span: Spanned): TableBlock {
  const content = parts.content;
  const skipRows = headerRows(parts);
  const cells: Block[][] = [];
  let header = null as Spanned | null;
  let row = 0;
  for (let k = 0; k < content.length; k++) {
    if (content.blank(k)) continue;
    if (row++ < skipRows) {
      const line = content.span(k, k + 1)!;
      header = { start: header?.start ?? line.start, end: line.end };
      continue;
    }
    for (const [from, to] of csvFields(content.text(k))) {
      const l = content.lines[k]!;
      cells.push(parser.parse(new Region(content.src, [{ line: l.line, col: l.col + from, endCol: l.col + to }])));
    }
  }
  return { kind: 'table', cells, header, ...span };
}

/** Field ranges of one CSV line, without surrounding blanks and quotes. */
function csvFields(text: string): [number, number][] {
  const fields: [number, number][] = [];
  let start = 0;
  let quoted = false;
  for (let p = 0; p <= text.length; p++) {
    const c = text[p];
    if (c === '"') quoted = !quoted;
    if (p === text.length || (c === ',' && !quoted)) {
      let a = start;
      let b = p;
      while (a < b && text[a] === ' ') a++;
      while (b > a && text[b - 1] === ' ') b--;
      if (b - a >= 2 && text[a] === '"' && text[b - 1] === '"') {
        a++;
        b--;
      }
      fields.push([a, b]);
      start = p + 1;
    }
  }
  return fields;
}
