/**
 * Summary sentences that will not stand alone: a trigger (see `triggers.ts`) whose context
 * sentence (see `context.ts`) is not in the summary. A sentence whose context sentence is picked
 * too is fine, and so is a list item whose lead-in line is picked.
 */
import type { ParsedDocument, Repair, Span, StandAloneTrigger, StandAloneWarning } from '../types';
import { contextSource } from './context';
import { trimLeadingConnective } from './trim';
import { danglingTriggers, type TriggerHit } from './triggers';

// Hoisted: the bundler turns a \p{…} literal into `new RegExp(…)`, which inside a function runs at every call.
const WORD_CHARACTER = /[\p{L}\d]/u;

export interface CheckOptions {
  /** Score per sentence (higher is better). Without it, "replace" repairs carry no replacement. */
  readonly scores?: ArrayLike<number>;
  /** Displayed text of sentences edited by a repair (sentence → text); checked instead of the source text. */
  readonly edited?: ReadonlyMap<number, string>;
}

/** How far back a chain of context sentences is followed ("It ..." after "This ..." after ...). */
export const MAX_CONTEXT_SENTENCES = 3;

const NO_EDITS: ReadonlyMap<number, string> = new Map();

export function findStandAloneProblems(
  doc: ParsedDocument,
  picked: readonly number[],
  options: CheckOptions = {},
): StandAloneWarning[] {
  const chosen = new Set(picked.filter((i) => Number.isInteger(i) && i >= 0 && i < doc.sentences.length));
  const state: CheckState = { chosen, edited: options.edited ?? NO_EDITS, triggers: memoizedTriggers() };
  const warnings: StandAloneWarning[] = [];
  for (const index of [...chosen].sort((a, b) => a - b)) {
    const problem = danglingAt(doc, index, state);
    if (!problem) continue;
    const context = contextChain(doc, problem.context, state);
    warnings.push({
      sentence: index,
      trigger: problem.hit.trigger,
      words: problem.hit.words,
      span: locateWords(doc, index, problem.hit, state.edited.has(index)),
      context,
      message: explain(problem.hit.trigger, problem.hit.words),
      repairs: repairsFor(doc, index, problem.hit, context, state, options.scores),
    });
  }
  return warnings;
}

/** What a check needs besides the document: the summary, edited display texts, a trigger lookup. */
export interface CheckState {
  readonly chosen: ReadonlySet<number>;
  readonly edited: ReadonlyMap<number, string>;
  readonly triggers: (text: string) => readonly TriggerHit[];
}

/** Trigger lookup that analyses each distinct text once (repair asks about the same sentences often). */
export function memoizedTriggers(): (text: string) => readonly TriggerHit[] {
  const seen = new Map<string, readonly TriggerHit[]>();
  return (text) => {
    let hits = seen.get(text);
    if (!hits) {
      hits = danglingTriggers(text);
      seen.set(text, hits);
    }
    return hits;
  };
}

export interface DanglingProblem {
  readonly hit: TriggerHit;
  /** The sentence that would supply the missing context. */
  readonly context: number;
}

/** The first trigger of sentence `index` whose context is missing from the summary, or null. */
export function danglingAt(doc: ParsedDocument, index: number, state: CheckState): DanglingProblem | null {
  const text = state.edited.get(index) ?? doc.sentences[index]!.text;
  for (const hit of state.triggers(text)) {
    const source = contextSource(doc, index, hit.trigger);
    if (source.kind !== 'sentence' || state.chosen.has(source.sentence)) continue;
    return { hit, context: source.sentence };
  }
  return null;
}

/** The context sentence plus, while that one dangles too, the sentences it leans on; in document order. */
export function contextChain(doc: ParsedDocument, first: number, state: CheckState): number[] {
  const chain = [first];
  let current = first;
  while (chain.length < MAX_CONTEXT_SENTENCES) {
    const problem = danglingAt(doc, current, state);
    if (!problem || chain.includes(problem.context)) break;
    chain.push(problem.context);
    current = problem.context;
  }
  return chain.sort((a, b) => a - b);
}

/** Best-scored sentence outside the summary (other than `replacing`) that would read on its own in it. */
export function bestReplacement(
  doc: ParsedDocument,
  replacing: number,
  state: CheckState,
  scores: ArrayLike<number>,
  accept: (candidate: number) => boolean = () => true,
): number | null {
  const without = new Set(state.chosen);
  without.delete(replacing);
  const trial: CheckState = { ...state, chosen: without };
  const candidates: number[] = [];
  for (let i = 0; i < doc.sentences.length; i++) {
    if (i === replacing || state.chosen.has(i) || !Number.isFinite(scores[i]) || !accept(i)) continue;
    candidates.push(i);
  }
  candidates.sort((a, b) => scores[b]! - scores[a]! || a - b);
  for (const candidate of candidates) {
    without.add(candidate);
    const fine = danglingAt(doc, candidate, trial) === null;
    without.delete(candidate);
    if (fine) return candidate;
  }
  return null;
}

/** The display text without its leading connective, if that leaves a sentence that stands alone. */
export function trimmedIfStandsAlone(doc: ParsedDocument, index: number, hit: TriggerHit, state: CheckState): string | null {
  if (hit.trigger !== 'connective') return null;
  const text = state.edited.get(index) ?? doc.sentences[index]!.text;
  const trimmed = trimLeadingConnective(text, hit);
  if (trimmed === null) return null;
  const edited = new Map(state.edited).set(index, trimmed);
  return danglingAt(doc, index, { ...state, edited }) === null ? trimmed : null;
}

function repairsFor(
  doc: ParsedDocument,
  index: number,
  hit: TriggerHit,
  context: readonly number[],
  state: CheckState,
  scores: ArrayLike<number> | undefined,
): Repair[] {
  const repairs: Repair[] = [{ kind: 'addContext', sentences: context }];
  const section = doc.sentences[index]!.section;
  const replacement = scores ? bestReplacement(doc, index, state, scores, (c) => doc.sentences[c]!.section === section) : null;
  repairs.push({ kind: 'replace', replacement });
  const trimmed = trimmedIfStandsAlone(doc, index, hit, state);
  if (trimmed !== null) repairs.push({ kind: 'trimConnective', text: trimmed });
  return repairs;
}

const EXPLANATIONS: Readonly<Record<StandAloneTrigger, (words: string) => string>> = {
  connective: (w) => `Starts with “${w}”, which links it to a sentence the summary leaves out.`,
  pronoun: (w) => `“${w}” refers to something named before this sentence, which the summary leaves out.`,
  demonstrative: (w) => `“${w}” points back to text the summary leaves out.`,
  backReference: (w) => `“${w}” refers to another part of the document.`,
  additive: (w) => `“${w}” assumes something said before it that the summary leaves out.`,
};

function explain(trigger: StandAloneTrigger, words: string): string {
  return EXPLANATIONS[trigger](words);
}

/**
 * Where the trigger words are in the document. Sentence text is normalized (markup stripped), so
 * the offsets inside it may not match the source: look for the words in the sentence's source
 * stretch, nearest to where they are in the text; fall back to the whole sentence.
 */
function locateWords(doc: ParsedDocument, index: number, hit: TriggerHit, wasEdited: boolean): Span {
  const sentence = doc.sentences[index]!;
  const from = sentence.span.start - doc.baseOffset;
  const source = doc.text.slice(from, sentence.span.end - doc.baseOffset);
  if (!wasEdited && source.slice(hit.start, hit.end) === hit.words) {
    return { start: sentence.span.start + hit.start, end: sentence.span.start + hit.end };
  }
  for (const needle of [hit.words, hit.words.split(/\s+/)[0]!]) {
    const at = nearestOccurrence(source, needle, hit.start);
    if (at >= 0) return { start: sentence.span.start + at, end: sentence.span.start + at + needle.length };
  }
  return sentence.span;
}

function nearestOccurrence(haystack: string, needle: string, near: number): number {
  const lowerHay = haystack.toLowerCase();
  const lowerNeedle = needle.toLowerCase();
  let best = -1;
  for (let at = lowerHay.indexOf(lowerNeedle); at >= 0; at = lowerHay.indexOf(lowerNeedle, at + 1)) {
    const before = at === 0 ? '' : haystack[at - 1]!;
    const after = haystack[at + needle.length] ?? '';
    if (WORD_CHARACTER.test(before) || WORD_CHARACTER.test(after)) continue; // whole words only
    if (best < 0 || Math.abs(at - near) < Math.abs(best - near)) best = at;
  }
  return best;
}
