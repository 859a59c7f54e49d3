/**
 * The webview's check on what it is sent: every field of every message, by type and size, with
 * no extra fields (a malformed message is dropped and logged by the panel, never half-rendered).
 * Small combinators so each message's shape reads as a table. No editor API here.
 */
import { PANEL_TEXT } from './panel-text';
import type { ToPanel } from './messages';

type Check = (value: unknown) => boolean;

const MAX_TEXT = 200_000;
const MAX_ITEMS = 100_000;

const isRecord = (value: unknown): value is Record<string, unknown> => typeof value === 'object' && value !== null && !Array.isArray(value);
const text: Check = (v) => typeof v === 'string' && v.length <= MAX_TEXT;
const whole: Check = (v) => typeof v === 'number' && Number.isInteger(v) && v >= 0 && v <= Number.MAX_SAFE_INTEGER;
const share: Check = (v) => typeof v === 'number' && Number.isFinite(v) && v >= 0 && v <= 1;
const flag: Check = (v) => typeof v === 'boolean';
const oneOf =
  (...values: readonly unknown[]): Check =>
  (v) =>
    values.includes(v);
const nullable =
  (check: Check): Check =>
  (v) =>
    v === null || check(v);
const list =
  (check: Check): Check =>
  (v) =>
    Array.isArray(v) && v.length <= MAX_ITEMS && v.every(check);
/** Exactly these fields, each passing its check. */
const shape =
  (fields: Record<string, Check>): Check =>
  (v) =>
    isRecord(v) && Object.keys(v).every((key) => Object.prototype.hasOwnProperty.call(fields, key)) && Object.entries(fields).every(([key, check]) => check(v[key]));

const warning = shape({ index: whole, message: text, repairs: list(shape({ index: whole, label: text })) });
const sentence = shape({
  sentence: whole,
  text,
  rank: whole,
  subPath: list(text),
  edited: nullable(text),
  warnings: list(warning),
  isNew: flag,
  why: text,
  whyNumbers: list(text),
});
const summary = shape({
  id: whole,
  documentName: text,
  scope: oneOf('document', 'selection'),
  method: text,
  language: text,
  groups: list(shape({ heading: text, share: text, sentences: list(sentence) })),
  shares: list(shape({ heading: text, documentShare: share, summaryShare: share, label: text })),
  figures: shape({ words: text, reading: text, sections: text, sentences: text }),
  notices: list(text),
  changed: whole,
  leftOut: list(text),
  keyPhrases: list(text),
  focus: text,
});
const link = shape({ label: text, target: whole });
const check = shape({
  id: whole,
  documentName: text,
  stale: flag,
  headline: text,
  items: list(shape({ severity: oneOf('ok', 'warning', 'information'), text, target: nullable(whole), links: list(link) })),
});
const digest = shape({
  id: whole,
  headline: text,
  documents: list(
    shape({
      file: text,
      figures: text,
      sections: list(shape({ heading: text, lines: list(shape({ text, line: text, target: whole, alsoIn: list(link) })) })),
    }),
  ),
  notices: list(text),
});
const controls = shape({
  length: text,
  method: text,
  methods: list(shape({ value: text, label: text, detail: text })),
  balance: flag,
  live: flag,
  focus: text,
  recentFocuses: list(text),
});
const progress = shape({ task: oneOf('summarize', 'checkAbstract'), stage: oneOf('waiting', 'reading', 'ranking', 'checking', 'checkingAbstract'), label: text, stages: list(text) });
const panelText = shape(Object.fromEntries(Object.keys(PANEL_TEXT).map((key) => [key, text])));

const MESSAGES: Record<ToPanel['type'], Check> = {
  summary: shape({ type: text, summary }),
  controls: shape({ type: text, controls }),
  text: shape({ type: text, text: panelText }),
  progress: shape({ type: text, progress: nullable(progress) }),
  notice: shape({ type: text, kind: oneOf('info', 'stale', 'tooLarge', 'error'), text }),
  abstractCheck: shape({ type: text, check: nullable(check) }),
  digest: shape({ type: text, digest: nullable(digest) }),
  announce: shape({ type: text, text }),
  focus: shape({ type: text }),
  clear: shape({ type: text }),
};

export function isToPanel(raw: unknown): raw is ToPanel {
  if (!isRecord(raw) || typeof raw['type'] !== 'string' || !Object.prototype.hasOwnProperty.call(MESSAGES, raw['type'])) return false;
  try {
    return MESSAGES[raw['type'] as ToPanel['type']](raw);
  } catch {
    return false;
  }
}
