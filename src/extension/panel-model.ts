/**
 * Turns an engine summary into what the side panel shows: sentences grouped by balance unit, each
 * with why it was picked, the worded figures, shares and the stand-alone warnings with their
 * repair buttons. Pure, so it is tested under Node; the webview only renders what this returns.
 */
import { METHOD_INFO, unitOfSection } from '../core/index';
import type { Repair, StandAloneWarning, Summary } from '../core/index';
import type { PanelFigures, PanelGroup, PanelRepair, PanelSentence, PanelSummary, PanelWarning } from './messages';
import { whyInWords, whyNumbers } from './why-text';
import { ENGLISH, type Wording } from './wording';

export { unitOfSection };

/** Key phrases at the top of the panel: a compact line, not a list to read (ours). */
export const KEY_PHRASES_SHOWN = 8;

export const UNTITLED_SECTION = '(before the first heading)';

/** What `previousPicksFor` needs of a summary on screen. */
export interface ShownPicks {
  readonly scope: 'document' | 'selection';
  readonly version: number;
  readonly summary: Pick<Summary, 'sentences' | 'focus'>;
}

/**
 * The picks to compare a new summary with, so the ones a live edit brought in are marked "new";
 * none after a command, a settings change or a switch of editor (`byLiveEdit` false), when the
 * document did not change, or when the focus changed: a new focus, like a new length, changes the
 * picks on purpose, and marking them all would say nothing.
 */
export function previousPicksFor(before: ShownPicks | undefined, next: ShownPicks, byLiveEdit: boolean): ReadonlySet<string> | undefined {
  if (before === undefined || !byLiveEdit || before.scope !== next.scope || before.version === next.version) return undefined;
  if ((before.summary.focus?.text ?? '') !== (next.summary.focus?.text ?? '')) return undefined;
  return new Set(before.summary.sentences.map((p) => p.text));
}

export function repairLabel(repair: Repair, warning: StandAloneWarning, wording: Wording = ENGLISH): string {
  switch (repair.kind) {
    case 'addContext':
      return repair.sentences.length === 1 ? wording.t('Add the context sentence') : wording.t('Add {0} context sentences', repair.sentences.length);
    case 'replace':
      return repair.replacement === null ? wording.t('Drop it from the summary') : wording.t('Swap for the next best sentence');
    case 'trimConnective':
      return wording.t('Show without “{0}”', warning.words);
  }
}

function panelWarnings(summary: Summary, sentence: number, wording: Wording): PanelWarning[] {
  return summary.warnings
    .map((warning, index) => ({ warning, index }))
    .filter(({ warning }) => warning.sentence === sentence)
    .map(({ warning, index }) => ({
      index,
      message: warning.message,
      repairs: warning.repairs.map((repair, index): PanelRepair => ({ index, label: repairLabel(repair, warning, wording) })),
    }));
}

function headingOf(summary: Summary, unit: number): string {
  const share = summary.shares.find((s) => s.section === unit);
  const heading = share?.heading ?? summary.document.sections[unit]?.heading ?? '';
  return heading.length > 0 ? heading : UNTITLED_SECTION;
}

/** The method as people know it in the panel: by what it does. */
export function methodLabel(method: string): string {
  return METHOD_INFO.find((m) => m.name === method)?.label ?? method;
}

/** Whole minutes, never "0 min": a summary always takes some reading. */
const minutes = (value: number): number => Math.max(1, Math.round(value));

export function panelFigures(summary: Summary, wording: Wording = ENGLISH): PanelFigures {
  const s = summary.stats;
  return {
    words: wording.t('{0} of {1} words', wording.count(s.wordsOut), wording.count(s.wordsIn)),
    reading: wording.t('reads in about {0} min (document about {1} min)', wording.count(minutes(s.minutesToRead)), wording.count(minutes(s.documentMinutesToRead))),
    sections: wording.t('covers {0} of {1} sections', wording.count(s.sectionsCovered), wording.count(s.sectionsWithContent)),
    sentences: wording.t('{0} of {1} sentences', wording.count(s.sentencesOut), wording.count(s.sentencesIn)),
  };
}

export interface BuildOptions {
  readonly wording?: Wording;
  /** Source text of the picks of the previous summary of the same document; picks not among them are marked new. */
  readonly previousPicks?: ReadonlySet<string>;
}

export function buildPanelSummary(summary: Summary, id: number, documentName: string, scope: 'document' | 'selection', options: BuildOptions = {}): PanelSummary {
  const wording = options.wording ?? ENGLISH;
  const previous = options.previousPicks;
  const groups = new Map<number, { heading: string; sentences: PanelSentence[] }>();
  let changed = 0;
  for (const pick of summary.sentences) {
    const unit = unitOfSection(summary, pick.section);
    let group = groups.get(unit);
    if (!group) {
      group = { heading: unit >= 0 ? headingOf(summary, unit) : UNTITLED_SECTION, sentences: [] };
      groups.set(unit, group);
    }
    const unitHeading = summary.document.sections[unit]?.heading ?? '';
    const at = unitHeading ? pick.sectionPath.lastIndexOf(unitHeading) : -1;
    const isNew = previous !== undefined && !previous.has(pick.text);
    if (isNew) changed++;
    group.sentences.push({
      sentence: pick.sentence,
      text: pick.text,
      rank: pick.rank,
      subPath: at >= 0 ? pick.sectionPath.slice(at + 1) : [],
      edited: pick.edited?.reason ?? null,
      warnings: panelWarnings(summary, pick.sentence, wording),
      isNew,
      why: whyInWords(pick, summary, wording),
      whyNumbers: whyNumbers(pick, summary, wording),
    });
  }
  const panelGroups: PanelGroup[] = [...groups.entries()].map(([unit, group]) => ({
    heading: group.heading,
    share: wording.t('{0} of the summary', wording.percent(summary.shares.find((share) => share.section === unit)?.summaryShare ?? 0)),
    sentences: group.sentences,
  }));
  return {
    id,
    documentName,
    scope,
    method: methodLabel(summary.method),
    language: summary.language,
    groups: panelGroups,
    shares: summary.shares.map((share) => ({
      heading: share.heading.length > 0 ? share.heading : UNTITLED_SECTION,
      documentShare: Math.max(0, Math.min(1, share.documentShare)),
      summaryShare: Math.max(0, Math.min(1, share.summaryShare)),
      label: wording.t('{0} of the document, {1} of the summary', wording.percent(share.documentShare), wording.percent(share.summaryShare)),
    })),
    figures: panelFigures(summary, wording),
    notices: summary.refused ? [summary.refused, ...summary.notices.filter((n) => n !== summary.refused)] : [...summary.notices],
    changed,
    leftOut: (summary.leftOut ?? []).map((section) => section.message),
    keyPhrases: summary.keyPhrases.slice(0, KEY_PHRASES_SHOWN).map((phrase) => phrase.text),
    focus: summary.focus?.text ?? '',
  };
}
