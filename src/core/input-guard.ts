/**
 * Refuses input that cannot be summarized sensibly, with a one-line reason instead of a hang or
 * a page of garbage.
 */

/** Share of NUL or other C0 control characters above which text is treated as binary (common practice, no source). */
const BINARY_CONTROL_SHARE = 0.01;
const SAMPLE = 65_536;

export function inputProblem(text: string, maxChars: number): string | null {
  if (text.length > maxChars) {
    return `The text is ${formatCount(text.length)} characters long, above the ${formatCount(maxChars)}-character limit; summarize a selection or raise the limit.`;
  }
  if (looksBinary(text)) return 'The text looks like binary data (it contains NUL or control characters), so it was not summarized.';
  return null;
}

export function looksBinary(text: string): boolean {
  const sample = text.length > SAMPLE ? text.slice(0, SAMPLE) : text;
  if (sample.includes('\u0000')) return true;
  let control = 0;
  for (let i = 0; i < sample.length; i++) {
    const c = sample.charCodeAt(i);
    if (c < 32 && c !== 9 && c !== 10 && c !== 13 && c !== 12) control++;
  }
  return sample.length > 0 && control / sample.length > BINARY_CONTROL_SHARE;
}

function formatCount(n: number): string {
  return n.toLocaleString('en-US');
}
