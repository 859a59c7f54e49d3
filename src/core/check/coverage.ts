/**
 * Coverage, by the one rule (abstract-report.ts, `ClaimVerdict`): a section is covered when it
 * holds one of the support sentences of an abstract sentence that passed the rule (supported, or
 * contradicted: the abstract speaks of the section, wrongly). A section is never "covered" by a
 * weaker match than the one that makes a sentence "supported", so the two verdicts cannot disagree.
 *
 * Key content, weighted like a pyramid (Nenkova & Passonneau 2004, "Evaluating content selection in
 * summarization: the pyramid method"): there a content unit weighs as many points as the model
 * summaries that express it; here the "models" are the body's sections and the title, and a unit is
 * a content term. A term that three sections and the title use weighs 4; terms used by one source
 * only are not key content. Coverage is the weight of the key terms the abstract uses over the total.
 */
import { isNonKeyword } from '../keyphrases/textrank-keywords';
import { normalizeHeading } from '../text/headings';
import type { AnalyzedDocument, ParsedDocument, Span } from '../types';
import type { LocatedAbstract } from './abstract-locator';
import type { AbstractSentenceCheck, AbstractThresholds, ContentCoverage, KeyContent, SectionCoverage, UnjudgedSection } from './abstract-report';
import type { CheckBody } from './abstract-match';
import { lineOf, unitsOf } from './claim-report';
import type { Alignment } from './support';
import { normalizedTerms } from './support';

/** How many of the heaviest key terms are weighed (enough to name what an abstract leaves out). */
export const KEY_CONTENT_SIZE = 12;

/**
 * True when the abstract is the document's first section (only its enclosing title comes before
 * it). Text ahead of such an abstract is a byline, a status line or an editor's note, not body
 * the abstract is expected to cover.
 */
function opensDocument(doc: ParsedDocument, abstractSection: number | null): boolean {
  if (abstractSection === null) return false;
  const ancestors = new Set<number>();
  for (let at = doc.sections[abstractSection]!.parent; at !== null; at = doc.sections[at]!.parent) ancestors.add(at);
  return doc.sections.slice(0, abstractSection).every((section) => ancestors.has(section.index));
}

/** A unit's own section span; for the root unit, only the stretch before the first unit heading. */
function unitSpan(doc: ParsedDocument, unit: number, units: Int32Array): Span {
  const span = doc.sections[unit]!.span;
  if (unit !== 0) return span;
  const firstUnit = doc.sections.find((section) => section.index > 0 && units[section.index] !== 0);
  return { start: span.start, end: firstUnit?.headingSpan?.start ?? span.end };
}

export function sectionCoverage(
  analyzed: AnalyzedDocument,
  located: LocatedAbstract,
  body: CheckBody,
  alignments: readonly Alignment[],
  claims: readonly AbstractSentenceCheck[],
  thresholds: AbstractThresholds,
): { sections: SectionCoverage[]; unjudged: UnjudgedSection[] } {
  const { doc } = analyzed;
  const units = unitsOf(doc);
  const skipRoot = opensDocument(doc, located.section);
  // position → the strongest link to it.
  const links = new Map<number, { claim: number; strength: number }>();
  const link = (position: number, claim: number, strength: number) => {
    const current = links.get(position);
    if (!current || strength > current.strength) links.set(position, { claim, strength });
  };
  claims.forEach((claim, k) => {
    if (claim.verdict === 'notAClaim' || claim.verdict === 'unsupported') return;
    const alignment = alignments[k]!;
    for (const pick of alignment.picks) link(pick.position, k, alignment.single[pick.position]!);
  });

  const members = new Map<number, number[]>();
  body.sentences.forEach((sentenceIndex, position) => {
    const unit = units[doc.sentences[sentenceIndex]!.section]!;
    if (unit === 0 && skipRoot) return;
    const list = members.get(unit);
    if (list) list.push(position);
    else members.set(unit, [position]);
  });

  const sections: SectionCoverage[] = [];
  const unjudged: UnjudgedSection[] = [];
  for (const unit of [...members.keys()].sort((a, b) => a - b)) {
    const positions = members.get(unit)!;
    const heading = doc.sections[unit]!.heading;
    const contentTerms = positions.reduce((sum, p) => sum + analyzed.terms[body.sentences[p]!]!.length, 0);
    if (contentTerms < thresholds.minSectionTerms) {
      unjudged.push({ section: unit, heading, contentTerms });
      continue;
    }
    let best: { position: number; claim: number; strength: number } | null = null;
    for (const p of positions) {
      const l = links.get(p);
      if (l && (!best || l.strength > best.strength)) best = { position: p, ...l };
    }
    const covered = best !== null;
    if (!best) {
      // Not covered: show the closest match, which is below the rule's threshold.
      for (const p of positions) {
        alignments.forEach((alignment, k) => {
          if (!claims[k]!.claim) return;
          const strength = alignment.single[p]!;
          if (strength > 0 && (!best || strength > best.strength)) best = { position: p, claim: k, strength };
        });
      }
    }
    const found = best as { position: number; claim: number; strength: number } | null;
    const matched = found ? doc.sentences[body.sentences[found.position]!]! : null;
    const span = unitSpan(doc, unit, units);
    sections.push({
      section: unit,
      heading,
      span,
      line: lineOf(body, doc, doc.sections[unit]!.headingSpan?.start ?? span.start),
      sentenceCount: positions.length,
      similarity: found?.strength ?? 0,
      abstractSentence: found ? found.claim : null,
      sentence: matched ? matched.index : null,
      sentenceSpan: matched ? matched.span : null,
      covered,
    });
  }
  return { sections, unjudged };
}

export function contentCoverage(analyzed: AnalyzedDocument, located: LocatedAbstract, body: CheckBody, claimTerms: readonly (readonly string[])[]): ContentCoverage {
  const { doc } = analyzed;
  const units = unitsOf(doc);
  const sources = new Map<string, Set<number>>();
  const counts = new Map<string, number>();
  const first = new Map<string, number>();
  body.terms.forEach((terms, position) => {
    // A placeholder answer ("None.") or a metadata line repeated in every section is no content.
    if (body.barred[position]) return;
    const unit = units[doc.sentences[body.sentences[position]!]!.section]!;
    for (const term of terms) {
      if (/\d/u.test(term)) continue;
      let set = sources.get(term);
      if (!set) sources.set(term, (set = new Set()));
      set.add(unit);
      counts.set(term, (counts.get(term) ?? 0) + 1);
      if (!first.has(term)) first.set(term, position);
    }
  });
  const unitHeadings = new Set([...units].map((u) => normalizeHeading(doc.sections[u]!.heading)));
  const title = doc.title;
  const titleCounts = title !== null && !unitHeadings.has(normalizeHeading(title)) && normalizeHeading(title) !== normalizeHeading(located.heading ?? '');
  const titleTerms = new Set(titleCounts ? analyzed.titleTerms : []);
  const weightOf = (term: string) => sources.get(term)!.size + (titleTerms.has(term) ? 1 : 0);
  const repeated = [...sources.keys()].filter((term) => weightOf(term) >= 2);
  const words = surfaceWords(analyzed, body, new Set(repeated));
  // Verbs and generic words ("add", "new", "use") are not content an abstract should name: the
  // key-phrase filter's part-of-speech stand-in (keyphrases/english-shapes.ts) leaves them out.
  const key = repeated
    .filter((term) => !isNonKeyword((words.get(term) ?? term).toLowerCase(), analyzed.language))
    .sort((a, b) => weightOf(b) - weightOf(a) || counts.get(b)! - counts.get(a)! || first.get(a)! - first.get(b)!)
    .slice(0, KEY_CONTENT_SIZE);
  const abstractTerms = new Set(claimTerms.flat());
  const items: KeyContent[] = key.map((term) => {
    const sentence = body.sentences[first.get(term)!]!;
    const headings = [...sources.get(term)!].sort((a, b) => a - b).map((u) => doc.sections[u]!.heading);
    return {
      word: words.get(term) ?? term,
      weight: weightOf(term),
      sources: titleTerms.has(term) ? [title!, ...headings] : headings,
      covered: abstractTerms.has(term),
      sentence,
      line: lineOf(body, doc, doc.sentences[sentence]!.span.start),
    };
  });
  const totalWeight = items.reduce((sum, i) => sum + i.weight, 0);
  const coveredWeight = items.filter((i) => i.covered).reduce((sum, i) => sum + i.weight, 0);
  return { share: totalWeight === 0 ? 1 : coveredWeight / totalWeight, coveredWeight, totalWeight, items };
}

/** The most frequent written form of each wanted term in the body. */
function surfaceWords(analyzed: AnalyzedDocument, body: CheckBody, wanted: ReadonlySet<string>): Map<string, string> {
  const tally = new Map<string, Map<string, number>>();
  const termOf = new Map<string, string | undefined>();
  for (const index of body.sentences) {
    for (const word of analyzed.words[index]!) {
      if (!termOf.has(word)) termOf.set(word, normalizedTerms([word], analyzed.language)[0]);
      const term = termOf.get(word);
      if (term === undefined || !wanted.has(term)) continue;
      const forms = tally.get(term) ?? new Map<string, number>();
      forms.set(word, (forms.get(word) ?? 0) + 1);
      tally.set(term, forms);
    }
  }
  const out = new Map<string, string>();
  for (const [term, forms] of tally) out.set(term, [...forms].sort((a, b) => b[1] - a[1] || a[0].localeCompare(b[0]))[0]![0]);
  return out;
}

