/**
 * How an abstract check shows: a headline and one item per abstract sentence, left-out section,
 * consistency finding and notice, each with the places it points to (the abstract sentence, the
 * body lines that support it, the section heading). Places are spans kept by the extension; the
 * panel only holds their indices. Also the findings with spans for the Problems view (when the
 * setting asks). Pure; the report comes from the engine host as plain data.
 */
import type { AbstractReport, Span } from '../core/index';
import type { PanelAbstractCheck, PanelCheckItem, PanelLink } from './messages';
import { UNTITLED_SECTION } from './panel-model';
import { ENGLISH, type Wording } from './wording';

export interface AbstractFinding {
  readonly span: Span;
  readonly message: string;
}

export interface AbstractView {
  /** The panel's view without its id and staleness (the caller adds them). */
  readonly panel: Omit<PanelAbstractCheck, 'id' | 'stale'>;
  /** Every place an item or link points to; `target` fields index into it. */
  readonly places: readonly Span[];
  /** Findings with a place in the text, for the Problems view. */
  readonly findings: readonly AbstractFinding[];
}

function quote(text: string, max = 90): string {
  const flat = text.replace(/\s+/g, ' ').trim();
  return flat.length > max ? `${flat.slice(0, max - 1)}…` : flat;
}

export function abstractView(report: AbstractReport, documentName: string, wording: Wording = ENGLISH): AbstractView {
  const { t, count } = wording;
  if (!report.ok) return { panel: { documentName, headline: report.error, items: [] }, places: [], findings: [] };
  const places: Span[] = [];
  const place = (span: Span | null): number | null => {
    if (!span) return null;
    places.push(span);
    return places.length - 1;
  };
  const lineLink = (span: Span, line: number): PanelLink => ({ label: t('line {0}', count(line)), target: place(span)! });

  const { abstract, sections } = report;
  const covered = sections.filter((s) => s.covered).length;
  const flagged = abstract.sentences.filter((s) => !s.supported).length;
  const name = abstract.heading ? `“${abstract.heading}”` : abstract.origin === 'opening' ? t('The opening text') : t('The selected text');
  const headline = t(
    '{0}: {1} sentences, {2} words; covers {3} of {4} sections; {5} may lack support in the body.',
    name,
    count(abstract.sentences.length),
    count(abstract.words),
    count(covered),
    count(sections.length),
    flagged === 1 ? t('1 sentence') : t('{0} sentences', count(flagged)),
  );

  const items: PanelCheckItem[] = [];
  const findings: AbstractFinding[] = [];
  for (const sentence of abstract.sentences) {
    if (!sentence.claim) continue;
    // A consistency finding is part of its claim's verdict: its body line joins the claim's links, not an item of its own.
    // Each body sentence once, however many findings cite it.
    const cited = new Map<number, { span: Span; line: number }>();
    for (const support of sentence.support) cited.set(support.sentence, support);
    for (const finding of sentence.findings) if (finding.body && !cited.has(finding.body.sentence)) cited.set(finding.body.sentence, finding.body);
    const bodies = [...cited.values()];
    // Two sentences on one line (a table row, a list line) get numbered links, so the labels differ.
    const onLine = (line: number) => bodies.filter((b) => b.line === line);
    const links = bodies.map((body) => {
      const same = onLine(body.line);
      if (same.length === 1) return lineLink(body.span, body.line);
      return { label: t('line {0} ({1})', count(body.line), count(same.indexOf(body) + 1)), target: place(body.span)! };
    });
    const target = place(sentence.span);
    if (sentence.supported) {
      items.push({ severity: 'ok', text: t('“{0}” is supported by the body.', quote(sentence.text)), target, links });
      continue;
    }
    const text =
      sentence.verdict === 'contradicted'
        ? t('“{0}” disagrees with the body: {1}', quote(sentence.text), sentence.reason)
        : t('“{0}” may not be backed by the body: {1} The closest body lines are linked.', quote(sentence.text), sentence.reason);
    items.push({ severity: 'warning', text, target, links });
    if (sentence.span) findings.push({ span: sentence.span, message: text });
  }
  // Findings on sentences that are not claims (rare) still show, each on its own.
  for (const finding of report.findings.filter((f) => !abstract.sentences[f.abstractSentence]?.claim)) {
    const links = finding.body ? [lineLink(finding.body.span, finding.body.line)] : [];
    items.push({ severity: 'warning', text: finding.message, target: place(finding.abstractSpan), links });
  }
  for (const section of sections.filter((s) => !s.covered)) {
    const heading = section.heading || UNTITLED_SECTION;
    const text = t('The abstract leaves out the section “{0}” (line {1}).', heading, count(section.line));
    items.push({ severity: 'information', text, target: place(section.span), links: [] });
    findings.push({ span: section.span, message: text });
  }
  if (report.rouge) {
    items.push({
      severity: 'information',
      text: t(
        'Word overlap with Tersely’s own summary of the same length (ROUGE-1 F1, 0 to 1; higher means the abstract and the summary use more of the same words): {0}.',
        report.rouge.abstractAgainstSummary.rouge1.f1.toFixed(2),
      ),
      target: null,
      links: [],
    });
  }
  for (const notice of report.notices) items.push({ severity: 'information', text: notice, target: null, links: [] });
  return { panel: { documentName, headline, items }, places, findings };
}
