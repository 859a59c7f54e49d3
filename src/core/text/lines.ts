/**
 * Offsets ↔ lines, with the editor's rules: `\r\n`, `\n` and a lone `\r` each end a line, and an
 * offset inside a `\r\n` pair or past the end is clamped as the editor does. The CLI's "line N",
 * the abstract check's line references and the extension's positions all come from here, so they
 * agree on every file.
 */

export interface LinePosition {
  /** 0-based line. */
  readonly line: number;
  /** 0-based UTF-16 column within the line. */
  readonly character: number;
}

export class LineIndex {
  private readonly starts: number[] = [0];

  constructor(private readonly text: string) {
    for (let i = 0; i < text.length; i++) {
      const code = text.charCodeAt(i);
      if (code === 13 /* \r */) {
        if (text.charCodeAt(i + 1) === 10) i++;
        this.starts.push(i + 1);
      } else if (code === 10 /* \n */) {
        this.starts.push(i + 1);
      }
    }
  }

  get lineCount(): number {
    return this.starts.length;
  }

  /** 0-based line and column of a UTF-16 offset (the editor's Position). */
  positionAt(offset: number): LinePosition {
    const clamped = Math.max(0, Math.min(this.text.length, Math.floor(offset)));
    let low = 0;
    let high = this.starts.length - 1;
    while (low < high) {
      const mid = (low + high + 1) >> 1;
      if (this.starts[mid]! <= clamped) low = mid;
      else high = mid - 1;
    }
    const lineStart = this.starts[low]!;
    // The character may not sit between \r and \n: that offset belongs to the end of the line.
    const lineEnd = this.lineContentEnd(low);
    return { line: low, character: Math.min(clamped, lineEnd) - lineStart };
  }

  /** 1-based line number of an offset, as people count lines. */
  lineNumber(offset: number): number {
    return this.positionAt(offset).line + 1;
  }

  offsetAt(position: LinePosition): number {
    if (position.line < 0) return 0;
    if (position.line >= this.starts.length) return this.text.length;
    const start = this.starts[position.line]!;
    return Math.min(start + Math.max(0, position.character), this.lineContentEnd(position.line));
  }

  private lineContentEnd(line: number): number {
    const next = line + 1 < this.starts.length ? this.starts[line + 1]! : this.text.length;
    let end = next;
    if (end > this.starts[line]! && line + 1 < this.starts.length) {
      end--; // the \n or lone \r
      if (this.text.charCodeAt(end) === 10 && end > this.starts[line]! && this.text.charCodeAt(end - 1) === 13) end--;
    }
    return end;
  }
}
