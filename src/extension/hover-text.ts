/** The hover on a highlighted sentence: why it was picked, in words, then the numbers behind it. Pure. */
import { escapeMarkdown } from '../core/index';
import type { PickedSentence, Summary } from '../core/index';
import { whyInWords, whyNumbers } from './why-text';
import { ENGLISH, type Wording } from './wording';

/** Features the hover names (the strongest first); a trained model has about thirty. */
export const HOVER_FEATURES = 6;

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

export function describePick(pick: PickedSentence, summary: Summary, wording: Wording = ENGLISH, convergence?: Convergence): string {
  const lines: string[] = [];
  lines.push(`**${wording.t('Why Tersely picked this sentence')}**`, '', escapeMarkdown(whyInWords(pick, summary, wording)));
  if (pick.edited) lines.push('', escapeMarkdown(wording.t('Shown in the summary with an edit: {0}', pick.edited.reason)));
  const all = whyNumbers(pick, summary, wording);
  if (all.length > 0) {
    // The rank line, what the numbers are, then the strongest features; the panel lists them all.
    const shown = all.slice(0, 2 + HOVER_FEATURES);
    const more = all.length - shown.length;
    const rest = more > 0 ? [wording.t('{0} more under “Show the numbers” in the panel', wording.count(more))] : [];
    // The published method names and raw values stay here, in the detail.
    lines.push('', `*${wording.t('The numbers behind it')}:* ${[...shown, ...rest].map(escapeMarkdown).join(' · ')}`);
  }
  if (convergence && pick.rank > 0) lines.push('', escapeMarkdown(convergenceLine(convergence)));
  return lines.join('\n');
}
