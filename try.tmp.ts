import { parseDocument } from '/work/main/src/core/parse/index';
const src = process.argv[2]!.replace(/\\n/g, '\n');
const d = parseDocument(src, { format: (process.argv[3] ?? 'markdown') as any });
console.log('title', d.title);
for (const s of d.sections) console.log('SEC', s.index, s.depth, JSON.stringify(s.heading), s.parent, s.span);
for (const p of d.paragraphs) console.log('PAR', p.index, p.kind, p.listDepth, p.leadIn, p.section, p.sentences);
for (const s of d.sentences) console.log('SEN', s.index, JSON.stringify(s.text), JSON.stringify(src.slice(s.span.start, s.span.end)));
for (const s of d.skipped) console.log('SKIP', s.reason, JSON.stringify(src.slice(s.span.start, s.span.end)));
