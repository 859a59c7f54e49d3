/**
 * Body elements of a region, in the order the specification tries them: block quote (an indented
 * line), bullet, enumerated, field and option lists, doctest, line block, grid and simple tables,
 * explicit markup, anonymous targets, adornment lines (section titles, transitions) and text
 * (paragraphs, definition lists, underlined titles).
 *
 * Mirrors the reference implementation's state machine construct by construct, so that the
 * blocks found here are the ones docutils finds; nested bodies (list items, quotes, directive
 * content) are parsed again as regions, where section titles are not allowed.
 */
import type { Block, ParseSettings, SkipBlock, TextLines } from './blocks';
import { isListItem, readEnumerator, type Enumerator } from './enumerators';
import { explicitMarkup } from './explicit';
import { ADORNMENT_CHAR, ADORNMENT_LINE, BODY } from './patterns';
import type { Region } from './source-lines';
import { gridTable, simpleTable } from './tables';
import { columnWidth } from './text-width';

/** A paragraph's text ends with an unescaped `::` (an even number of backslashes before it): a literal block follows. */
function endsWithLiteralMarker(data: string): boolean {
  if (!data.endsWith('::')) return false;
  let backslashes = 0;
  while (data[data.length - 3 - backslashes] === '\\') backslashes++;
  return backslashes % 2 === 0;
}
/** The first character of a quoted literal block (any 7-bit punctuation, repeated on each line). */
const QUOTE_CHAR = new RegExp(`^${ADORNMENT_CHAR}`);
/** `--`, `---` or an em dash opening a block quote's attribution. */
const ATTRIBUTION = /^(?:---?(?!-)|\u2014) *(?=[^ \n])/;

export class BodyParser {
  constructor(readonly settings: ParseSettings) {}

  /** The blocks of a region; section titles are recognized only when `matchTitles`. */
  parse(region: Region, matchTitles = false): Block[] {
    const out: Block[] = [];
    let i = 0;
    while (i < region.length) {
      if (region.blank(i)) i++;
      else i = this.element(region, i, out, matchTitles);
    }
    return out;
  }

  /** Reports lines [from, to) of a region as skipped. */
  skip(reason: SkipBlock['reason'], region: Region, from: number, to: number, out: Block[], preamble = reason === 'malformed'): void {
    const span = region.span(from, to);
    if (span !== null) out.push({ kind: 'skip', reason, ...span, ...(preamble ? { preamble } : {}) });
  }

  private element(r: Region, i: number, out: Block[], matchTitles: boolean): number {
    const text = r.text(i);
    if (text.charCodeAt(0) === 32) return this.blockQuote(r, i, out);
    let m: RegExpExecArray | null;
    if ((m = BODY.bullet.exec(text)) !== null) return this.bulletList(r, i, out);
    if ((m = BODY.enumerator.exec(text)) !== null) {
      const enumerator = readEnumerator(m);
      if (isListItem(r, i, enumerator)) return this.enumeratedList(r, i, enumerator, out);
      return this.text(r, i, out, matchTitles);
    }
    if (BODY.fieldMarker.test(text)) return this.fieldList(r, i, out);
    if (BODY.optionMarker.test(text)) return this.optionList(r, i, out) ?? this.text(r, i, out, matchTitles);
    if (BODY.doctest.test(text)) {
      const end = r.textBlockEnd(i, false);
      this.skip('code', r, i, end, out);
      return end;
    }
    if (BODY.lineBlock.test(text)) return this.lineBlock(r, i, out);
    if (BODY.gridTableTop.test(text)) return gridTable(this, r, i, out);
    if (BODY.simpleTableTop.test(text)) return simpleTable(this, r, i, out);
    if (BODY.explicitMarkup.test(text)) return explicitMarkup(this, r, i, out);
    if ((m = BODY.anonymousTarget.exec(text)) !== null) {
      const block = r.indented(i, { firstIndent: m[0].length, untilBlank: true });
      this.skip('definition', r, i, block.next, out, true);
      return block.next;
    }
    if (BODY.line.test(text)) return this.adornmentLine(r, i, out, matchTitles) ?? this.text(r, i, out, matchTitles);
    return this.text(r, i, out, matchTitles);
  }

  private blockQuote(r: Region, i: number, out: Block[]): number {
    const block = r.indented(i);
    let region = block.region;
    while (region.length > 0) {
      const split = splitAttribution(region);
      const quote = split === null ? region : region.slice(0, split.start);
      const span = region.span(0, split === null ? region.length : split.end);
      const skipped: SkipBlock[] = [];
      if (split !== null) {
        const at = region.span(split.start, split.end);
        if (at !== null) skipped.push({ kind: 'skip', reason: 'metadata', ...at });
      }
      if (span !== null) out.push({ kind: 'container', role: 'quote', body: this.parse(quote), skipped, ...span });
      region = split === null ? region.slice(region.length) : region.slice(split.end);
      let top = 0;
      while (top < region.length && region.blank(top)) top++;
      region = region.slice(top);
    }
    return block.next;
  }

  /** One list item: its body is the text after the marker and the lines indented under it. */
  private listItem(r: Region, i: number, markerLength: number): { body: Block[]; next: number } {
    const block =
      r.text(i).length > markerLength ? r.indented(i, { blockIndent: markerLength }) : r.indented(i, { firstIndent: markerLength });
    return { body: this.parse(block.region), next: block.next };
  }

  /** Index of the next non-blank line at or after k. */
  private nextContent(r: Region, k: number): number {
    while (k < r.length && r.blank(k)) k++;
    return k;
  }

  private bulletList(r: Region, i: number, out: Block[]): number {
    const bullet = r.text(i)[0];
    const items: Block[][] = [];
    let k = i;
    let end = i;
    for (;;) {
      const item = this.listItem(r, k, BODY.bullet.exec(r.text(k))![0].length);
      items.push(item.body);
      end = item.next;
      k = this.nextContent(r, end);
      if (k >= r.length || r.text(k)[0] !== bullet || !BODY.bullet.test(r.text(k))) break;
    }
    const span = r.span(i, end);
    if (span !== null) out.push({ kind: 'list', items, ...span });
    return end;
  }

  private enumeratedList(r: Region, i: number, first: Enumerator, out: Block[]): number {
    const sequence = first.sequence === '#' ? 'arabic' : first.sequence;
    let auto = first.sequence === '#';
    let last = first.ordinal!;
    const items: Block[][] = [];
    let k = i;
    let end = i;
    for (;;) {
      const item = this.listItem(r, k, BODY.enumerator.exec(r.text(k))![0].length);
      items.push(item.body);
      end = item.next;
      k = this.nextContent(r, end);
      if (k >= r.length || r.text(k)[0] === ' ' || BODY.bullet.test(r.text(k))) break;
      const m = BODY.enumerator.exec(r.text(k));
      if (m === null) break;
      const next = readEnumerator(m, sequence);
      const sameList =
        next.format === first.format &&
        (next.sequence === '#' || (next.sequence === sequence && !auto && next.ordinal === last + 1)) &&
        isListItem(r, k, next);
      if (!sameList) break;
      if (next.sequence === '#') auto = true;
      last = next.ordinal!;
    }
    const span = r.span(i, end);
    if (span !== null) out.push({ kind: 'list', items, ...span });
    return end;
  }

  /** Field lists (document metadata such as `:Status: Draft`, or options of all kinds) are not prose. */
  private fieldList(r: Region, i: number, out: Block[]): number {
    let k = i;
    let end = i;
    for (;;) {
      const marker = BODY.fieldMarker.exec(r.text(k))!;
      end = r.indented(k, { firstIndent: marker[0].length }).next;
      k = this.nextContent(r, end);
      if (k >= r.length || r.text(k)[0] === ' ' || !BODY.fieldMarker.test(r.text(k))) break;
    }
    this.skip('metadata', r, i, end, out);
    return end;
  }

  /** Command-line option lists; null when the first "option" has no description (then it is text). */
  private optionList(r: Region, i: number, out: Block[]): number | null {
    let k = i;
    let end = i;
    for (;;) {
      const marker = BODY.optionMarker.exec(r.text(k))!;
      const block = r.indented(k, { firstIndent: marker[0].length });
      if (block.region.length === 0) {
        if (k === i) return null;
        break;
      }
      end = block.next;
      k = this.nextContent(r, end);
      if (k >= r.length || r.text(k)[0] === ' ' || BODY.bullet.test(r.text(k)) || !BODY.optionMarker.test(r.text(k))) break;
    }
    this.skip('optionList', r, i, end, out);
    return end;
  }

  private lineBlock(r: Region, i: number, out: Block[]): number {
    let k = i;
    for (;;) {
      const marker = BODY.lineBlock.exec(r.text(k))!;
      k = r.indented(k, { firstIndent: marker[0].length, untilBlank: true }).next;
      if (k >= r.length || r.blank(k) || !BODY.lineBlock.test(r.text(k))) break;
    }
    this.skip('lineBlock', r, i, k, out);
    return k;
  }

  /** A line of one repeated punctuation character: transition, or the overline of a title. */
  private adornmentLine(r: Region, i: number, out: Block[], matchTitles: boolean): number | null {
    const marker = r.text(i);
    const short = marker.length < 4;
    if (!matchTitles) {
      if (marker === '::' || short) return null;
      this.skip('malformed', r, i, i + 1, out);
      return i + 1;
    }
    const j = i + 1;
    if (j >= r.length || r.blank(j)) {
      if (short) return null;
      this.skip('thematicBreak', r, i, j, out);
      return j;
    }
    const second = r.text(j);
    if (second[0] !== ' ' && ADORNMENT_LINE.test(second)) {
      if (short) return null;
      this.skip('malformed', r, i, j + 1, out);
      return j + 1;
    }
    const u = j + 1;
    if (u >= r.length) {
      if (short) return null;
      this.skip('malformed', r, i, j + 1, out);
      return j + 1;
    }
    const underline = r.text(u);
    if (!ADORNMENT_LINE.test(underline) || underline !== marker) {
      if (short) return null;
      this.skip('malformed', r, i, u + 1, out);
      return u + 1;
    }
    if (columnWidth(second) > marker.length && short) return null;
    const indent = r.indentOf(j);
    const text: TextLines = { region: r.shifted(j, j + 1, indent), cut: 0 };
    out.push({ kind: 'title', style: marker[0]! + underline[0]!, text, start: r.startOffset(i), end: r.endOffset(u) });
    return u + 1;
  }

  /** A text line: paragraph, definition list item, or a title with an underline. */
  private text(r: Region, i: number, out: Block[], matchTitles: boolean): number {
    const j = i + 1;
    if (j >= r.length || r.blank(j)) return this.paragraph(r, i, j, out);
    const next = r.text(j);
    if (next[0] === ' ') return this.definitionList(r, i, out);
    if (ADORNMENT_LINE.test(next) && !(columnWidth(r.text(i)) > next.length && next.length < 4)) {
      if (!matchTitles) {
        this.skip('malformed', r, i, j + 1, out);
        return j + 1;
      }
      const text: TextLines = { region: r.slice(i, i + 1), cut: 0 };
      out.push({ kind: 'title', style: next[0]!, text, start: r.startOffset(i), end: r.endOffset(j) });
      return j + 1;
    }
    return this.paragraph(r, i, r.textBlockEnd(j, true), out);
  }

  /** Lines [from, to) as a paragraph; a closing `::` announces a literal block. */
  private paragraph(r: Region, from: number, to: number, out: Block[]): number {
    const lines = r.slice(from, to);
    const data = Array.from({ length: lines.length }, (_, k) => lines.text(k)).join('\n');
    if (!endsWithLiteralMarker(data)) {
      out.push({ kind: 'paragraph', text: { region: lines, cut: 0 }, start: r.startOffset(from), end: r.endOffset(to - 1) });
      return to;
    }
    if (data.length > 2) {
      const cut = data[data.length - 3] === ' ' || data[data.length - 3] === '\n' ? data.length - data.slice(0, -3).trimEnd().length : 1;
      out.push({ kind: 'paragraph', text: { region: lines, cut }, start: r.startOffset(from), end: r.endOffset(to - 1) });
    }
    return this.literalBlock(r, to, out);
  }

  /** The literal block after `::`: indented lines, or unindented lines all starting with one quote character. */
  private literalBlock(r: Region, k: number, out: Block[]): number {
    const block = r.indented(k);
    if (block.region.span(0, block.region.length) !== null) {
      this.skip('code', r, k, block.next, out);
      return block.next;
    }
    const first = this.nextContent(r, k);
    if (first >= r.length || !QUOTE_CHAR.test(r.text(first))) return k;
    const quote = r.text(first)[0]!;
    let end = first;
    while (end < r.length && !r.blank(end) && r.text(end)[0] === quote) end++;
    this.skip('code', r, first, end, out);
    return end;
  }

  private definitionList(r: Region, i: number, out: Block[]): number {
    const items: { term: TextLines; termSpan: { start: number; end: number }; body: Block[] }[] = [];
    let k = i;
    let end = i;
    for (;;) {
      const block = r.indented(k + 1);
      items.push({
        term: { region: r.slice(k, k + 1), cut: 0 },
        termSpan: { start: r.startOffset(k), end: r.endOffset(k) },
        body: this.parse(block.region),
      });
      end = block.next;
      k = this.nextContent(r, end);
      if (k + 1 >= r.length || r.text(k)[0] === ' ' || startsOtherElement(r.text(k))) break;
      const next = r.text(k + 1);
      if (next.length === 0 || next[0] !== ' ') break;
    }
    const span = r.span(i, end);
    if (span !== null) out.push({ kind: 'definitionList', items, ...span });
    return end;
  }
}

/** A line that starts some body element other than plain text. */
function startsOtherElement(text: string): boolean {
  return Object.values(BODY).some((pattern) => pattern.test(text));
}

/** A block quote's attribution: after a blank line, a line opened by a dash, further lines aligned. */
function splitAttribution(region: Region): { start: number; end: number } | null {
  let blank = -2;
  let seen = false;
  for (let i = 0; i < region.length; i++) {
    if (region.blank(i)) {
      blank = i;
      continue;
    }
    if (seen && blank === i - 1 && ATTRIBUTION.test(region.text(i))) {
      let indent = -1;
      let end = i + 1;
      let aligned = true;
      for (; end < region.length && !region.blank(end); end++) {
        const lineIndent = region.indentOf(end);
        if (indent < 0) indent = lineIndent;
        else if (lineIndent !== indent) aligned = false;
      }
      if (aligned) return { start: i, end };
    }
    seen = true;
  }
  return null;
}
