import { readdirSync, readFileSync } from 'node:fs';
import { summarize } from '../src/core/index';
const dir = '/work/shared/corpus/rust-rfcs/docs';
const files = readdirSync(dir).filter((f) => f.endsWith('.md')).sort();
let text = ''; for (let i = 0; text.length < 20 * 1024; i++) text += readFileSync(`${dir}/${files[i]}`, 'utf8') + '\n\n';
text = text.slice(0, 20 * 1024);
const size = Number(process.argv[2] ?? 0);
if (size) { text = ''; for (let i = 0; text.length < size; i = (i + 1) % files.length) text += readFileSync(`${dir}/${files[i]}`, 'utf8') + '\n\n'; text = text.slice(0, size); }
for (let i = 0; i < 10; i++) summarize(text, { format: 'markdown' });
const t = performance.now(); const n = size ? 3 : 60;
for (let i = 0; i < n; i++) summarize(text, { format: 'markdown' });
console.log(((performance.now() - t) / n).toFixed(1), 'ms per run', text.length);
