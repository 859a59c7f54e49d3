/**
 * Web addresses in sentence text ("https://…", "www.…"), which stay in the text when a document
 * writes them bare. One pattern for every rule that sets them aside: the ranker's link-only
 * sentences and the abstract check's pointers to a link.
 */

const WEB_ADDRESS = /\b(?:[a-z][a-z0-9+.-]*:\/\/|www\.)\S+/giu;
const MAY_HOLD_WWW = /www\./iu;

/** The text with each web address replaced by a space (the text itself when it holds none). */
export function withoutWebAddresses(text: string): string {
  // Every address holds "://" or "www." (any case); most sentences hold neither and skip the replace.
  return text.includes('://') || MAY_HOLD_WWW.test(text) ? text.replace(WEB_ADDRESS, ' ') : text;
}
