/**
 * Identifiers: code spans (`x` in Markdown, ``x`` in reStructuredText), command-line options
 * (--flag), file names (config.toml), paths (std::mem::swap), calls (spawn()) and snake_case names,
 * read from the sentence's source so code formatting is seen.
 *
 * A finding is either
 *   - a swap: neither the body sentence closest to the claim's other words (the frame), nor the
 *     support, nor the next closest sentences name the claim's identifier, and the frame names
 *     another of the same kind (code spans only when both name one thing, not a snippet with
 *     spaces: on the train half snippets raised 22 of 40 identifier false alarms and 6 catches);
 *     a path counts as named by its last segment too (`std::fmt::Debug` is often written `Debug`). An identifier of another kind in the same place (the same word
 *     before or after it) was tried as a swap too: on the train half it caught no changed
 *     identifier and raised four false alarms, so it is not used; or
 *   - an absence: the body never mentions an option or a file name the claim names (compared
 *     without case); other names are too often written differently (`Foo::bar` / `bar`) to judge.
 * Code spans after a reStructuredText role (:ref:`x`) are cross-references, not identifiers.
 */
import type { Detector, Evidence, RawFinding } from './detector';

export type IdentifierKind = 'code' | 'option' | 'file' | 'path' | 'call' | 'name';

export interface Identifier {
  readonly kind: IdentifierKind;
  /** As written, without the backticks. */
  readonly text: string;
  /** Lower case, trailing "()" and "!" removed: how identifiers are compared. */
  readonly key: string;
}

/** A code span; its content neither starts nor ends with a space, so the text between two spans is never taken for one. */
export const CODE_SPAN = /(`{1,2})([^`\s](?:[^`\n]{0,78}[^`\s])?)\1(?!_)/gu;
const PATTERNS: readonly (readonly [IdentifierKind, RegExp])[] = [
  ['option', /(?<![\w-])--[a-z][a-z0-9-]+/gu],
  ['file', /(?<![\w/.-])[\w-]+\.(?:rs|toml|md|json|ya?ml|py|js|ts|c|h|cfg|conf|ini|txt|lock|sh|rst)\b/gu],
  ['path', /(?<![\w:])[A-Za-z_]\w*(?:::[A-Za-z_]\w*)+/gu],
  ['call', /(?<![\w.])[A-Za-z_]\w*\(\)/gu],
  ['name', /(?<![\w-])[a-z][a-z0-9]*(?:_[a-z0-9]+)+(?![\w-])/gu],
];

export function identifierKey(text: string): string {
  return text.trim().replace(/(?:\(\)|!)+$/u, '').toLowerCase();
}

export function identifiersIn(source: string): Identifier[] {
  const found: (Identifier & { start: number })[] = [];
  const covered: [number, number][] = [];
  const add = (kind: IdentifierKind, text: string, start: number) => {
    const key = identifierKey(text);
    if (key.length < 2 || /^[\d.,%\s]+$/u.test(key)) return;
    found.push({ kind, text, key, start });
  };
  for (const m of source.matchAll(CODE_SPAN)) {
    if (source[m.index - 1] === ':') continue;
    const start = m.index + m[1]!.length;
    add('code', m[2]!, start);
    covered.push([m.index, m.index + m[0].length]);
  }
  for (const [kind, pattern] of PATTERNS) {
    for (const m of source.matchAll(pattern)) {
      const inside = covered.some(([s, e]) => m.index < e && m.index + m[0].length > s);
      if (inside) continue;
      add(kind, m[0], m.index);
      covered.push([m.index, m.index + m[0].length]);
    }
  }
  return found.sort((a, b) => a.start - b.start).map(({ start: _start, ...rest }) => rest);
}

const cache = new WeakMap<Evidence, Identifier[]>();
function identifiersOf(e: Evidence): Identifier[] {
  let found = cache.get(e);
  if (!found) cache.set(e, (found = identifiersIn(e.source)));
  return found;
}

/** Whether a source names the identifier: as written, or a path by its last segment (of 3 characters or more). */
function namedIn(lowerSource: string, identifier: Identifier): boolean {
  if (mentions(lowerSource, identifier.key)) return true;
  if (!identifier.key.includes('::')) return false;
  const last = identifier.key.split('::').filter((part) => /\w/u.test(part)).at(-1)?.replace(/\W+$/u, '') ?? '';
  return last.length >= 3 && mentions(lowerSource, last);
}

/** Whether a source mentions an identifier (compared without case, on word boundaries). */
function mentions(lowerSource: string, key: string): boolean {
  let at = lowerSource.indexOf(key);
  while (at >= 0) {
    const before = lowerSource[at - 1];
    const after = lowerSource[at + key.length];
    if (!(before && /[\w]/u.test(before) && /^\w/u.test(key)) && !(after && /[\w]/u.test(after) && /\w$/u.test(key))) return true;
    at = lowerSource.indexOf(key, at + 1);
  }
  return false;
}

/**
 * A code span that names one thing (`Copy`, `std::fmt`, `ptr.offset`), not a snippet of code with
 * spaces in it (`a == b == c`, `loop { ... }`): snippets are written many ways, so one in the body
 * that differs from the abstract's is no sign of a swapped name.
 */
function nameLike(identifier: Identifier): boolean {
  return identifier.kind !== 'code' || !/\s/u.test(identifier.text);
}

/** Pool sentences read for the claim's identifier besides the frame and the support. */
const IDENTIFIER_POOL = 3;

export const checkIdentifiers: Detector = (input) => {
  const findings: RawFinding[] = [];
  const claimed = identifiersIn(input.claimSource);
  const claimKeys = new Set(claimed.map((i) => i.key));
  for (const identifier of claimed) {
    const frame = input.frame;
    const near = [...new Set([frame, ...input.support, ...input.pool.slice(0, IDENTIFIER_POOL)].filter((e): e is Evidence => e != null))];
    const named = near.some((e) => namedIn(e.source.toLowerCase(), identifier));
    if (frame && !named) {
      // The sentence closest to the claim's other words names another identifier of the kind: a swap.
      const swap = nameLike(identifier) ? identifiersOf(frame).find((other) => other.kind === identifier.kind && nameLike(other) && !claimKeys.has(other.key) && !other.key.includes(identifier.key) && !identifier.key.includes(other.key)) : undefined;
      if (swap) {
        findings.push({ kind: 'identifier', abstractSays: identifier.text, bodySays: swap.text, evidence: frame });
        continue;
      }
    }
    // Absence is judged only for options and file names: other names are often spelled differently.
    if ((identifier.kind === 'option' || identifier.kind === 'file') && !input.body.lowerSource.includes(identifier.key)) {
      findings.push({ kind: 'identifier', abstractSays: identifier.text, bodySays: null, evidence: null, note: `the body never mentions ${identifier.text}` });
    }
  }
  return findings;
};
