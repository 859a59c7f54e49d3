/**
 * Messages between the extension and its side panel, as discriminated unions, with validators.
 * Anything arriving from the webview is untrusted until `parsePanelMessage` accepts it; unknown
 * or malformed messages are rejected with a reason (the caller logs it and does nothing else).
 * No editor API here: the webview bundle imports these types too.
 */
import type { RankerName, SummaryStats } from '../core/index';
import type { EngineStage } from './engine-protocol';
import { LENGTH_BOUNDS, LENGTH_UNITS, METHOD_NAMES, type LengthUnit } from './settings';

// ---------- what the panel shows (extension → webview) ----------

export interface PanelRepair {
  /** Index into the warning's repairs. */
  readonly index: number;
  readonly label: string;
}

export interface PanelWarning {
  /** Index into the summary's warnings (what `applyRepair` sends back). */
  readonly index: number;
  readonly message: string;
  readonly words: string;
  readonly repairs: readonly PanelRepair[];
}

export interface PanelSentence {
  /** Index into the document's sentences (what `reveal` and `applyRepair` send back). */
  readonly sentence: number;
  readonly text: string;
  /** 1 = best; 0 = added by a repair, not ranked. */
  readonly rank: number;
  /** Headings below the group's heading, when the sentence sits in a sub-section. */
  readonly subPath: readonly string[];
  /** Why the shown text differs from the source, when it does. */
  readonly edited: string | null;
  readonly warnings: readonly PanelWarning[];
}

export interface PanelGroup {
  readonly heading: string;
  /** Share of the summary's words (0-1). */
  readonly summaryShare: number;
  readonly sentences: readonly PanelSentence[];
}

export interface PanelShare {
  readonly heading: string;
  readonly documentShare: number;
  readonly summaryShare: number;
  readonly picked: number;
}

/** The engine's figures, passed through unchanged. */
export type PanelFigures = SummaryStats;

export interface PanelSummary {
  /** Identifies this summary; messages about a replaced summary are ignored. */
  readonly id: number;
  readonly documentName: string;
  readonly scope: 'document' | 'selection';
  readonly method: string;
  readonly language: string;
  readonly groups: readonly PanelGroup[];
  readonly shares: readonly PanelShare[];
  readonly figures: PanelFigures;
  readonly notices: readonly string[];
}

export interface PanelAbstractFinding {
  readonly severity: 'information' | 'warning';
  readonly message: string;
}

export interface PanelAbstractCheck {
  readonly documentName: string;
  readonly headline: string;
  readonly findings: readonly PanelAbstractFinding[];
}

export interface PanelControls {
  readonly unit: LengthUnit;
  readonly value: number;
  readonly method: RankerName;
  readonly balance: boolean;
  readonly live: boolean;
}

export type NoticeKind = 'info' | 'stale' | 'tooLarge' | 'error';

/** `waiting`: the job is sent and the engine host has not begun it yet (it may still be starting). */
export type ProgressStage = 'waiting' | EngineStage | 'checkingAbstract';

export interface PanelProgress {
  readonly task: 'summarize' | 'checkAbstract';
  readonly stage: ProgressStage;
}

/** The stages a summary goes through, in order, with the words the panel and status area show. */
export const SUMMARY_STAGES: readonly { readonly stage: EngineStage; readonly label: string }[] = [
  { stage: 'reading', label: 'Reading the document' },
  { stage: 'ranking', label: 'Ranking sentences' },
  { stage: 'checking', label: 'Picking and checking sentences' },
];

export function progressLabel(progress: PanelProgress): string {
  if (progress.task === 'checkAbstract') return 'Checking the abstract…';
  const step = SUMMARY_STAGES.findIndex((entry) => entry.stage === progress.stage);
  if (step < 0) return 'Summarizing: waiting for the engine…';
  return `Summarizing: ${SUMMARY_STAGES[step]!.label.toLowerCase()} (step ${step + 1} of ${SUMMARY_STAGES.length})…`;
}

export type ToPanel =
  | { readonly type: 'summary'; readonly summary: PanelSummary }
  | { readonly type: 'controls'; readonly controls: PanelControls }
  /** null: nothing is running (or it is quick enough not to show). */
  | { readonly type: 'progress'; readonly progress: PanelProgress | null }
  | { readonly type: 'notice'; readonly kind: NoticeKind; readonly text: string }
  | { readonly type: 'abstractCheck'; readonly check: PanelAbstractCheck | null }
  | { readonly type: 'clear' };

// ---------- what the panel asks for (webview → extension) ----------

export const PANEL_COMMANDS = ['summarizeDocument', 'copySummary', 'insertSummary', 'toggleLive', 'clearHighlights'] as const;
export type PanelCommand = (typeof PANEL_COMMANDS)[number];

export type FromPanel =
  | { readonly type: 'ready' }
  | { readonly type: 'reveal'; readonly summaryId: number; readonly sentence: number }
  | { readonly type: 'applyRepair'; readonly summaryId: number; readonly warning: number; readonly repair: number }
  | { readonly type: 'setLength'; readonly unit: LengthUnit; readonly value: number }
  | { readonly type: 'setMethod'; readonly method: RankerName }
  | { readonly type: 'setBalance'; readonly enabled: boolean }
  | { readonly type: 'command'; readonly command: PanelCommand };

export type ParseResult<T> = { readonly ok: true; readonly message: T } | { readonly ok: false; readonly reason: string };

const MAX_INDEX = 10_000_000;

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

function isIndex(value: unknown): value is number {
  return typeof value === 'number' && Number.isInteger(value) && value >= 0 && value <= MAX_INDEX;
}

/** Only the listed keys may be present: extra fields mean the sender is not our panel script. */
function hasOnlyKeys(record: Record<string, unknown>, keys: readonly string[]): boolean {
  return Object.keys(record).every((key) => keys.includes(key));
}

function reject(reason: string): ParseResult<never> {
  return { ok: false, reason };
}

/** Validates a message from the webview. Never throws. */
export function parsePanelMessage(raw: unknown): ParseResult<FromPanel> {
  if (!isRecord(raw)) return reject('not an object');
  const type = raw['type'];
  if (typeof type !== 'string') return reject('no type');
  const shape = (keys: readonly string[]): boolean => hasOnlyKeys(raw, ['type', ...keys]);
  switch (type) {
    case 'ready':
      return shape([]) ? { ok: true, message: { type } } : reject('unexpected fields on ready');
    case 'reveal': {
      const { summaryId, sentence } = raw;
      if (!shape(['summaryId', 'sentence']) || !isIndex(summaryId) || !isIndex(sentence)) return reject('malformed reveal');
      return { ok: true, message: { type, summaryId, sentence } };
    }
    case 'applyRepair': {
      const { summaryId, warning, repair } = raw;
      if (!shape(['summaryId', 'warning', 'repair']) || !isIndex(summaryId) || !isIndex(warning) || !isIndex(repair) || repair > 10) {
        return reject('malformed applyRepair');
      }
      return { ok: true, message: { type, summaryId, warning, repair } };
    }
    case 'setLength': {
      const { unit, value } = raw;
      if (!shape(['unit', 'value']) || typeof unit !== 'string' || !(LENGTH_UNITS as readonly string[]).includes(unit)) return reject('malformed setLength');
      const bounds = LENGTH_BOUNDS[unit as LengthUnit];
      if (typeof value !== 'number' || !Number.isInteger(value) || value < bounds.min || value > bounds.max) return reject('length out of range');
      return { ok: true, message: { type, unit: unit as LengthUnit, value } };
    }
    case 'setMethod': {
      const { method } = raw;
      if (!shape(['method']) || typeof method !== 'string' || !(METHOD_NAMES as readonly string[]).includes(method)) return reject('unknown method');
      return { ok: true, message: { type, method: method as RankerName } };
    }
    case 'setBalance': {
      const { enabled } = raw;
      if (!shape(['enabled']) || typeof enabled !== 'boolean') return reject('malformed setBalance');
      return { ok: true, message: { type, enabled } };
    }
    case 'command': {
      const { command } = raw;
      if (!shape(['command']) || typeof command !== 'string' || !(PANEL_COMMANDS as readonly string[]).includes(command)) return reject('unknown command');
      return { ok: true, message: { type, command: command as PanelCommand } };
    }
    default:
      return reject(`unknown type ${JSON.stringify(type.slice(0, 40))}`);
  }
}

/** A shallow check on the webview side that a message really is one of ours (defence in depth). */
export function isToPanel(raw: unknown): raw is ToPanel {
  if (!isRecord(raw)) return false;
  switch (raw['type']) {
    case 'summary':
      return isRecord(raw['summary']) && Array.isArray(raw['summary']['groups']) && isRecord(raw['summary']['figures']);
    case 'controls':
      return isRecord(raw['controls']);
    case 'progress': {
      const progress = raw['progress'];
      return progress === null || (isRecord(progress) && typeof progress['task'] === 'string' && typeof progress['stage'] === 'string');
    }
    case 'notice':
      return typeof raw['text'] === 'string' && typeof raw['kind'] === 'string';
    case 'abstractCheck':
      return raw['check'] === null || isRecord(raw['check']);
    case 'clear':
      return true;
    default:
      return false;
  }
}
