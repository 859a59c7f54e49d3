/**
 * Validates what the side panel sends. The webview is untrusted: a message must be exactly one of
 * ours, every field of the right type and range, and no extra fields; anything else is rejected
 * with a reason (the caller logs it and does nothing else). Never throws. No editor API here.
 */
import { METHOD_NAMES, parseLength } from '../core/index';
import type { RankerName } from '../core/index';
import type { FromPanel } from './messages';
import { FOCUS_MAX_LENGTH } from './recent-focuses';

export const PANEL_COMMANDS = ['summarizeDocument', 'copySummary', 'insertSummary', 'toggleLive', 'clearHighlights', 'checkAbstract'] as const;
export type PanelCommand = (typeof PANEL_COMMANDS)[number];

export type ParseResult<T> = { readonly ok: true; readonly message: T } | { readonly ok: false; readonly reason: string };

const MAX_INDEX = 10_000_000;
const MAX_LENGTH_TEXT = 40;

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

function isIndex(value: unknown): value is number {
  return typeof value === 'number' && Number.isInteger(value) && value >= 0 && value <= MAX_INDEX;
}

function reject(reason: string): ParseResult<never> {
  return { ok: false, reason };
}

export function parsePanelMessage(raw: unknown): ParseResult<FromPanel> {
  if (!isRecord(raw)) return reject('not an object');
  const type = raw['type'];
  if (typeof type !== 'string') return reject('no type');
  // Only the listed keys may be present: extra fields mean the sender is not our panel script.
  const shape = (keys: readonly string[]): boolean => Object.keys(raw).every((key) => key === 'type' || keys.includes(key));
  switch (type) {
    case 'ready':
      return shape([]) ? { ok: true, message: { type } } : reject('unexpected fields on ready');
    case 'reveal': {
      const { summaryId, sentence } = raw;
      if (!shape(['summaryId', 'sentence']) || !isIndex(summaryId) || !isIndex(sentence)) return reject('malformed reveal');
      return { ok: true, message: { type, summaryId, sentence } };
    }
    case 'revealCheck': {
      const { checkId, target } = raw;
      if (!shape(['checkId', 'target']) || !isIndex(checkId) || !isIndex(target)) return reject('malformed revealCheck');
      return { ok: true, message: { type, checkId, target } };
    }
    case 'revealDigest': {
      const { digestId, target } = raw;
      if (!shape(['digestId', 'target']) || !isIndex(digestId) || !isIndex(target)) return reject('malformed revealDigest');
      return { ok: true, message: { type, digestId, target } };
    }
    case 'dismissCheck':
      return shape([]) ? { ok: true, message: { type } } : reject('unexpected fields on dismissCheck');
    case 'dismissDigest':
      return shape([]) ? { ok: true, message: { type } } : reject('unexpected fields on dismissDigest');
    case 'applyRepair': {
      const { summaryId, warning, repair } = raw;
      if (!shape(['summaryId', 'warning', 'repair']) || !isIndex(summaryId) || !isIndex(warning) || !isIndex(repair) || repair > 10) {
        return reject('malformed applyRepair');
      }
      return { ok: true, message: { type, summaryId, warning, repair } };
    }
    case 'setLength': {
      const { length } = raw;
      if (!shape(['length']) || typeof length !== 'string' || length.length > MAX_LENGTH_TEXT) return reject('malformed setLength');
      const parsed = parseLength(length);
      if (!parsed.ok) return reject(`length: ${parsed.reason}`);
      return { ok: true, message: { type, length: length.trim() } };
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
    case 'setFocus': {
      const { focus } = raw;
      if (!shape(['focus']) || typeof focus !== 'string' || focus.length > FOCUS_MAX_LENGTH) return reject('malformed setFocus');
      return { ok: true, message: { type, focus } };
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
