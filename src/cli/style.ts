/** Terminal styling that switches itself off for pipes and for NO_COLOR (https://no-color.org). */
export interface Style {
  bold(text: string): string;
  dim(text: string): string;
  accent(text: string): string;
  warn(text: string): string;
}

export function styleFor(stream: NodeJS.WriteStream, env: NodeJS.ProcessEnv = process.env): Style {
  const enabled = Boolean(stream.isTTY) && !('NO_COLOR' in env && env.NO_COLOR !== '') && env.TERM !== 'dumb';
  const wrap = (open: number, close: number) => (text: string) => (enabled ? `\u001b[${open}m${text}\u001b[${close}m` : text);
  return { bold: wrap(1, 22), dim: wrap(2, 22), accent: wrap(36, 39), warn: wrap(33, 39) };
}
