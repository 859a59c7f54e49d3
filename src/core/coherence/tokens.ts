/**
 * A tiny tokenizer for the stand-alone checks: words and punctuation with their offsets in the
 * sentence text, lower-cased forms with contractions split off ("it's" → "it" + implied "is").
 */

// Hoisted: the bundler turns a \p{…} literal into `new RegExp(…)`, which inside a function runs at every call.
const STARTS_WITH_LETTER = /^\p{L}/u;

export interface Token {
  /** As written. */
  readonly text: string;
  /** Lower-cased, curly apostrophe straightened, contraction suffix removed ("it's" → "it"). */
  readonly lower: string;
  /** 'word' for letters (and numbers), 'punct' for one punctuation character. */
  readonly kind: 'word' | 'number' | 'punct';
  /** Offsets into the sentence text, half-open. */
  readonly start: number;
  readonly end: number;
  /** Set for "it's", "that's"...: the verb the contraction stands for. */
  readonly contracted?: 'is' | 'are' | 'have' | 'will' | 'would' | 'not';
}

const TOKEN = /[\p{L}][\p{L}\p{M}'’\-]*|\d+(?:[.,:]\d+)*%?|[^\s\p{L}\d]/gu;
const CONTRACTION = /^(.+?)'(s|re|ve|ll|d|t)$/;

const CONTRACTED: Readonly<Record<string, Token['contracted']>> = {
  s: 'is',
  re: 'are',
  ve: 'have',
  ll: 'will',
  d: 'would',
  t: 'not',
};

export function tokenize(text: string): Token[] {
  const tokens: Token[] = [];
  for (const match of text.matchAll(TOKEN)) {
    const raw = match[0];
    const start = match.index;
    const end = start + raw.length;
    if (/^\d/.test(raw)) {
      tokens.push({ text: raw, lower: raw, kind: 'number', start, end });
    } else if (STARTS_WITH_LETTER.test(raw)) {
      const straight = raw.toLowerCase().replace(/’/g, "'");
      const contraction = CONTRACTION.exec(straight);
      // "isn't" keeps its stem as "is" with a "not"; possessive "'s" on nouns is harmless here.
      if (contraction) {
        const stem = contraction[2] === 't' && contraction[1]!.endsWith('n') ? contraction[1]!.slice(0, -1) : contraction[1]!;
        tokens.push({ text: raw, lower: stem, kind: 'word', start, end, contracted: CONTRACTED[contraction[2]!] });
      } else {
        tokens.push({ text: raw, lower: straight, kind: 'word', start, end });
      }
    } else {
      tokens.push({ text: raw, lower: raw, kind: 'punct', start, end });
    }
  }
  return tokens;
}

export function isWord(token: Token | undefined): token is Token {
  return token !== undefined && token.kind !== 'punct';
}

/** Punctuation that closes a clause or a sentence. */
export function isClauseBreak(token: Token | undefined): boolean {
  return token !== undefined && token.kind === 'punct' && /[,;:.!?)\]—–]/.test(token.text);
}

/** True when nothing but closing punctuation follows `index`. */
export function atSentenceEnd(tokens: readonly Token[], index: number): boolean {
  for (let i = index + 1; i < tokens.length; i++) {
    if (tokens[i]!.kind !== 'punct' || !/[.!?"'’”)\]]/.test(tokens[i]!.text)) return false;
  }
  return true;
}

/** Index of the next word token at or after `from`, or -1. */
export function nextWord(tokens: readonly Token[], from: number): number {
  for (let i = from; i < tokens.length; i++) if (isWord(tokens[i])) return i;
  return -1;
}

/** Index of the previous word token before `from` (exclusive), or -1. */
export function previousWord(tokens: readonly Token[], from: number): number {
  for (let i = from - 1; i >= 0; i--) if (isWord(tokens[i])) return i;
  return -1;
}
