/**
 * Turns an engine summary into what the side panel shows: sentences grouped by balance unit,
 * shares, figures and the coherence warnings with their repair buttons. Pure, so it is tested
 * under Node; the webview only renders what this returns.
 */
import type { Repair, StandAloneWarning, Summary } from '../core/index';
import type { PanelGroup, PanelRepair, PanelSentence, PanelSummary, PanelWarning } from './messages';

export const UNTITLED_SECTION = '(before the first heading)';

/** The balance unit (a section index listed in `summary.shares`) that contains a section, or -1. */
import { unitOfSection } from '../core/index';

export { unitOfSection };

export function repairLabel(repair: Repair, warning: StandAloneWarning): string {
  switch (repair.kind) {
    case 'addContext':
      return repair.sentences.length === 1 ? 'Add the context sentence' : `Add ${repair.sentences.length} context sentences`;
    case 'replace':
      return repair.replacement === null ? 'Drop it from the summary' : 'Swap for the next best sentence';
    case 'trimConnective':
      return `Show without “${warning.words}”`;
  }
}

function panelWarnings(summary: Summary, sentence: number): PanelWarning[] {
  return summary.warnings
    .map((warning, index) => ({ warning, index }))
    .filter(({ warning }) => warning.sentence === sentence)
    .map(({ warning, index }) => ({
      index,
      message: warning.message,
      words: warning.words,
      repairs: warning.repairs.map((repair, index): PanelRepair => ({ index, label: repairLabel(repair, warning) })),
    }));
}

function headingOf(summary: Summary, unit: number): string {
  const share = summary.shares.find((s) => s.section === unit);
  const heading = share?.heading ?? summary.document.sections[unit]?.heading ?? '';
  return heading.length > 0 ? heading : UNTITLED_SECTION;
}

export function buildPanelSummary(summary: Summary, id: number, documentName: string, scope: 'document' | 'selection'): PanelSummary {
  const groups = new Map<number, { heading: string; sentences: PanelSentence[] }>();
  for (const pick of summary.sentences) {
    const unit = unitOfSection(summary, pick.section);
    let group = groups.get(unit);
    if (!group) {
      group = { heading: unit >= 0 ? headingOf(summary, unit) : UNTITLED_SECTION, sentences: [] };
      groups.set(unit, group);
    }
    const unitHeading = summary.document.sections[unit]?.heading ?? '';
    const at = unitHeading ? pick.sectionPath.lastIndexOf(unitHeading) : -1;
    group.sentences.push({
      sentence: pick.sentence,
      text: pick.text,
      rank: pick.rank,
      subPath: at >= 0 ? pick.sectionPath.slice(at + 1) : [],
      edited: pick.edited?.reason ?? null,
      warnings: panelWarnings(summary, pick.sentence),
    });
  }
  const panelGroups: PanelGroup[] = [...groups.entries()].map(([unit, group]) => ({
    heading: group.heading,
    summaryShare: summary.shares.find((share) => share.section === unit)?.summaryShare ?? 0,
    sentences: group.sentences,
  }));
  const { stats } = summary;
  return {
    id,
    documentName,
    scope,
    method: summary.method,
    language: summary.language,
    groups: panelGroups,
    shares: summary.shares.map((share) => ({
      heading: share.heading.length > 0 ? share.heading : UNTITLED_SECTION,
      documentShare: share.documentShare,
      summaryShare: share.summaryShare,
      picked: share.picked,
    })),
    figures: {
      wordsIn: stats.wordsIn,
      wordsOut: stats.wordsOut,
      compression: stats.compression,
      sentencesIn: stats.sentencesIn,
      sentencesOut: stats.sentencesOut,
      sectionsCovered: stats.sectionsCovered,
      sectionsWithContent: stats.sectionsWithContent,
      minutesToRead: stats.minutesToRead,
      documentMinutesToRead: stats.documentMinutesToRead,
    },
    notices: summary.refused ? [summary.refused, ...summary.notices.filter((n) => n !== summary.refused)] : [...summary.notices],
  };
}
