/**
 * Text from documents and file names made safe for a terminal: control characters are shown, not
 * obeyed, so a document cannot set the window title, clear the screen or move the cursor
 * (ANSI/ECMA-48 CSI and OSC sequences start with ESC or the C1 control CSI).
 */

/** C0 controls other than tab and line feed, DEL, and the C1 controls U+0080-U+009F. */
const CONTROL = /[\u0000-\u0008\u000b-\u001f\u007f-\u009f]/g;

/** C0 controls and DEL become their Unicode control pictures (ESC → ␛), C1 controls U+FFFD. */
export function neutralizeControls(text: string): string {
  return text.replace(CONTROL, (ch) => {
    const code = ch.charCodeAt(0);
    if (code < 0x20) return String.fromCharCode(0x2400 + code);
    return code === 0x7f ? '\u2421' : '\ufffd';
  });
}

/**
 * JSON text with C1 controls escaped as well: JSON.stringify escapes only C0, and a terminal may
 * read U+009B as the start of a control sequence. The value parsed back is the same.
 */
export function terminalSafeJson(value: unknown): string {
  return JSON.stringify(value).replace(/[\u007f-\u009f]/g, (ch) => `\\u${ch.charCodeAt(0).toString(16).padStart(4, '0')}`);
}

/** One line to standard error, neutralized. */
export function warn(line: string): void {
  process.stderr.write(`${neutralizeControls(line)}\n`);
}

/** "1 sentence", "2 sentences", "1,024 words": a count with its noun, for messages. */
export const plural = (n: number, one: string, many = `${one}s`): string => `${n.toLocaleString('en-US')} ${n === 1 ? one : many}`;
