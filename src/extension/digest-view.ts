/**
 * How a digest shows in the side panel: grouped by document, then by section, each sentence a
 * clickable line with its near-duplicates in other documents ("also in: b.md line 4"). Places are
 * (document, span) pairs kept by the extension; the panel only holds their indices. Pure.
 */
import type { Digest, Span } from '../core/index';
import type { PanelDigest, PanelDigestDocument, PanelDigestLine, PanelDigestSection } from './messages';
import { ENGLISH, type Wording } from './wording';

export interface DigestPlace {
  /** Index into `Digest.documents` (the caller maps it to a file). */
  readonly document: number;
  readonly span: Span;
}

export interface DigestView {
  readonly panel: Omit<PanelDigest, 'id'>;
  /** Every place a line or an "also in" link points to; `target` fields index into it. */
  readonly places: readonly DigestPlace[];
}

export const SECTION_SEPARATOR = ' › ';

export function digestView(digest: Digest, wording: Wording = ENGLISH): DigestView {
  const { t, count } = wording;
  const places: DigestPlace[] = [];
  const place = (document: number, span: Span): number => places.push({ document, span }) - 1;
  const documentOf = new Map(digest.documents.map((d, index) => [d.file, index]));

  const documents: PanelDigestDocument[] = digest.documents.map((doc, index) => {
    const sections: PanelDigestSection[] = [];
    for (const sentence of digest.sentences.filter((s) => s.document === index)) {
      const heading = sentence.sectionPath.join(SECTION_SEPARATOR);
      let section = sections.at(-1);
      if (!section || section.heading !== heading) {
        section = { heading, lines: [] };
        sections.push(section);
      }
      // Each other file named once, as the command line does: "also in: b.md line 13", then "line 27".
      const named = new Set<string>();
      const alsoIn = sentence.alsoIn.flatMap((other) => {
        const at = documentOf.get(other.file);
        if (at === undefined) return [];
        const label = named.has(other.file) ? t('line {0}', count(other.line)) : t('also in: {0} line {1}', other.file, count(other.line));
        named.add(other.file);
        return [{ label, target: place(at, other.span) }];
      });
      const line: PanelDigestLine = { text: sentence.text, line: t('line {0}', count(sentence.line)), target: place(index, sentence.span), alsoIn };
      (section.lines as PanelDigestLine[]).push(line);
    }
    const figures = doc.refused ? doc.refused : t('{0} of {1} sentences', count(doc.picked), count(doc.sentencesIn));
    return { file: doc.file, figures, sections };
  });

  const s = digest.stats;
  const headline = t('Digest of {0} documents: {1} sentences, {2} of {3} words.', count(s.documents), count(s.sentencesOut), count(s.wordsOut), count(s.wordsIn));
  return { panel: { headline, documents, notices: [...digest.notices] }, places };
}

/** Names as the digest shows them; a name seen twice (two untitled documents, two roots) gets a number. */
export function uniqueNames(names: readonly string[]): string[] {
  const seen = new Map<string, number>();
  return names.map((name) => {
    const k = (seen.get(name) ?? 0) + 1;
    seen.set(name, k);
    return k === 1 ? name : `${name} (${k})`;
  });
}
