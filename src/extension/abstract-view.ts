/**
 * How an abstract check shows: a headline and findings for the panel, and findings with spans for
 * the Problems view. Pure; the report comes from the engine worker as plain data.
 */
import type { AbstractReport } from '../core/index';
import type { Span } from '../core/index';
import type { PanelAbstractCheck } from './messages';
import { UNTITLED_SECTION } from './panel-model';

export interface AbstractFinding {
  readonly span: Span;
  readonly message: string;
}

export interface AbstractView {
  readonly panel: PanelAbstractCheck;
  readonly findings: readonly AbstractFinding[];
}

function quote(text: string, max = 80): string {
  const flat = text.replace(/\s+/g, ' ').trim();
  return flat.length > max ? `${flat.slice(0, max - 1)}…` : flat;
}

export function abstractView(report: AbstractReport, documentName: string): AbstractView {
  if (!report.ok) {
    return { panel: { documentName, headline: report.error, findings: [] }, findings: [] };
  }
  const { abstract, sections } = report;
  const covered = sections.filter((s) => s.covered).length;
  const unsupported = abstract.sentences.filter((s) => !s.supported);
  const name = abstract.heading ? `“${abstract.heading}”` : 'The supplied abstract';
  let headline = `${name}: ${abstract.sentences.length} sentences, ${abstract.words} words; covers ${covered} of ${sections.length} sections; ${unsupported.length} sentence${unsupported.length === 1 ? '' : 's'} may lack support in the body.`;
  if (report.rouge) headline += ` ROUGE-1 F1 against Tersely's summary of the same length: ${report.rouge.abstractAgainstSummary.rouge1.f1.toFixed(2)}.`;

  const panelFindings: PanelAbstractCheck['findings'][number][] = [];
  const findings: AbstractFinding[] = [];
  for (const sentence of unsupported) {
    const message = `Abstract sentence may not be backed by the body (best similarity ${sentence.similarity.toFixed(2)}): “${quote(sentence.text)}”`;
    panelFindings.push({ severity: 'warning', message });
    if (sentence.span) findings.push({ span: sentence.span, message });
  }
  for (const section of sections.filter((s) => !s.covered)) {
    const heading = section.heading || UNTITLED_SECTION;
    const message = `The abstract seems to leave out the section “${heading}” (best similarity ${section.similarity.toFixed(2)}).`;
    panelFindings.push({ severity: 'information', message });
    findings.push({ span: section.span, message });
  }
  for (const notice of report.notices) panelFindings.push({ severity: 'information', message: notice });
  return { panel: { documentName, headline, findings: panelFindings }, findings };
}
