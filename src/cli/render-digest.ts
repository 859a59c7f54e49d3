/** Terminal, Markdown and JSON views of a digest. Text from the documents is neutralized before it is styled. */
import { escapeMarkdown, type Digest, type DigestOccurrence, type DigestSentence } from '../core/index';
import { JSON_OFFSETS } from './render-summary';
import type { Style } from './style';
import { neutralizeControls as safe, plural } from './terminal-text';

export const DIGEST_NOTE = 'Extractive digest: every line is quoted from one of the documents and may lose the context around it.';

const count = (n: number) => n.toLocaleString('en-US');

/** "also in: b.md line 40, c.md lines 12, 30": each file named once, its lines in the order given. */
export function alsoInLabel(occurrences: readonly DigestOccurrence[]): string {
  const lines = new Map<string, number[]>();
  for (const o of occurrences) lines.set(o.file, [...(lines.get(o.file) ?? []), o.line]);
  const places = [...lines].map(([file, at]) => `${file} ${at.length === 1 ? 'line' : 'lines'} ${at.join(', ')}`);
  return `also in: ${places.join('; ')}`;
}

function byDocument(digest: Digest): Map<number, DigestSentence[]> {
  const groups = new Map<number, DigestSentence[]>();
  for (const s of digest.sentences) {
    const list = groups.get(s.document) ?? [];
    list.push(s);
    groups.set(s.document, list);
  }
  return groups;
}

function headline(digest: Digest): string {
  const { stats } = digest;
  return (
    `${plural(stats.sentencesOut, 'sentence')} · ${stats.documentsRepresented} of ${plural(stats.documentsRead, 'document')} represented · ` +
    `${count(stats.wordsOut)} of ${plural(stats.wordsIn, 'word')} · ${plural(stats.duplicatesMerged, 'near-duplicate sentence')} merged`
  );
}

export function renderDigestText(digest: Digest, style: Style): string {
  const out: string[] = [style.bold(`Digest of ${plural(digest.stats.documents, 'document')}`), style.dim(headline(digest)), style.dim(DIGEST_NOTE)];
  for (const notice of digest.notices) out.push(style.warn(`note: ${safe(notice)}`));
  for (const [index, sentences] of byDocument(digest)) {
    const document = digest.documents[index]!;
    out.push('', style.bold(safe(document.title ? `${document.file} — ${document.title}` : document.file)));
    let currentPath: string | null = null;
    for (const s of sentences) {
      const path = s.sectionPath.join(' › ') || '(opening)';
      if (path !== currentPath) {
        out.push(`  ${style.accent(safe(path))}`);
        currentPath = path;
      }
      const also = s.alsoIn.length > 0 ? ` ${style.dim(`(${safe(alsoInLabel(s.alsoIn))})`)}` : '';
      out.push(`    • ${safe(s.text)} ${style.dim(`[line ${s.line}]`)}${also}`);
    }
  }
  return out.join('\n') + '\n';
}

export function digestToMarkdown(digest: Digest): string {
  const lines: string[] = [`**Digest** — ${headline(digest)}; extractive, so some context may be missing.`];
  for (const [index, sentences] of byDocument(digest)) {
    const document = digest.documents[index]!;
    lines.push('', `### ${escapeMarkdown(document.title ? `${document.file} — ${document.title}` : document.file)}`, '');
    for (const s of sentences) {
      const where = [`line ${s.line}`, ...(s.alsoIn.length > 0 ? [alsoInLabel(s.alsoIn)] : [])].join('; ');
      lines.push(`- ${escapeMarkdown(s.text)} (${escapeMarkdown(where)})`);
    }
  }
  return lines.join('\n') + '\n';
}

export function digestToJson(digest: Digest): object {
  const round = (x: number) => Math.round(x * 10_000) / 10_000;
  return {
    offsets: JSON_OFFSETS,
    documents: digest.documents.map((d) => ({ file: d.file, title: d.title, sentencesIn: d.sentencesIn, wordsIn: d.wordsIn, picked: d.picked, notices: d.notices, ...(d.refused ? { refused: d.refused } : {}) })),
    sentences: digest.sentences.map((s) => ({
      file: s.file,
      text: s.text,
      start: s.span.start,
      end: s.span.end,
      line: s.line,
      section: s.sectionPath.join(' › '),
      score: round(s.score),
      sharedBy: s.sharedBy,
      alsoIn: s.alsoIn.map((o) => ({ file: o.file, line: o.line, start: o.span.start, end: o.span.end })),
    })),
    stats: digest.stats,
    notices: digest.notices,
  };
}
