/**
 * Editor timings measured by the integration run, written to test-artifacts/editor-timings.json
 * (one section per run: the Node host's UI script, the web worker host's script). Figures to
 * read and report, never assertions: the machine is shared and noisy.
 */
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';

export const TARGETS = { activationMs: 30, firstSummaryMs: 1000, laterSummaryMs: 150 } as const;

export function recordTimings(artifacts: string, section: string, figures: Record<string, unknown>): void {
  const file = join(artifacts, 'editor-timings.json');
  const all = existsSync(file) ? (JSON.parse(readFileSync(file, 'utf8')) as Record<string, unknown>) : {};
  all['targets (issue 12)'] = TARGETS;
  all[section] = { ...figures, recordedAt: new Date().toISOString() };
  writeFileSync(file, `${JSON.stringify(all, null, 2)}\n`);
}

/** What the extension wrote to its output channel: activation time and each summary's engine time. */
/** The output view wraps long entries over several lines; each entry starts with its timestamp. */
export function joinWrappedEntries(text: string): string {
  return text
    .split('\n')
    .reduce<string[]>((entries, line) => {
      if (/^\d{4}-\d\d-\d\d \d\d:\d\d:\d\d\.\d{3} /.test(line) || entries.length === 0) entries.push(line);
      else entries[entries.length - 1] += ` ${line}`;
      return entries;
    }, [])
    .map((entry) => entry.replace(/\s+/g, ' ').trim())
    .join('\n');
}

export interface TerselyLog {
  readonly activationMs: number | null;
  /** When activation was logged (epoch ms, from the entry's local timestamp). */
  readonly activatedAt: number | null;
  readonly runtime: string | null;
  readonly summaries: { engineMs: number; totalMs: number; waitedMs: number | null; at: number }[];
}

export function parseTerselyLog(raw: string): TerselyLog {
  const text = joinWrappedEntries(raw);
  const activated = /^(\d{4}-\d\d-\d\d \d\d:\d\d:\d\d\.\d{3}) \[info\] Activated in ([\d.]+) ms, in (.+?)\.\s*$/m.exec(text);
  const summaries = [...text.matchAll(/^(\d{4}-\d\d-\d\d \d\d:\d\d:\d\d\.\d{3}) \[info\] Summarized .* in (\d+) ms in the engine, (\d+) ms in all(?:; the engine host began after (\d+) ms)?(?:; [^.\n]*)*\./gm)].map((m) => ({
    at: Date.parse(m[1]!.replace(' ', 'T')),
    engineMs: Number(m[2]),
    totalMs: Number(m[3]),
    waitedMs: m[4] === undefined ? null : Number(m[4]),
  }));
  return {
    activationMs: activated ? Number(activated[2]) : null,
    activatedAt: activated ? Date.parse(activated[1]!.replace(' ', 'T')) : null,
    runtime: activated ? activated[3]! : null,
    summaries,
  };
}

/**
 * Where the first summary's time went, in ms after the palette's Enter: activation logged, the
 * engine's reply logged, the panel's shell shown, the panel filled. Log times are the extension
 * host's clock (same machine, millisecond entries).
 */
export function firstSummaryBreakdown(log: TerselyLog, entered: number, panelShownAt: number, panelFilledAt: number): Record<string, number | null> {
  const first = log.summaries[0];
  return {
    activationLoggedAfterMs: log.activatedAt === null ? null : log.activatedAt - entered,
    engineReplyLoggedAfterMs: first ? first.at - entered : null,
    engineRequestMs: first?.totalMs ?? null,
    engineHostWaitMs: first?.waitedMs ?? null,
    engineMs: first?.engineMs ?? null,
    panelShellShownAfterMs: panelShownAt - entered,
    panelFilledAfterMs: panelFilledAt - entered,
  };
}
