/** Terminal and JSON views of a summary. Text from the document is neutralized before it is styled. */
import { LineIndex, type Summary } from '../core/index';
import type { Style } from './style';
import { neutralizeControls as safe } from './terminal-text';

export const EXTRACTIVE_NOTE = 'Extractive summary: every line is quoted from the text and may lose the context around it.';

function percent(x: number): string {
  return `${Math.round(x * 100)}%`;
}

/** "about 2 min", "under 1 min". */
export function minutes(value: number): string {
  return value < 1 ? 'under 1 min' : `about ${Math.round(value).toLocaleString('en-US')} min`;
}

export function renderText(name: string, summary: Summary, style: Style): string {
  const { stats } = summary;
  const lines = new LineIndex(summary.document.text);
  const lineOf = (offset: number) => lines.lineNumber(offset - summary.document.baseOffset);
  const out: string[] = [];
  const title = summary.document.title ? `${summary.document.title} (${name})` : name;
  out.push(style.bold(safe(title)));
  out.push(
    style.dim(
      `${stats.wordsOut.toLocaleString('en-US')} of ${stats.wordsIn.toLocaleString('en-US')} words (${percent(stats.compression)}) · ` +
        `${stats.sentencesOut} of ${stats.sentencesIn} sentences · ${stats.sectionsCovered} of ${stats.sectionsWithContent} sections covered · ` +
        `reads in ${minutes(stats.minutesToRead)} (document ${minutes(stats.documentMinutesToRead)}) · method ${summary.method}`,
    ),
  );
  out.push(style.dim(EXTRACTIVE_NOTE));
  if (summary.focus) {
    const f = summary.focus;
    out.push(`${style.dim('focus:')} ${safe(f.text)} ${style.dim(`(${f.matchingSentences} matching sentence${f.matchingSentences === 1 ? '' : 's'}; only those are picked)`)}`);
  }
  if (summary.keyPhrases.length > 0) out.push(`${style.dim('key phrases:')} ${summary.keyPhrases.map((k) => safe(k.text)).join(' · ')}`);
  for (const notice of summary.notices) out.push(style.warn(`note: ${safe(notice)}`));
  const leftOut = summary.leftOut ?? [];
  if (leftOut.length > 0) {
    out.push(style.dim(`${leftOut.length} ${leftOut.length === 1 ? 'section' : 'sections'} left out as not summary-worthy: ${leftOut.map((l) => `${safe(l.heading || '(opening)')} (${safe(l.message.replace(/^left out: /, ''))})`).join('; ')}`));
  }

  const flagged = new Map(summary.warnings.map((w) => [w.sentence, w]));
  let currentPath: string | null = null;
  for (const picked of summary.sentences) {
    const path = picked.sectionPath.join(' › ') || '(opening)';
    if (path !== currentPath) {
      out.push('', style.accent(safe(path)));
      currentPath = path;
    }
    const mark = flagged.has(picked.sentence) ? style.warn('!') : '•';
    const edited = picked.edited ? style.dim(` (edited: ${picked.edited.reason})`) : '';
    out.push(`  ${mark} ${safe(picked.text)}${edited} ${style.dim(`[line ${lineOf(picked.span.start)}]`)}`);
  }
  if (summary.warnings.length > 0) {
    out.push('', style.warn(`May not stand alone (${summary.warnings.length}):`));
    for (const warning of summary.warnings) {
      const context = warning.context.map((i) => `line ${lineOf(summary.document.sentences[i]!.span.start)}`).join(', ');
      out.push(`  ! line ${lineOf(warning.span.start)}: ${safe(warning.message)}${context ? ` — context at ${context}` : ''}`);
    }
  }
  return out.join('\n') + '\n';
}

/** How offsets in the JSON output count, stated in the output itself. */
export const JSON_OFFSETS = "UTF-16 code units into the input decoded as UTF-8, after its byte-order mark if it has one";

export function summaryToJson(name: string, summary: Summary, input: { readonly byteOrderMark: boolean } = { byteOrderMark: false }): object {
  return {
    file: name,
    offsets: JSON_OFFSETS,
    byteOrderMark: input.byteOrderMark,
    method: summary.method,
    language: summary.language,
    sentences: summary.sentences.map((p) => ({
      text: p.text,
      start: p.span.start,
      end: p.span.end,
      section: p.sectionPath.join(' › '),
      score: round(p.score),
      rank: p.rank,
      ...(p.edited ? { edited: p.edited.reason } : {}),
    })),
    ...(summary.focus ? { focus: { ...summary.focus } } : {}),
    keyPhrases: summary.keyPhrases.map((k) => ({
      text: k.text,
      score: round(k.score),
      count: k.count,
      occurrences: k.occurrences.map((o) => ({ start: o.start, end: o.end })),
    })),
    stats: {
      ...summary.stats,
      compression: round(summary.stats.compression),
      minutesToRead: round(summary.stats.minutesToRead),
      documentMinutesToRead: round(summary.stats.documentMinutesToRead),
    },
    ranking: summary.ranking,
    sections: summary.shares.map((s) => ({
      heading: s.heading,
      documentShare: round(s.documentShare),
      summaryShare: round(s.summaryShare),
      sentences: s.picked,
    })),
    warnings: summary.warnings.map((w) => ({
      sentence: summary.document.sentences[w.sentence]?.text ?? '',
      trigger: w.trigger,
      words: w.words,
      start: w.span.start,
      end: w.span.end,
      message: w.message,
      context: w.context.map((i) => {
        const s = summary.document.sentences[i]!;
        return { text: s.text, start: s.span.start, end: s.span.end };
      }),
      repairs: w.repairs.map((r) => r.kind),
    })),
    leftOut: (summary.leftOut ?? []).map((l) => ({ heading: l.heading, reason: l.reason, message: l.message })),
    barred: (summary.barred ?? []).map((b) => ({ sentence: summary.document.sentences[b.sentence]?.text ?? '', kind: b.kind })),
    notices: summary.notices,
  };
}

function round(x: number): number {
  return Math.round(x * 10_000) / 10_000;
}
