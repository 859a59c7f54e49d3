/**
 * GFM autolink literals in a run of text: `www.` links, `http://` and `https://` links and email
 * addresses written without angle brackets (GFM spec 0.29, Autolinks (extension), from memory):
 *
 * - a link starts at the beginning of the text, after whitespace, or after `*`, `_`, `~` or `(`;
 * - `www.` and the scheme are followed by a valid domain: segments of letters, digits, `_` and
 *   `-` separated by periods, at least one period, no `_` in the last two segments; then any
 *   characters up to whitespace or `<`;
 * - trailing `?`, `!`, `.`, `,`, `:`, `*`, `_`, `~` are not part of the link, nor are unmatched
 *   closing parentheses at its end, nor a final `&name;` that looks like an entity reference;
 * - an email address is local-part characters (letters, digits, `.`, `-`, `_`, `+`), `@`, and a
 *   domain of letters, digits, `-` and `_` with at least one period, not ending in `-` or `_`.
 *
 * markdown-it does not read these (its linkify option follows other rules). They matter to this
 * reader because a paragraph or list made only of links is not prose (parse/boilerplate.ts).
 */

export interface LiteralLink {
  /** Range in the text, `[start, end)`. */
  readonly start: number;
  readonly end: number;
  readonly url: string;
}

const CANDIDATE = /www\.|https?:\/\/|@/i;
const PREFIX = /(?:www\.|https?:\/\/)/iy;
const DOMAIN_UNIT = /[\p{L}\p{N}_-]/u;
const LOCAL_UNIT = /[A-Za-z0-9.+_-]/;
const EMAIL_DOMAIN_UNIT = /[A-Za-z0-9_-]/;
const TRAILING_PUNCTUATION = '?!.,:*_~';
const ENTITY_AT_END = /&[A-Za-z0-9]+;$/;

/**
 * Links in `text`, in order. `startsAtBoundary`: whether a link may start at offset 0 (the text
 * begins a line or follows `*`, `_`, `~` markup), as the character before it is not in `text`.
 */
export function findAutolinkLiterals(text: string, startsAtBoundary: boolean): LiteralLink[] {
  if (!CANDIDATE.test(text)) return [];
  const links: LiteralLink[] = [];
  let i = 0;
  while (i < text.length) {
    const link = linkAt(text, i, startsAtBoundary) ?? emailAt(text, i);
    if (link !== null && (links.length === 0 || link.start >= links[links.length - 1]!.end)) {
      links.push(link);
      i = link.end;
    } else {
      i++;
    }
  }
  return links;
}

function mayStartAt(text: string, i: number, startsAtBoundary: boolean): boolean {
  if (i === 0) return startsAtBoundary;
  const before = text[i - 1]!;
  return /\s/.test(before) || '*_~('.includes(before);
}

function linkAt(text: string, i: number, startsAtBoundary: boolean): LiteralLink | null {
  PREFIX.lastIndex = i;
  const prefix = PREFIX.exec(text);
  if (prefix === null || !mayStartAt(text, i, startsAtBoundary)) return null;
  const domainStart = i + prefix[0].length;
  let domainEnd = domainStart;
  while (domainEnd < text.length && (text[domainEnd] === '.' || DOMAIN_UNIT.test(text[domainEnd]!))) domainEnd++;
  let end = domainEnd;
  while (end < text.length && !/\s/.test(text[end]!) && text[end] !== '<') end++;
  end = trimTrailing(text, i, end);
  const isWww = prefix[0].toLowerCase() === 'www.';
  // For `www.` links the `www` is the domain's first segment.
  if (!isValidDomain(text.slice(isWww ? i : domainStart, Math.min(domainEnd, end)))) return null;
  const literal = text.slice(i, end);
  return { start: i, end, url: isWww ? `http://${literal}` : literal };
}

function isValidDomain(domain: string): boolean {
  const segments = domain.split('.');
  while (segments.length > 0 && segments[segments.length - 1] === '') segments.pop();
  if (segments.length < 2 || segments.some((segment) => segment.length === 0)) return false;
  return !segments.slice(-2).some((segment) => segment.includes('_'));
}

/** Drops trailing punctuation, unmatched closing parentheses and an entity-like `&name;` from `[start, end)`. */
function trimTrailing(text: string, start: number, end: number): number {
  for (;;) {
    const last = text[end - 1];
    if (end <= start || last === undefined) return end;
    if (TRAILING_PUNCTUATION.includes(last)) {
      end--;
    } else if (last === ')' && count(text, start, end, ')') > count(text, start, end, '(')) {
      end--;
    } else if (last === ';') {
      const entity = ENTITY_AT_END.exec(text.slice(start, end));
      if (entity === null) return end;
      end -= entity[0].length;
    } else {
      return end;
    }
  }
}

function count(text: string, start: number, end: number, unit: string): number {
  let n = 0;
  for (let p = start; p < end; p++) if (text[p] === unit) n++;
  return n;
}

function emailAt(text: string, i: number): LiteralLink | null {
  if (!LOCAL_UNIT.test(text[i]!) || (i > 0 && LOCAL_UNIT.test(text[i - 1]!))) return null;
  let at = i;
  while (at < text.length && LOCAL_UNIT.test(text[at]!)) at++;
  if (at === i || text[at] !== '@') return null;
  let end = at + 1;
  let periods = 0;
  while (end < text.length) {
    if (EMAIL_DOMAIN_UNIT.test(text[end]!)) end++;
    else if (text[end] === '.' && end + 1 < text.length && EMAIL_DOMAIN_UNIT.test(text[end + 1]!)) {
      periods++;
      end++;
    } else break;
  }
  if (end === at + 1 || periods === 0 || /[-_]/.test(text[end - 1]!)) return null;
  const literal = text.slice(i, end);
  return { start: i, end, url: `mailto:${literal}` };
}
