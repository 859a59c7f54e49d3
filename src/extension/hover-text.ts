/** The hover on a highlighted sentence: its rank, score and the features behind the score. Pure. */
import { escapeMarkdown } from '../core/index';
import type { PickedSentence, Summary } from '../core/index';

const MAX_FEATURES = 8;

/** Whether an iterative ranker (LexRank, TextRank) converged, and in how many iterations. */
export interface Convergence {
  readonly converged: boolean;
  readonly iterations?: number;
}

/**
 * The ranking's convergence, when the summary carries it. The engine computes it (RankResult);
 * until `Summary` exposes it this reads the top-level `converged` / `iterations` fields if present.
 */
export function convergenceOf(summary: Summary): Convergence | undefined {
  const { converged, iterations } = summary.ranking ?? {};
  if (typeof converged !== 'boolean') return undefined;
  return typeof iterations === 'number' && Number.isFinite(iterations) ? { converged, iterations } : { converged };
}

function convergenceLine(convergence: Convergence): string {
  const count = convergence.iterations === undefined ? '' : ` ${convergence.iterations} iteration${convergence.iterations === 1 ? '' : 's'}`;
  return convergence.converged
    ? `Ranking converged${count ? ` after${count}` : ''}.`
    : `Ranking did not converge${count ? ` within${count}` : ''}: the scores are approximate.`;
}

function formatNumber(value: number): string {
  if (!Number.isFinite(value)) return String(value);
  return Math.abs(value) >= 100 ? value.toFixed(0) : value.toFixed(3);
}

export function describePick(pick: PickedSentence, sentencesInDocument: number, method: string, convergence?: Convergence): string {
  const lines: string[] = [];
  if (pick.rank > 0) {
    lines.push(`**Tersely** · rank ${pick.rank} of ${sentencesInDocument} · score ${formatNumber(pick.score)} (${escapeMarkdown(method)})`);
  } else {
    lines.push('**Tersely** · added to the summary by a repair (not ranked)');
  }
  if (pick.edited) lines.push('', `Shown in the summary with an edit: ${escapeMarkdown(pick.edited.reason)}`);
  const features = Object.entries(pick.features)
    .filter(([, value]) => Number.isFinite(value))
    .sort((a, b) => Math.abs(b[1]) - Math.abs(a[1]))
    .slice(0, MAX_FEATURES);
  if (features.length > 0 && pick.rank > 0) {
    lines.push('', '| feature | value |', '| --- | ---: |');
    for (const [name, value] of features) lines.push(`| ${escapeMarkdown(name)} | ${formatNumber(value)} |`);
  }
  if (convergence && pick.rank > 0) lines.push('', convergenceLine(convergence));
  return lines.join('\n');
}
