/** Moving a summary's places when text is inserted before or inside them (Insert Summary's own edit). Pure. */

/** Every span at or after `offset` moves by `delta` (a span around it grows): the summary follows an insert. */
export function shiftSpans<T>(value: T, offset: number, delta: number): T {
  if (Array.isArray(value)) return value.map((item) => shiftSpans(item, offset, delta)) as T;
  if (typeof value !== 'object' || value === null) return value;
  const record = value as Record<string, unknown>;
  if (typeof record['start'] === 'number' && typeof record['end'] === 'number' && Object.keys(record).length === 2) {
    const start = record['start'] as number;
    const end = record['end'] as number;
    return { start: start >= offset ? start + delta : start, end: end > offset || (end === offset && start >= offset) ? end + delta : end } as T;
  }
  return Object.fromEntries(Object.entries(record).map(([key, item]) => [key, shiftSpans(item, offset, delta)])) as T;
}
