/**
 * Shared checks for reading model files (naive Bayes and maximum entropy): plain JSON records,
 * own properties only, no unknown keys, and short descriptions of bad values for messages.
 */

export class ModelError extends Error {
  override readonly name = 'ModelError';
}

/** A plain JSON object (as JSON.parse makes them), not an array, a class instance or a null-prototype trick. */
export function isRecord(value: unknown): value is Record<string, unknown> {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) return false;
  const prototype: unknown = Object.getPrototypeOf(value);
  return prototype === Object.prototype || prototype === null;
}

/** The record's own property `key` (never one inherited from Object.prototype), or undefined. */
export function own(record: Record<string, unknown>, key: string): unknown {
  return Object.hasOwn(record, key) ? record[key] : undefined;
}

/** Refuses keys outside `allowed`, naming the first one. */
export function onlyKeys(record: Record<string, unknown>, allowed: ReadonlySet<string>, where: string): void {
  const unknown = Object.keys(record).find((key) => !allowed.has(key));
  if (unknown !== undefined) throw new ModelError(`${where} has an unknown field ${JSON.stringify(unknown)} (expected ${[...allowed].join(', ')})`);
}

export function describeValue(value: unknown): string {
  return typeof value === 'number' || typeof value === 'boolean' || value === null ? String(value) : typeof value === 'string' ? JSON.stringify(value.slice(0, 40)) : typeof value;
}

/** The part every model file shares: a plain object of our format and version (the kind is each reader's). */
export function checkModelHeader(json: unknown, format: string, version: number): asserts json is Record<string, unknown> {
  if (!isRecord(json)) throw new ModelError('a model file must hold a JSON object');
  if (own(json, 'format') !== format) throw new ModelError(`not a sentence model: "format" must be "${format}"`);
  const found = own(json, 'version');
  if (found !== version) throw new ModelError(`model version ${describeValue(found)} is not supported (expected ${version})`);
}
