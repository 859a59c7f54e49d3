/**
 * The focus the panel summarizes towards, and the few focuses used lately (kept per workspace).
 * The list logic is pure so it is tested under Node; the Memento is the editor's workspace state.
 */
import { SUMMARY_OPTIONS } from '../core/index';

/** How many recent focuses the panel offers (ours: a short menu, not a history). */
export const RECENT_FOCUS_LIMIT = 5;
const STATE_KEY = 'tersely.recentFocuses';

/** The schema's bound for a focus (options/schema.ts: `focus`). */
export const FOCUS_MAX_LENGTH = SUMMARY_OPTIONS.focus.kind.json.maxLength ?? 0;

/** The focus as the engine will take it: spaces collapsed, at most the schema's length. */
export function cleanFocus(raw: string): string {
  return raw.replace(/\s+/g, ' ').trim().slice(0, FOCUS_MAX_LENGTH);
}

/** `focus` first, without repeats (case-insensitive), at most `limit` entries; an empty focus changes nothing. */
export function withRecent(recent: readonly string[], focus: string, limit = RECENT_FOCUS_LIMIT): string[] {
  if (focus === '') return [...recent].slice(0, limit);
  const key = focus.toLowerCase();
  return [focus, ...recent.filter((entry) => entry.toLowerCase() !== key)].slice(0, limit);
}

interface Memento {
  get<T>(key: string, defaultValue: T): T;
  update(key: string, value: unknown): Thenable<void> | Promise<void>;
}

export class FocusState {
  /** The focus of the next summaries; empty = a general summary. Not persisted: a new session starts general. */
  current = '';
  private recentList: string[];

  constructor(private readonly memento: Memento) {
    const stored = memento.get<unknown>(STATE_KEY, []);
    this.recentList = Array.isArray(stored) ? stored.filter((v): v is string => typeof v === 'string').map(cleanFocus).filter(Boolean).slice(0, RECENT_FOCUS_LIMIT) : [];
  }

  get recent(): readonly string[] {
    return this.recentList;
  }

  async set(raw: string): Promise<string> {
    this.current = cleanFocus(raw);
    this.recentList = withRecent(this.recentList, this.current);
    await this.memento.update(STATE_KEY, this.recentList);
    return this.current;
  }
}
