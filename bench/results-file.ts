/**
 * bench/RESULTS.md holds the figures of both benchmarks; each one rewrites only its own block,
 * marked by HTML comments, so running one never erases the other's figures.
 */
import { existsSync, readFileSync, writeFileSync } from 'node:fs';

export const RESULTS_FILE = 'bench/RESULTS.md';

export function writeResultsBlock(path: string, name: 'quality' | 'quality-nova' | 'speed' | 'check' | 'focus' | 'digest' | 'audit' | 'churn' | 'select-speed', content: string): void {
  const start = `<!-- ${name}:start -->`;
  const end = `<!-- ${name}:end -->`;
  const block = `${start}\n${content.trim()}\n${end}`;
  const current = existsSync(path) ? readFileSync(path, 'utf8') : '';
  const from = current.indexOf(start);
  const to = current.indexOf(end);
  let next: string;
  if (from >= 0 && to > from) next = current.slice(0, from) + block + current.slice(to + end.length);
  else if (name === 'quality') next = block + '\n\n' + current.trim();
  else if (name === 'quality-nova' && current.includes('<!-- quality:end -->')) {
    // Right after the Markdown corpus's block, so the two quality tables stay together.
    const at = current.indexOf('<!-- quality:end -->') + '<!-- quality:end -->'.length;
    next = current.slice(0, at) + '\n\n' + block + current.slice(at);
  }
  else next = current.trim() + '\n\n' + block;
  writeFileSync(path, next.trim() + '\n');
}
