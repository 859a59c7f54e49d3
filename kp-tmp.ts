import { readFileSync } from 'node:fs';
import { prepareDocument } from './src/core/index';
import { extractKeyPhrases } from './src/core/keyphrases/textrank-keywords';
for (const f of process.argv.slice(2)) {
const text = readFileSync(f, 'utf8');
const p = prepareDocument(text, { format: f.endsWith('.rst') ? 'restructuredtext' : 'markdown', maxChars: 20_000_000 });
const t = Date.now(); const k = p.ok ? extractKeyPhrases(p.prepared.analyzed) : [];
if (p.ok) console.log(f.slice(-40), Date.now()-t, k.map(k => `${k.text}(${k.count},${k.occurrences.length})`).join('; '));
}
