/** Identifiers shared by package.json's `contributes` and the code (a unit test keeps them in step). */
export const VIEW_CONTAINER_ID = 'tersely';
export const VIEW_ID = 'tersely.summaryView';
export const OUTPUT_CHANNEL = 'Tersely';
export const DIAGNOSTIC_SOURCE = 'Tersely';
export const STAND_ALONE_CODE = 'stand-alone';
export const ABSTRACT_CODE = 'abstract-check';

export const CONTEXT_KEYS = {
  hasSummary: 'tersely.hasSummary',
  liveMode: 'tersely.liveMode',
} as const;

export const COLOR_IDS = {
  pickedUnderline: 'tersely.pickedSentenceUnderline',
  pickedBar: 'tersely.pickedSentenceBar',
  noteMark: 'tersely.noteMark',
  pickedRuler: 'tersely.pickedSentenceOverviewRuler',
  documentShareBar: 'tersely.documentShareBar',
  summaryShareBar: 'tersely.summaryShareBar',
} as const;

/** Every contributed command; commands.ts maps each to its handler (the compiler checks none is missing). */
export const COMMAND_IDS = [
  'tersely.summarizeDocument',
  'tersely.summarizeSelection',
  'tersely.summarizeWithFocus',
  'tersely.insertSummary',
  'tersely.copySummary',
  'tersely.clearHighlights',
  'tersely.toggleLive',
  'tersely.checkAbstract',
  'tersely.digestOpenDocuments',
  'tersely.digestFiles',
  'tersely.showPanel',
  'tersely.applyRepair',
] as const;

export type CommandId = (typeof COMMAND_IDS)[number];
