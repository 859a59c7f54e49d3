/**
 * Selection speed (issue 12, item 3): the lazy MMR selector against the full-scan selector it
 * replaced (test/unit/helpers/eager-select.ts, kept as the reference), on the same inputs in the
 * same run, with the picks compared. Inputs are built exactly as the engine builds them; the new
 * selection rules are left out for the comparison (the old selector does not know them), and the
 * lazy selector with its rules is timed too.
 *
 *   node dist/bench.cjs select-speed [--corpus PATH]
 */
import { prepareDocument, rankPrepared, resolveOptions, tuning, type Budget } from '../src/core/index';
import { selectSentences as eagerSelect } from '../test/unit/helpers/eager-select';
import { corpusDirectory, loadCorpus } from './corpus';
import { RESULTS_FILE, writeResultsBlock } from './results-file';

type Input = ReturnType<typeof tuning.prepareSelection>['input'];

function inputFor(text: string, budget: Budget): Input {
  const preparation = prepareDocument(text, { budget, maxChars: 20_000_000 });
  if (!preparation.ok) throw new Error(preparation.refused.refused);
  const { prepared } = preparation;
  return tuning.prepareSelection(prepared.analyzed, rankPrepared(prepared), resolveOptions({ ...prepared.options })).input;
}

/** The same input without the rules the old selector lacks (and with word-count weights, as it had). */
function legacy(input: Input): Input {
  const { fragment: _f, qualityFloor: _q, qualityRank: _r, fragmentFloor: _ff, paragraphOf: _p, maxRun: _m, textKey: _t, ...rest } = input;
  const weights = new Map<number, number>();
  input.wordCounts.forEach((w, i) => {
    const unit = input.unitOf[i]!;
    if (unit >= 0) weights.set(unit, (weights.get(unit) ?? 0) + w);
  });
  return { ...rest, unitWeights: weights };
}

function timeIt(run: () => void, rounds: number): number {
  const times: number[] = [];
  for (let r = 0; r < rounds; r++) {
    const t0 = performance.now();
    run();
    times.push(performance.now() - t0);
  }
  return times.sort((a, b) => a - b)[Math.floor(times.length / 2)]!;
}

export async function run(argv: readonly string[]): Promise<number> {
  const corpus = await loadCorpus(corpusDirectory(argv), 'test');
  const docs = corpus.documents.filter((d) => d.half === 'test');
  const big = docs.map((d) => d.bodyText).join('\n\n');
  const cases: { name: string; text: string; budget: Budget }[] = [
    { name: '20 KB', text: big.slice(0, 20_000), budget: { unit: 'ratio', value: 0.15 } },
    { name: '200 KB', text: big.slice(0, 200_000), budget: { unit: 'ratio', value: 0.15 } },
    { name: '1 MB', text: big.slice(0, 1_000_000), budget: { unit: 'ratio', value: 0.15 } },
    { name: '1 MB, 3 sentences', text: big.slice(0, 1_000_000), budget: { unit: 'sentences', value: 3 } },
  ];
  // Warm-up: both selectors compiled before anything is timed.
  const warm = legacy(inputFor(big.slice(0, 100_000), { unit: 'ratio', value: 0.15 }));
  for (let r = 0; r < 5; r++) {
    eagerSelect(warm);
    tuning.selectSentences(warm);
  }
  const lines = ['| Input | candidates | picks | full scan ms | lazy ms | speed-up | same picks | lazy with the new rules ms |', '| --- | ---: | ---: | ---: | ---: | ---: | --- | ---: |'];
  for (const c of cases) {
    const input = inputFor(c.text, c.budget);
    const old = legacy(input);
    const rounds = c.name.startsWith('1 MB') ? 3 : 9;
    const eager = eagerSelect(old);
    const lazy = tuning.selectSentences(old);
    const same = JSON.stringify(eager.picked) === JSON.stringify(lazy.picked);
    const eagerMs = timeIt(() => eagerSelect(old), rounds);
    const lazyMs = timeIt(() => tuning.selectSentences(old), rounds);
    const rulesMs = timeIt(() => tuning.selectSentences(input), rounds);
    const candidates = [...input.unitOf].filter((u) => u >= 0).length;
    lines.push(`| ${c.name} | ${candidates} | ${lazy.picked.length} | ${eagerMs.toFixed(1)} | ${lazyMs.toFixed(1)} | ×${(eagerMs / Math.max(lazyMs, 1e-3)).toFixed(1)} | ${same ? 'yes' : '**no**'} | ${rulesMs.toFixed(1)} |`);
    process.stderr.write(`${lines.at(-1)}\n`);
  }
  let identical = 0;
  const sample = docs.slice(0, 100);
  for (const d of sample) {
    const old = legacy(inputFor(d.bodyText, { unit: 'words', value: d.referenceWords }));
    if (JSON.stringify(eagerSelect(old).picked) === JSON.stringify(tuning.selectSentences(old).picked)) identical++;
  }
  const text = [
    '# Selection speed',
    '',
    `Generated ${new Date().toISOString().slice(0, 10)} by \`node dist/bench.cjs select-speed\`; do not edit by hand. Median of 3 (1 MB) or 9 rounds after a warm-up, selection only (ranking excluded), same inputs in the same run.`,
    '',
    ...lines,
    '',
    `Picks identical to the full-scan selector on ${identical} of ${sample.length} test-half documents at the benchmark's word budget (rules the old selector lacks left out).`,
    '',
  ].join('\n');
  console.log(text);
  writeResultsBlock(RESULTS_FILE, 'select-speed', text);
  return 0;
}
