/**
 * The punctuation scanner behind splitSentences: one forward scan looks at each terminal
 * punctuation mark once and decides from its neighbours only (the word before, the punctuation
 * run, closing quotes or brackets, the word after), so the cost is linear in the text length.
 * Line breaks ('\n') always cut; inline list markers and bullets cut before the item.
 */

import { abbreviationKind, isSentenceStarter } from './abbreviations';
import {
  ELLIPSIS,
  PERIOD,
  isAlphanumericAt,
  isBullet,
  isCloser,
  isIdeographicTerminator,
  isLineBreakCode,
  isOpener,
  isSpaceCode,
  isStrongTerminator,
  letterCaseAt,
  lettersAt,
  SCAN_STOPS_SOURCE,
  type LetterCase,
} from './characters';
import { inlineListCuts } from './inline-lists';

/** A run of terminal punctuation such as ".", "?!", "...", ". . . ." or "…". */
interface TerminalRun {
  readonly end: number;
  readonly dots: number;
  /** Holds '?', '!' or '‽'. */
  readonly strong: boolean;
  /** Holds a full stop of a script written without spaces. */
  readonly ideographic: boolean;
  /** Dots separated by spaces (". . ."). */
  readonly spaced: boolean;
}

/** What follows a terminal run and its closing quotes/brackets, across whitespace and openers. */
interface NextWord {
  readonly kind: LetterCase | 'end';
  /** Letters of the next word (at most 32), '' when it does not start with a letter. */
  readonly word: string;
  /** The next word is directly followed by a period ("Mr."). */
  readonly dotted: boolean;
}

const MAX_ABBREVIATION_LENGTH = 64;
const MAX_NOTE_MARKER_LENGTH = 10;
const MULTI_PERIOD_ABBREVIATION = /^(?:\p{L}{1,2}\.)+\p{L}{1,2}$/u;
const LIST_LABEL = /^(?:\d{1,3}|\p{L})$/u;
const UPPERCASE_ONLY = /^[^\p{Ll}]+$/u;
const CAPITALISED_WORD = /^\p{Lu}\p{Ll}+$/u;
/** A word with no capital, possibly ending in digits ("world", "1,000"). */
const PLAIN_LOWER_WORD = /^[\p{Ll}\p{N},]+$/u;

export class BoundaryScanner {
  private readonly text: string;
  private readonly found: number[] = [];
  /** First non-space offset of the sentence being read. */
  private sentenceStart: number;
  /** The whitespace-delimited token last looked at, cached so each token is scanned once. */
  private tokenStart = -1;
  private tokenEnd = -1;
  private tokenIsAddress = false;

  constructor(text: string) {
    this.text = text;
    this.sentenceStart = this.skipSpaces(0);
  }

  cuts(): number[] {
    const { text } = this;
    const listCuts = inlineListCuts(text);
    let nextListCut = 0;
    const stops = new RegExp(SCAN_STOPS_SOURCE, 'g');
    let i = 0;
    for (;;) {
      stops.lastIndex = i;
      const stop = stops.exec(text);
      const at = stop === null ? text.length : stop.index;
      // Item cuts sit on the space before a marker, never on a stop character.
      while (nextListCut < listCuts.length && (listCuts[nextListCut] ?? 0) <= at) {
        this.cut(listCuts[nextListCut] ?? 0);
        nextListCut++;
      }
      if (stop === null) break;
      i = this.stopAt(at);
    }
    return this.found;
  }

  /** Handles the stop character at `index`; returns where scanning resumes. */
  private stopAt(index: number): number {
    const { text } = this;
    const ch = text.charAt(index);
    if (isLineBreakCode(text.charCodeAt(index))) {
      this.cut(index);
      return index + 1;
    }
    if (isBullet(ch)) {
      if (index > this.sentenceStart && isSpaceCode(text.charCodeAt(index - 1))) this.cut(index);
      return index + 1;
    }
    return this.terminalRun(index);
  }

  private cut(at: number): void {
    const last = this.found[this.found.length - 1];
    if (last !== undefined && at <= last) return;
    this.found.push(at);
    this.sentenceStart = this.skipSpaces(at);
  }

  /** Handles the punctuation run starting at `start`; returns where scanning resumes. */
  private terminalRun(start: number): number {
    const { text } = this;
    const run = this.readRun(start);
    let afterClosers = this.skipClosers(run.end);
    const afterNote = this.skipNoteMarker(afterClosers);
    if (afterNote > afterClosers) afterClosers = this.skipClosers(afterNote);

    if (run.ideographic) {
      this.cut(afterClosers);
      return afterClosers;
    }
    if (afterClosers >= text.length) return afterClosers;
    if (!isSpaceCode(text.charCodeAt(afterClosers))) {
      // "world.Today" — no space, but still a boundary in run-together text.
      if (afterClosers === start + 1 && run.dots === 1 && this.isRunTogetherBoundary(start)) {
        this.cut(start + 1);
      }
      return afterClosers;
    }
    const next = this.nextWord(afterClosers);
    const cutAt = this.decide(start, run, afterClosers, next);
    if (cutAt !== null) this.cut(cutAt);
    return afterClosers;
  }

  private readRun(start: number): TerminalRun {
    const { text } = this;
    let i = start;
    let dots = 0;
    let strong = false;
    let ideographic = false;
    let spaced = false;
    for (;;) {
      const ch = text.charAt(i);
      if (ch === PERIOD) dots++;
      else if (ch === ELLIPSIS) dots += 3;
      else if (isStrongTerminator(ch)) strong = true;
      else if (isIdeographicTerminator(ch)) ideographic = true;
      else if (ch === ' ' && text.charAt(i - 1) === PERIOD && this.continuesSpacedDots(i + 1)) spaced = true;
      else break;
      i++;
    }
    return { end: i, dots, strong, ideographic, spaced };
  }

  /** A dot at `index` that is one more dot of ". . ." rather than the start of ".NET". */
  private continuesSpacedDots(index: number): boolean {
    const { text } = this;
    if (text.charAt(index) !== PERIOD) return false;
    const after = text.charAt(index + 1);
    return after === '' || after === PERIOD || after === ' ' || isCloser(after) || isSpaceCode(after.charCodeAt(0));
  }

  private nextWord(from: number): NextWord {
    const { text } = this;
    let i = from;
    while (i < text.length && isSpaceCode(text.charCodeAt(i))) {
      if (isLineBreakCode(text.charCodeAt(i))) return { kind: 'end', word: '', dotted: false };
      i++;
    }
    while (i < text.length && isOpener(text.charAt(i))) i++;
    if (i >= text.length) return { kind: 'end', word: '', dotted: false };
    const word = lettersAt(text, i);
    return { kind: letterCaseAt(text, i), word, dotted: text.charAt(i + word.length) === PERIOD };
  }

  /** Where the sentence ends for a run followed by whitespace, or null when it goes on. */
  private decide(start: number, run: TerminalRun, afterClosers: number, next: NextWord): number | null {
    const { text } = this;
    if (next.kind === 'end') return null;
    if (run.strong) return next.kind === 'lower' ? null : afterClosers;

    // "[...]" and "(...)" mark an omission inside a quotation.
    if (run.dots >= 2 && '[('.includes(text.charAt(start - 1) || ' ') && '])'.includes(text.charAt(run.end) || ' ')) {
      return null;
    }
    const attached = start > 0 && !isSpaceCode(text.charCodeAt(start - 1));
    if (run.dots >= 3) {
      if (run.spaced && attached && run.dots >= 4) {
        // "compounds. . . . The": the word's own period ends the sentence; the ellipsis opens the next.
        return next.kind === 'lower' ? null : start + 1;
      }
      if (run.dots >= 4) return next.kind === 'lower' ? null : afterClosers;
      // A three-dot ellipsis often continues the sentence ("... I didn't mean it").
      return next.kind === 'upper' && next.word !== 'I' ? afterClosers : null;
    }
    if (next.kind === 'lower') return null;
    return this.periodEndsSentence(start, next) ? afterClosers : null;
  }

  /** Whether the single period at `index`, followed by space and a word not in lower case, ends the sentence. */
  private periodEndsSentence(index: number, next: NextWord): boolean {
    const word = this.wordBefore(index);
    if (word === null || word === '') return true;
    const starter = next.kind === 'upper' && !next.dotted && isSentenceStarter(next.word);

    if (this.isListLabel(word, index)) return false;
    if (MULTI_PERIOD_ABBREVIATION.test(word)) {
      if (abbreviationKind(word) === 'introducer') return false;
      // "U.S. How" ends, "U.S. Government" does not; "6 P.M. Mr. Smith" ends too.
      const titleFollows = next.dotted && abbreviationKind(next.word) === 'title';
      return starter || (UPPERCASE_ONLY.test(word) && titleFollows);
    }
    const single = word.length === 1 || (word.length === 2 && (word.codePointAt(0) ?? 0) > 0xffff);
    if (single && letterCaseAt(word, 0) === 'upper') return starter; // an initial: "J. R. Smith"
    const kind = abbreviationKind(word);
    switch (kind) {
      case 'introducer':
        return false;
      case 'title':
        return starter;
      case 'numeric':
      case 'plain':
        return next.kind === 'upper';
      case null:
        return true;
    }
  }

  /** "1." or "a." opening the sentence is an item label, not a sentence. */
  private isListLabel(word: string, index: number): boolean {
    if (!LIST_LABEL.test(word)) return false;
    let contentStart = this.sentenceStart;
    if (isBullet(this.text.charAt(contentStart))) contentStart = this.skipSpaces(contentStart + 1);
    return this.wordStart(index) === contentStart;
  }

  /**
   * The word ending just before the period at `index` (leading quotes, brackets and other
   * symbols dropped), or null when it is too long to be an abbreviation.
   */
  private wordBefore(index: number): string | null {
    const start = this.wordStart(index);
    if (index - start > MAX_ABBREVIATION_LENGTH) return null;
    return this.text.slice(start, index);
  }

  private wordStart(index: number): number {
    this.loadToken(index);
    let start = Math.max(this.tokenStart, this.sentenceStart);
    while (start < index && !isAlphanumericAt(this.text, start)) start++;
    return start;
  }

  /**
   * A period with no space after it ends a sentence in run-together text ("world.Today is",
   * "Tuesday.Mr. Smith") when a lower-case letter or digit stands before it and a capitalised word
   * follows. Addresses, file names and code-like names ("Math.Round", "myList.Count") are left
   * alone unless the next word is a sentence starter or a title.
   */
  private isRunTogetherBoundary(index: number): boolean {
    const { text } = this;
    this.loadToken(index);
    if (this.tokenIsAddress) return false;
    const before = letterCaseAt(text, index - 1);
    if (before !== 'lower' && before !== 'digit') return false;
    const word = this.wordBefore(index);
    if (word === null || word.length < 2 || abbreviationKind(word) !== null) return false;
    if (letterCaseAt(text, index + 1) !== 'upper') return false;
    const after = lettersAt(text, index + 1);
    if (!CAPITALISED_WORD.test(after)) return false;
    const end = index + 1 + after.length;
    const follow = text.charAt(end);
    const then = text.charAt(end + 1);
    const wordEnds = follow === '' || isSpaceCode(follow.charCodeAt(0));
    const punctuationEnds = '.,;:!?'.includes(follow) && (then === '' || isSpaceCode(then.charCodeAt(0)));
    if (!wordEnds && !punctuationEnds) return false;
    if (isSentenceStarter(after) && follow !== PERIOD) return true;
    if (follow === PERIOD && abbreviationKind(after) === 'title') return true;
    // "world.Today" reads as prose; "Math.Round" and "myList.Count" read as code.
    return PLAIN_LOWER_WORD.test(word) && wordEnds;
  }

  /** Caches the whitespace-delimited token around `index` and whether it is a URL or address. */
  private loadToken(index: number): void {
    if (index >= this.tokenStart && index < this.tokenEnd) return;
    const { text } = this;
    let start = index;
    while (start > 0 && !isSpaceCode(text.charCodeAt(start - 1))) start--;
    let end = index;
    let address = false;
    for (; end < text.length && !isSpaceCode(text.charCodeAt(end)); end++) {
      const ch = text.charAt(end);
      if (ch === '@' || ch === '/' || ch === '\\') address = true;
    }
    for (let k = start; k < index && !address; k++) {
      const ch = text.charAt(k);
      if (ch === '@' || ch === '/' || ch === '\\') address = true;
    }
    if (!address && /^\W*www\./i.test(text.slice(start, start + 8))) address = true;
    this.tokenStart = start;
    this.tokenEnd = end;
    this.tokenIsAddress = address;
  }

  private skipClosers(from: number): number {
    let i = from;
    while (i < this.text.length && isCloser(this.text.charAt(i))) i++;
    return i;
  }

  /** After a note marker such as "[1]" or "[^a]" that follows a full stop; `from` when none. */
  private skipNoteMarker(from: number): number {
    const { text } = this;
    if (text.charAt(from) !== '[') return from;
    const limit = Math.min(text.length, from + MAX_NOTE_MARKER_LENGTH);
    for (let i = from + 1; i < limit; i++) {
      const ch = text.charAt(i);
      if (ch === ']') return i > from + 1 ? i + 1 : from;
      if (ch !== '^' && !isAlphanumericAt(text, i)) return from;
    }
    return from;
  }

  private skipSpaces(from: number): number {
    let i = from;
    while (i < this.text.length && isSpaceCode(this.text.charCodeAt(i))) i++;
    return i;
  }
}
