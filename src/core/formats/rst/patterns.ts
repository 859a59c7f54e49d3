/**
 * Patterns of the reStructuredText specification shared by the block and inline parsers: how the
 * first line of each body element looks, reference names, and the punctuation classes of the
 * inline markup recognition rules.
 */

// Hoisted: the bundler turns a \p{…} literal into `new RegExp(…)`, which inside a function runs at every call.
const OPENING_PUNCTUATION = /\p{Ps}/u;

/** A reference name: alphanumerics with isolated internal `-._+:` characters ("simple name"). */
export const SIMPLE_NAME = String.raw`[\p{L}\p{N}]+(?:[-._+:][\p{L}\p{N}]+)*`;

/** Printable 7-bit ASCII punctuation: the characters section adornments and transitions use. */
export const ADORNMENT_CHAR = String.raw`[!-\/:-@\[-\x60{-~]`;

/** A line made of one punctuation character repeated (an underline, overline or transition). */
export const ADORNMENT_LINE = new RegExp(String.raw`^(${ADORNMENT_CHAR})\1* *$`);

const ENUMERATOR = String.raw`(?:[0-9]+|[a-zA-Z]|[ivxlcdm]+|[IVXLCDM]+|#)`;
const OPTION_ARGUMENT = String.raw`(?:[a-zA-Z][a-zA-Z0-9_-]*|<[^<>]+>)`;
const SHORT_OPTION = String.raw`(?:-|\+)[a-zA-Z0-9](?: ?${OPTION_ARGUMENT})?`;
const LONG_OPTION = String.raw`(?:--|\/)[a-zA-Z0-9][a-zA-Z0-9_-]*(?:[ =]${OPTION_ARGUMENT})?`;
const OPTION = String.raw`(?:${SHORT_OPTION}|${LONG_OPTION})`;

/** First-line patterns of the body elements, tried in this order (the specification's order). */
export const BODY = {
  bullet: /^[-+*\u2022\u2023\u2043](?: +|$)/,
  enumerator: new RegExp(String.raw`^(?:\((${ENUMERATOR})\)|(${ENUMERATOR})\)|(${ENUMERATOR})\.)(?: +|$)`),
  fieldMarker: /^:(?![: ])(?:[^:\\]|\\.|:(?!(?:[ `]|$)))*(?<! ):(?: +|$)/,
  optionMarker: new RegExp(String.raw`^${OPTION}(?:, ${OPTION})*(?:  +| ?$)`),
  doctest: /^>>>(?: +|$)/,
  lineBlock: /^\|(?: +|$)/,
  gridTableTop: /^\+-[-+]+-\+ *$/,
  simpleTableTop: /^=+(?: +=+)+ *$/,
  explicitMarkup: /^\.\.(?: +|$)/,
  anonymousTarget: /^__(?: +|$)/,
  line: ADORNMENT_LINE,
} as const;

export const SIMPLE_TABLE_BORDER = /^=+[ =]*$/;

/** Explicit markup constructs after `.. ` (footnote, citation, target, substitution, directive). */
export const EXPLICIT = {
  footnote: new RegExp(String.raw`^\.\. +\[([0-9]+|#|#${SIMPLE_NAME}|\*)\](?: +|$)`, 'u'),
  citation: new RegExp(String.raw`^\.\. +\[(${SIMPLE_NAME})\](?: +|$)`, 'u'),
  target: /^\.\. +_(?! |$)/,
  substitution: /^\.\. +\|(?! |$)/,
  directive: new RegExp(String.raw`^\.\. +(${SIMPLE_NAME}) ?::(?: +|$)`, 'u'),
} as const;

/**
 * Characters before an inline start-string or after an end-string that still allow markup: the
 * specification's openers, closers and delimiters, as Unicode punctuation categories.
 */
export const OPENERS = String.raw`"'(<\[{\p{Ps}\p{Pi}\p{Pf}`;
export const CLOSERS = String.raw`"')>\]}\p{Pe}\p{Pf}\p{Pi}`;
/** The four ASCII delimiters, dashes, and "other" punctuation outside ASCII (a regex group). */
export const DELIMITER = String.raw`(?:[\\\-\/:\p{Pd}]|(?=[^\x00-\x7f])\p{Po})`;
export const CLOSING_DELIMITERS = String.raw`\\.,;!?`;

/** What may follow an inline end-string: the end, whitespace, an escape, a closing delimiter, a closer or a delimiter. */
export const END_SUFFIX = String.raw`(?:$|(?=\s|[\x00${CLOSING_DELIMITERS}${CLOSERS}]|${DELIMITER}))`;

/** Escaped characters are turned into this placeholder followed by the character (as the spec's parser does). */
export const ESCAPE = '\u0000';

/** Open/close pairs that make a start-string "quoted" (not markup), e.g. `'*'` or `(*)`. */
const PAIRS: Readonly<Record<string, string>> = {
  '"': '"', "'": "'", '(': ')', '<': '>', '[': ']', '{': '}',
  '\u00ab': '\u00bb', '\u00bb': '\u00ab\u00bb', '\u2018': '\u2019\u201a', '\u2019': '\u2018\u2019', '\u201a': '\u2018\u2019',
  '\u201c': '\u201d\u201e', '\u201d': '\u201c\u201d', '\u201e': '\u201c\u201d', '\u2039': '\u203a', '\u203a': '\u2039\u203a',
};

/** True when `open` and `close` form a matching pair of punctuation around a start-string. */
export function matchingPair(open: string, close: string): boolean {
  const listed = PAIRS[open];
  if (listed !== undefined) return listed.includes(close);
  // Other opening brackets close with the next code point (U+2045 ⁅ / U+2046 ⁆, U+300C 「 / U+300D 」, …).
  return OPENING_PUNCTUATION.test(open) && close.codePointAt(0) === open.codePointAt(0)! + 1;
}
