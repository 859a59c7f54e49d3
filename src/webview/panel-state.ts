/**
 * What the panel keeps in the webview's saved state: only what restoring needs (scroll position,
 * open parts, the summary id), never document text; the extension sends the content again on
 * `ready`. Pure, so the limits are tested under Node.
 */
export interface SavedState {
  readonly scrollY: number;
  readonly open: readonly string[];
  readonly summaryId: number | null;
}

/** Bounds on what is read back (a saved state is data from an earlier run, checked like any input). */
export const SAVED_STATE_LIMITS = { parts: 200, partName: 100 } as const;

export function restoreState(raw: unknown): SavedState {
  const state = typeof raw === 'object' && raw !== null ? (raw as Record<string, unknown>) : {};
  const scrollY = typeof state['scrollY'] === 'number' && Number.isFinite(state['scrollY']) && state['scrollY'] >= 0 ? state['scrollY'] : 0;
  const openParts = Array.isArray(state['open'])
    ? state['open'].filter((v): v is string => typeof v === 'string' && v.length < SAVED_STATE_LIMITS.partName).slice(0, SAVED_STATE_LIMITS.parts)
    : [];
  const summaryId = typeof state['summaryId'] === 'number' && Number.isInteger(state['summaryId']) ? state['summaryId'] : null;
  return { scrollY, open: openParts, summaryId };
}

/** The state to save: exactly these three fields, whatever else the panel holds. */
export function stateToSave(scrollY: number, open: Iterable<string>, summaryId: number | null): SavedState {
  return restoreState({ scrollY, open: [...open], summaryId });
}
