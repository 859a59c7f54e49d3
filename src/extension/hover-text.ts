/** The hover on a highlighted sentence: its rank, score and the features behind the score. Pure. */
import { escapeMarkdown } from '../core/index';
import type { PickedSentence } from '../core/index';

const MAX_FEATURES = 8;

function formatNumber(value: number): string {
  if (!Number.isFinite(value)) return String(value);
  return Math.abs(value) >= 100 ? value.toFixed(0) : value.toFixed(3);
}

export function describePick(pick: PickedSentence, sentencesInDocument: number, method: string): string {
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
  return lines.join('\n');
}
