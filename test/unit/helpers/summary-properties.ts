/**
 * The properties every summary must have, whatever the document: spans inside the document that
 * never split a surrogate pair and keep the span invariant; the budget respected; no duplicate
 * picks; document order; the document text handed back unchanged. Each check returns the broken
 * rules as text so a failing case (and its shrunk form) explains itself.
 */
import { resolveOptions } from '../../../src/core/options';
import { autoWords, WORDS_PER_MINUTE } from '../../../src/core/reading';
import type { SummarizeRequest } from '../../../src/core/summarize';
import { wordTokens } from '../../../src/core/text/tokens';
import type { Span, Summary } from '../../../src/core/types';
import { invariantFailures, within } from './span-invariant';

const isHigh = (code: number) => code >= 0xd800 && code <= 0xdbff;
const isLow = (code: number) => code >= 0xdc00 && code <= 0xdfff;

/** True when `offset` (local to `text`) falls between the two halves of a surrogate pair. */
export function splitsSurrogatePair(text: string, offset: number): boolean {
  return offset > 0 && offset < text.length && isHigh(text.charCodeAt(offset - 1)) && isLow(text.charCodeAt(offset));
}

function spanFailures(label: string, span: Span, text: string, baseOffset: number): string[] {
  const whole = { start: baseOffset, end: baseOffset + text.length };
  if (!within(span, whole)) return [`${label}: span ${span.start}-${span.end} outside ${whole.start}-${whole.end}`];
  const failures: string[] = [];
  for (const edge of [span.start, span.end]) {
    if (splitsSurrogatePair(text, edge - baseOffset)) failures.push(`${label}: offset ${edge} splits a surrogate pair`);
  }
  return failures;
}

/** Spans of the parsed document and of the summary: inside, in order, not splitting surrogate pairs. */
export function rangeFailures(summary: Summary): string[] {
  const doc = summary.document;
  const failures = invariantFailures(doc);
  for (const sentence of doc.sentences) failures.push(...spanFailures(`sentence ${sentence.index}`, sentence.span, doc.text, doc.baseOffset));
  for (const picked of summary.sentences) {
    const source = doc.sentences[picked.sentence];
    if (source === undefined) failures.push(`picked sentence ${picked.sentence} does not exist`);
    else if (picked.span.start !== source.span.start || picked.span.end !== source.span.end) failures.push(`picked sentence ${picked.sentence}: span differs from the parsed sentence`);
  }
  for (const warning of summary.warnings) {
    failures.push(...spanFailures(`warning on sentence ${warning.sentence}`, warning.span, doc.text, doc.baseOffset));
  }
  for (const section of doc.sections) {
    failures.push(...spanFailures(`section ${section.index}`, section.span, doc.text, doc.baseOffset));
  }
  return failures;
}

/**
 * The budget, as src/core/select/select.ts documents it:
 * - sentences N: at most N picks;
 * - words W: at most W words, except the single shortest candidate when no sentence fits;
 * - ratio r: at most round(r × candidate words) — candidate words ≤ words in — except that the
 *   first `minSentences` picks are taken even past that limit.
 * Automatic repair (src/core/coherence/repair.ts) may swap picks for context sentences but never
 * adds words beyond the larger of the limit and what the selection had picked; `unrepaired` gives
 * that selection (the same request with repairs only suggested).
 * Words are counted as the engine counts them (its tokenizer over the source sentence's text).
 */
export function budgetFailures(summary: Summary, request: SummarizeRequest, unrepaired?: () => Summary): string[] {
  if (summary.refused !== undefined) return summary.sentences.length === 0 ? [] : ['a refused summary has sentences'];
  const options = resolveOptions(request);
  const { budget } = options;
  const doc = summary.document;
  const wordsOf = (i: number) => wordTokens(doc.sentences[i]!.text).length;
  const picks = summary.sentences.map((s) => s.sentence);
  const words = picks.reduce((sum, i) => sum + wordsOf(i), 0);
  const failures: string[] = [];
  if (summary.stats.wordsOut !== words) failures.push(`stats.wordsOut ${summary.stats.wordsOut} but the picks hold ${words} words`);
  if (summary.stats.sentencesOut !== picks.length) failures.push(`stats.sentencesOut ${summary.stats.sentencesOut} but ${picks.length} picks`);

  if (budget.unit === 'sentences') {
    if (picks.length > budget.value) failures.push(`${picks.length} sentences picked for a budget of ${budget.value}`);
  } else if (budget.unit === 'words') {
    if (words > budget.value) {
      const candidates = doc.sentences.map((s) => s.index).filter((i) => wordsOf(i) > 0);
      const shortest = Math.min(...candidates.map(wordsOf));
      if (picks.length !== 1 || wordsOf(picks[0]!) > shortest || shortest <= budget.value) {
        failures.push(`${words} words picked for a budget of ${budget.value} words (${picks.length} sentences)`);
      }
    }
  } else {
    // A share of the words, a reading time at 230 words a minute, or the default length (reading.ts;
    // counted here over all the document's words, which is at least the engine's candidate words).
    const limit =
      budget.unit === 'minutes' ? Math.round(budget.value * WORDS_PER_MINUTE) : budget.unit === 'auto' ? autoWords(summary.stats.wordsIn) : Math.round(budget.value * summary.stats.wordsIn);
    const repairCeiling = () => (options.repair === 'auto' && unrepaired ? Math.max(limit, unrepaired().stats.wordsOut) : limit);
    if (words > limit && picks.length > Math.max(1, options.minSentences) && words > repairCeiling()) {
      failures.push(`${words} words in ${picks.length} sentences for a ratio limit of ${limit} words (floor ${options.minSentences} sentences)`);
    }
  }
  return failures;
}

/** No sentence twice, document order, and the document text handed back as given. */
export function orderFailures(summary: Summary, text: string): string[] {
  const failures: string[] = [];
  if (summary.document.text !== text) failures.push('summary.document.text differs from the input');
  const picks = summary.sentences.map((s) => s.sentence);
  if (new Set(picks).size !== picks.length) failures.push(`duplicate picks ${JSON.stringify(picks)}`);
  for (let k = 1; k < picks.length; k++) {
    if (!(picks[k - 1]! < picks[k]!)) failures.push(`picks out of document order ${JSON.stringify(picks)}`);
    if (!(summary.sentences[k - 1]!.span.end <= summary.sentences[k]!.span.start)) failures.push(`picked spans out of order at ${k}`);
  }
  if (summary.refused !== undefined && !(summary.refused.length > 0 && !summary.refused.includes('\n'))) failures.push('a refusal must be one line');
  return failures;
}

/** Every property of one summary; empty when all hold. */
export function summaryFailures(summary: Summary, text: string, request: SummarizeRequest, unrepaired?: () => Summary): string[] {
  return [...rangeFailures(summary), ...budgetFailures(summary, request, unrepaired), ...orderFailures(summary, text)];
}
