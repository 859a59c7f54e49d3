/**
 * Benchmark entry point (bundled to dist/bench.cjs):
 *   node dist/bench.cjs quality [options]   ROUGE against authors' summaries (bench/quality.ts)
 *   node dist/bench.cjs speed [options]     throughput and memory (bench/speed.ts)
 *   node dist/bench.cjs tune [options]      weight search on the train half (bench/tune.ts)
 *   node dist/bench.cjs tune-repair         repair strategies on the train half (bench/tune-repair.ts)
 *   node dist/bench.cjs check [options]     the abstract check on perturbed author abstracts (bench/check.ts)
 *   node dist/bench.cjs focus [options]     focused vs unfocused summaries (bench/focus.ts)
 *   node dist/bench.cjs digest [options]    multi-document digests: quality and speed (bench/digest.ts)
 *   node dist/bench.cjs training-list       the train halves' documents for `tersely train --files` (bench/training-list.ts)
 *   node dist/bench.cjs audit [--limit N]   what the default summaries pick, counted by rule (bench/audit.ts)
 *   node dist/bench.cjs select-speed        lazy MMR against the full-scan selector (bench/select-speed.ts)
 *   node dist/bench.cjs churn [options]     picks kept after a one-paragraph edit, with and without hysteresis (bench/churn.ts)
 */
async function main(): Promise<number> {
  const mode = process.argv[2];
  if (mode === 'quality') return (await import('./quality')).run(process.argv.slice(3));
  if (mode === 'tune') return (await import('./tune')).run(process.argv.slice(3));
  if (mode === 'tune-repair') return (await import('./tune-repair')).run(process.argv.slice(3));
  if (mode === 'check') return (await import('./check')).run(process.argv.slice(3));
  if (mode === 'training-list') return (await import('./training-list')).run(process.argv.slice(3));
  if (mode === 'speed') return (await import('./speed')).run(process.argv.slice(3));
  if (mode === 'focus') return (await import('./focus')).run(process.argv.slice(3));
  if (mode === 'digest') return (await import('./digest')).run(process.argv.slice(3));
  if (mode === 'audit') return (await import('./audit')).run(process.argv.slice(3));
  if (mode === 'select-speed') return (await import('./select-speed')).run(process.argv.slice(3));
  if (mode === 'churn') return (await import('./churn')).run(process.argv.slice(3));
  console.error('usage: node dist/bench.cjs quality|speed|tune|tune-repair|check|training-list|focus|digest|audit|churn|select-speed [options]');
  return 2;
}

main().then(
  (code) => {
    process.exitCode = code;
  },
  (error: unknown) => {
    console.error(error instanceof Error ? (error.stack ?? error.message) : String(error));
    process.exitCode = 1;
  },
);
