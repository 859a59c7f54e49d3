/**
 * What kind of line a sentence is, before any ranker looks at it:
 *  - barred: never a summary line — placeholder answers ("N/A", "TBD", "None."), pull-request
 *    boilerplate (issue references, sign-off trailers, "cc @…", check-list items), bylines and
 *    metadata lines ("Start Date: …", "Report version 1.2, circulated …"), and API lines: an HTTP
 *    request line or a bare URL path ("GET /flavors/{flavor_id}"), which name an endpoint but say
 *    nothing about it;
 *  - fragment: may be picked on its own merit but never to fill a section's seat — six words or
 *    fewer, a lead-in ending in a colon, a question its paragraph goes on to answer, an unfinished
 *    clause (ending in ", and"), link-only text, a bare reference ("RFC 1234.", "[3]"), a pointer
 *    elsewhere ("For more information, see …"; text/pointers.ts).
 * Plain rules on the sentence's text and source; nothing here is learned or tuned.
 */
import { isPointerSentence } from '../text/pointers';
import type { BarredKind, ParsedDocument } from '../types';

// Hoisted: the bundler turns a \p{…} literal into `new RegExp(…)`, which inside a function runs at every call.
const LEADING_MARKS = /^[\s\p{P}\p{S}]+(?=\p{L}|\p{N})/u;
const LETTER_OR_DIGIT = /[\p{L}\p{N}]/u;

export type { BarredKind };
export type FragmentKind = 'short' | 'leadIn' | 'answeredQuestion' | 'unfinished' | 'linkOnly' | 'bareReference' | 'pointer';

export const SENTENCE_KIND_DEFAULTS = {
  /** At most this many words is a fragment (issue 11: "≤ 6 words"). */
  fragmentWords: 6,
  /** Bylines and metadata lines are short; a long "Prepared by …" sentence is prose. */
  bylineWords: 14,
} as const;

/** Whole answers that say nothing (compared after normalizeSentence). */
const PLACEHOLDERS = new Set([
  'n/a', 'na', 'n.a', 'none', 'none yet', 'none so far', 'none at this time', 'none known', 'nothing', 'no', 'yes', 'nope',
  'tbd', 'tba', 'tbc', 'todo', 'to do', 'to be done', 'to be determined', 'to be decided', 'to be announced', 'not applicable',
  'not yet', 'unknown', 'pending', 'etc', 'others', 'other', 'misc', 'wip', 'fixme', 'xxx', '-', '--', '—', '?', '...', '…',
  'same as above', 'see above', 'see below', 'nothing yet', 'none identified', 'not sure', 'unclear', 'maybe', 'empty',
]);

/** "TODO for …", "TBD: …", "FIXME …": a note left for later, not content. */
const LATER_NOTE = /^(?:todo|tbd|fixme|xxx)\b/i;

/**
 * Issue-closing and issue-linking lines of pull requests. The closing keywords are GitHub's
 * (close(s/d), fix(es/ed), resolve(s/d); from memory), plus common linking phrases.
 */
const ISSUE_REF = String.raw`(?:[\w.-]+\/[\w.-]+)?#\d+|gh-\d+|issue\s+#?\d+|pr\s+#?\d+|<?https?:\/\/\S+>?`;
const ISSUE_LINE = new RegExp(
  String.raw`^(?:(?:close[sd]?|fix(?:e[sd])?|resolve[sd]?|related\s+to|relates\s+to|refs?|references|see(?:\s+also)?|part\s+of|depends\s+on|follow[- ]?up\s+(?:to|of|on)|addresses|supersedes|replaces|blocked\s+by|implements)\s*:?\s*)?` +
    String.raw`(?:${ISSUE_REF})(?:\s*(?:,|and|&|\/)?\s*(?:${ISSUE_REF}))*\s*[.!]?$`,
  'i',
);
/** Commit trailers (git's Signed-off-by and its relatives; from memory). */
const TRAILER = /^(?:signed-off-by|co-authored-by|reviewed-by|acked-by|tested-by|reported-by|suggested-by|helped-by|cc)\s*:/i;
const MENTION_LINE = /^\/?cc:?\s+@|^(?:@[\w-]+[\s,]*)+(?:please\s+(?:review|take\s+a\s+look)\b.*)?[.!]?$/i;
const CHECKLIST = /^\s*(?:[-*+]\s*)?\[[ xX]\]\s/;
const BYLINE = /^(?:prepared|written|authored|drafted|compiled|edited|submitted|proposed|created|maintained|posted|reviewed|approved)\s+by\b/i;
/** Header fields of design documents and forms, "Key: value" on one short line. */
const METADATA = /^(?:authors?|owners?|reviewers?|approvers?|assignees?|primary\s+assignee|other\s+contributors|contributors?|date|start\s+date|created|updated|last\s+updated|version|status|state|feature\s+name|rfc\s+pr|rust\s+issue|tracking\s+issue|blueprint|launchpad|shepherds?|champions?|team|teams|contact|email|discussion|pr|issue|target\s+release|milestone|labels?|category|type|priority)\s*:\s*\S/i;
/**
 * A document's version line in prose ("Report version 1.2, circulated for comment in November."):
 * the version number, then nothing or only how the version went out. "Version 2 adds …" is content.
 */
const VERSION_LINE =
  /^(?:(?:report|document|draft|spec|specification|proposal|design)\s+)?(?:version|revision)\s+\d+(?:\.\d+)*[a-z]?\s*(?:$|[.;]|\(|,\s*(?:circulated|released|issued|dated|updated|revised|published|approved|sent|shared|distributed)\b)/i;

/**
 * An HTTP request line (the methods of RFC 9110 §9, from memory) or a bare path, alone on its line,
 * optionally followed by the endpoint's name in brackets, as API lists in specs give it
 * ("GET /servers/{server_id} (Show Server Details)").
 */
const API_LINE = /^(?:(?:GET|HEAD|POST|PUT|PATCH|DELETE|OPTIONS|TRACE|CONNECT)\s+\S+(?:\s+HTTP\/[\d.]+)?|\/[\w{}\-.~:/%]*)(?:\s+\((?:[^()]|\([^()]*\))*\))?\s*$/;

const BARE_REFERENCE = new RegExp(
  String.raw`^(?:see\s+(?:also\s+)?)?(?:\[\d+\]|\(\d+\)|rfc\s*#?\d+|(?:${ISSUE_REF})|(?:section|chapter|figure|table|appendix)\s+[\d.]+[a-z]?)(?:\s*(?:,|and)\s*(?:\[\d+\]|rfc\s*#?\d+|(?:${ISSUE_REF})))*\s*[.;]?$`,
  'i',
);

/** Lower case, markup-free, whitespace collapsed, surrounding punctuation dropped: the key two copies share. */
export function normalizeSentence(text: string): string {
  return text
    .toLowerCase()
    .replace(/[`*_~]/g, '')
    .replace(/\s+/g, ' ')
    .replace(LEADING_MARKS, '')
    .replace(/[\s.,;:!?]+$/u, '')
    .trim();
}

/** Why a sentence may never be picked, or null. */
export function barredKind(text: string, words: number, settings = SENTENCE_KIND_DEFAULTS): BarredKind | null {
  const trimmed = text.trim();
  return barredKindOf(trimmed, normalizeSentence(trimmed), words, settings);
}

/**
 * barredKind given the trimmed text and its normalized key. normalizeSentence trims, so the key of
 * the untrimmed text is the same: sentenceKinds passes the key it already has.
 */
function barredKindOf(trimmed: string, key: string, words: number, settings: typeof SENTENCE_KIND_DEFAULTS): BarredKind | null {
  if (key === '' || PLACEHOLDERS.has(key) || LATER_NOTE.test(trimmed)) return 'placeholder';
  if (ISSUE_LINE.test(trimmed) || TRAILER.test(trimmed) || MENTION_LINE.test(trimmed) || CHECKLIST.test(trimmed)) return 'boilerplate';
  if (words <= settings.bylineWords && BYLINE.test(trimmed)) return 'byline';
  if (words <= settings.bylineWords && (METADATA.test(trimmed) || VERSION_LINE.test(trimmed))) return 'metadata';
  if (API_LINE.test(trimmed)) return 'apiLine';
  return null;
}

/**
 * A list item or clause that the next one finishes ("Rename the dock table, and"): it ends in a
 * comma, a semicolon or a coordinating conjunction (English).
 */
const UNFINISHED = /(?:[,;]|\b(?:and|or|nor|but))$/i;

/** Where a sentence stands, as far as fragments care. */
export interface FragmentPlace {
  /** More sentences follow it in its paragraph. */
  readonly answeredInParagraph?: boolean;
}

/**
 * Why a sentence is a fragment, or null. `source` is its Markdown/rst source when known; `place`
 * tells whether the paragraph goes on after it: a question it goes on to answer ("Why a ratio?
 * A fixed cap is …") is a lead-in to its answer, as a colon lead-in is to its list.
 */
export function fragmentKind(text: string, words: number, source = text, place: FragmentPlace = {}, settings = SENTENCE_KIND_DEFAULTS): FragmentKind | null {
  const trimmed = text.trim();
  if (/:\s*$/.test(trimmed)) return 'leadIn';
  if (place.answeredInParagraph && /\?["'”’)*_]*$/u.test(trimmed)) return 'answeredQuestion';
  if (UNFINISHED.test(trimmed)) return 'unfinished';
  if (BARE_REFERENCE.test(trimmed)) return 'bareReference';
  if (isLinkOnly(source)) return 'linkOnly';
  if (isPointerSentence(trimmed, words)) return 'pointer';
  if (words <= settings.fragmentWords) return 'short';
  return null;
}

/** Source that is nothing but links (Markdown `[text](url)`, `<url>`, bare URLs, rst `` `text <url>`_ ``). */
function isLinkOnly(source: string): boolean {
  const rest = source
    .replace(/!?\[[^\]]*\]\([^)]*\)/g, ' ')
    .replace(/\[[^\]]*\]\[[^\]]*\]/g, ' ')
    .replace(/`[^`<]*<[^>]+>`__?/g, ' ')
    .replace(/<https?:\/\/[^>]+>/g, ' ')
    .replace(/https?:\/\/\S+/g, ' ')
    .replace(/^\s*(?:[-*+]|\d+[.)])\s+/, ' ');
  return rest !== source && !LETTER_OR_DIGIT.test(rest);
}

export interface SentenceKinds {
  /** Per sentence: why it is barred, or null. */
  readonly barred: readonly (BarredKind | null)[];
  /** Per sentence: 1 when a fragment. */
  readonly fragment: Uint8Array;
  /** Per sentence: equal numbers for equal normalized text. */
  readonly textKey: Int32Array;
}

/**
 * Classifies every sentence of a document. `templateKeys` holds normalized sentences of the
 * team's templates (template-text.ts): a sentence found there is barred as template text.
 */
export function sentenceKinds(doc: ParsedDocument, wordCounts: readonly number[], templateKeys: ReadonlySet<string> = new Set()): SentenceKinds {
  const n = doc.sentences.length;
  const barred: (BarredKind | null)[] = new Array(n).fill(null);
  const fragment = new Uint8Array(n);
  const textKey = new Int32Array(n);
  const keys = new Map<string, number>();
  doc.sentences.forEach((sentence, i) => {
    const key = normalizeSentence(sentence.text);
    let id = keys.get(key);
    if (id === undefined) {
      id = keys.size;
      keys.set(key, id);
    }
    textKey[i] = id;
    const words = wordCounts[i] ?? 0;
    barred[i] = templateKeys.has(key) ? 'template' : barredKindOf(sentence.text.trim(), key, words, SENTENCE_KIND_DEFAULTS);
    const source = doc.text.slice(sentence.span.start - doc.baseOffset, sentence.span.end - doc.baseOffset);
    if (fragmentKind(sentence.text, words, source, { answeredInParagraph: sentence.positionInParagraph < sentence.paragraphLength - 1 }) !== null) fragment[i] = 1;
  });
  return { barred, fragment, textKey };
}
