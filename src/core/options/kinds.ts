/**
 * Kinds of option value. Each kind knows how to check a value that arrives as data (editor
 * settings, JSON, webview messages) and as text (command-line flags), and says why when it cannot
 * take it. Nothing here clamps or falls back: an invalid value is reported, never replaced.
 */

export type Checked<T> = { readonly ok: true; readonly value: T } | { readonly ok: false; readonly reason: string };

export const accept = <T>(value: T): Checked<T> => ({ ok: true, value });
export const reject = <T>(reason: string): Checked<T> => ({ ok: false, reason });

/** One allowed value of a choice, with what it means in people's words. */
export interface Choice<V extends string = string> {
  readonly value: V;
  readonly description: string;
}

/** The JSON-schema shape of an option, for `contributes.configuration` in package.json. */
export interface JsonShape {
  readonly type: 'string' | 'integer' | 'number' | 'boolean' | 'array';
  readonly minimum?: number;
  readonly maximum?: number;
  readonly enum?: readonly string[];
  readonly enumDescriptions?: readonly string[];
  readonly pattern?: string;
  readonly patternErrorMessage?: string;
  readonly items?: { readonly type: 'string'; readonly maxLength: number };
  readonly maxItems?: number;
  readonly maxLength?: number;
}

export interface ValueKind<T> {
  /** How people write it, for help texts: "a whole number from 1 to 6". */
  readonly expects: string;
  readonly json: JsonShape;
  check(value: unknown): Checked<T>;
  fromText(text: string): Checked<T>;
  /** The value as a person types it (help texts, settings defaults). */
  toText(value: T): string;
}

const WHOLE_NUMBER = /^[+-]?\d+$/;
const DECIMAL = /^[+-]?(?:\d+\.?\d*|\.\d+)$/;

export function integerKind(min: number, max: number): ValueKind<number> {
  const expects = `a whole number from ${min.toLocaleString('en')} to ${max.toLocaleString('en')}`;
  const check = (value: unknown): Checked<number> => {
    if (typeof value !== 'number' || !Number.isInteger(value)) return reject(`expected ${expects}, got ${describe(value)}`);
    if (value < min || value > max) return reject(`${value} is outside ${min}..${max}`);
    return accept(value);
  };
  return {
    expects,
    json: { type: 'integer', minimum: min, maximum: max },
    check,
    // Decimal digits only: "0x5", "1e2" and "5.0" are not what a person means by a count.
    fromText: (text) => (WHOLE_NUMBER.test(text.trim()) ? check(Number(text.trim())) : reject(`expected ${expects}, got "${text}"`)),
    toText: String,
  };
}

export function numberKind(min: number, max: number): ValueKind<number> {
  const expects = `a number from ${min} to ${max}`;
  const check = (value: unknown): Checked<number> => {
    if (typeof value !== 'number' || !Number.isFinite(value)) return reject(`expected ${expects}, got ${describe(value)}`);
    if (value < min || value > max) return reject(`${value} is outside ${min}..${max}`);
    return accept(value);
  };
  return {
    expects,
    json: { type: 'number', minimum: min, maximum: max },
    check,
    fromText: (text) => (DECIMAL.test(text.trim()) ? check(Number(text.trim())) : reject(`expected ${expects}, got "${text}"`)),
    toText: String,
  };
}

export const booleanKind: ValueKind<boolean> = {
  expects: 'true or false',
  json: { type: 'boolean' },
  check: (value) => (typeof value === 'boolean' ? accept(value) : reject(`expected true or false, got ${describe(value)}`)),
  fromText: (text) => (text === 'true' ? accept(true) : text === 'false' ? accept(false) : reject(`expected true or false, got "${text}"`)),
  toText: String,
};

export function choiceKind<V extends string>(choices: readonly Choice<V>[]): ValueKind<V> {
  const values = choices.map((c) => c.value);
  const expects = `one of ${values.join(', ')}`;
  const check = (value: unknown): Checked<V> =>
    typeof value === 'string' && (values as readonly string[]).includes(value) ? accept(value as V) : reject(`expected ${expects}, got ${describe(value)}`);
  return {
    expects,
    json: { type: 'string', enum: values, enumDescriptions: choices.map((c) => c.description) },
    check,
    fromText: check,
    toText: String,
  };
}

/**
 * A list of plain words or phrases, never patterns: nothing from settings is compiled to a RegExp.
 * Entries are trimmed; empty entries and repeats are dropped.
 */
export function wordListKind(maxItems: number, maxLength: number): ValueKind<readonly string[]> {
  const expects = `a list of at most ${maxItems} words or phrases of at most ${maxLength} characters`;
  const check = (value: unknown): Checked<readonly string[]> => {
    if (!Array.isArray(value)) return reject(`expected ${expects}, got ${describe(value)}`);
    const words: string[] = [];
    for (const item of value) {
      if (typeof item !== 'string') return reject(`every entry must be text, got ${describe(item)}`);
      const word = item.trim();
      if (word.length > maxLength) return reject(`"${word.slice(0, 40)}…" is longer than ${maxLength} characters`);
      if (word.length > 0 && !words.includes(word)) words.push(word);
    }
    if (words.length > maxItems) return reject(`has ${words.length} entries, more than ${maxItems}`);
    return accept(words);
  };
  return {
    expects,
    json: { type: 'array', items: { type: 'string', maxLength }, maxItems },
    check,
    // On the command line a list flag is repeated; each occurrence is one entry.
    fromText: (text) => check([text]),
    toText: (value) => value.join(', '),
  };
}

export function textKind(maxLength: number): ValueKind<string> {
  const expects = `text of at most ${maxLength} characters`;
  const check = (value: unknown): Checked<string> =>
    typeof value !== 'string' ? reject(`expected ${expects}, got ${describe(value)}`) : value.length > maxLength ? reject(`is longer than ${maxLength} characters`) : accept(value.trim());
  return { expects, json: { type: 'string', maxLength }, check, fromText: check, toText: String };
}

/** A short, safe description of a value for messages (never the whole of a long string). */
export function describe(value: unknown): string {
  if (value === undefined) return 'nothing';
  if (value === null) return 'null';
  if (typeof value === 'string') return JSON.stringify(value.length > 40 ? value.slice(0, 40) + '…' : value);
  if (typeof value === 'number' || typeof value === 'boolean') return String(value);
  if (Array.isArray(value)) return 'a list';
  return `a ${typeof value}`;
}
