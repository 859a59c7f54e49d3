import fc from 'fast-check';
import { summarize } from '../../../src/core/summarize';
import { anyDocument, requestOptions, deepFreeze } from './arbitraries';
import { summaryFailures } from './summary-properties';
const N = Number(process.argv[2] ?? 2000);
const cases = fc.sample(fc.tuple(anyDocument, requestOptions), { numRuns: N, seed: Number(process.argv[3] ?? 5) });
const kinds = new Map<string, { n: number; ex: any; msg: string }>();
for (const [doc, options] of cases) {
  const req = deepFreeze({ ...options, format: doc.format });
  let fails: string[];
  try { fails = summaryFailures(summarize(doc.text, req), doc.text, req); } catch (e) { fails = ['THROW ' + String((e as Error).stack).slice(0, 300)]; }
  for (const f of fails) {
    const kind = f.replace(/sentence \d+ ".*?":/, 'sentence:').replace(/\d+/g, '#').slice(0, 60);
    const cur = kinds.get(kind);
    if (!cur) kinds.set(kind, { n: 1, ex: [doc, options], msg: f });
    else { cur.n++; if (doc.text.length < cur.ex[0].text.length) { cur.ex = [doc, options]; cur.msg = f; } }
  }
}
for (const [k, v] of kinds) console.log(v.n, k, '\n   ', v.msg.slice(0, 300), '\n   ', JSON.stringify(v.ex[1]), v.ex[0].text.length);
