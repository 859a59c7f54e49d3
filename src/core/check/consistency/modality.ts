/**
 * Modality: how strongly a sentence commits to what it says. Modal verbs fall in four classes of
 * strength, the grouping of English grammars (obligation, advice, possibility, prediction; Palmer,
 * "Mood and Modality", 2001 — from memory), and "must implement" against "may implement" changes
 * the claim. Negation of the modal is the negation detector's business.
 *
 * The governed word is the first content word after the modal (within four words, before any
 * punctuation or quotation mark: "should be 'failed'" names a status value, not a verb). The
 * body's sentences that use that word, closest to the claim first (and the support), are read: a
 * modal of the claim's class on the word there agrees; otherwise a modal of another class on it is
 * a finding, except prediction against possibility ("will" / "can"). A body that states plainly
 * what the abstract says with a modal ("adds" for "will add") is a paraphrase, not a conflict.
 * English only.
 */
import type { CheckedText } from './claim-tokens';
import { sharedTerms } from './claim-tokens';
import { sentencesUsing, type Detector, type Evidence, type RawFinding } from './detector';

export type ModalClass = 'obligation' | 'advice' | 'possibility' | 'prediction';

const SINGLE: Readonly<Record<string, ModalClass>> = {
  must: 'obligation', shall: 'obligation', "mustn't": 'obligation', "shan't": 'obligation',
  should: 'advice', ought: 'advice', "shouldn't": 'advice',
  may: 'possibility', might: 'possibility', can: 'possibility', could: 'possibility', cannot: 'possibility', "can't": 'possibility', "couldn't": 'possibility', "mightn't": 'possibility',
  will: 'prediction', would: 'prediction', "won't": 'prediction', "wouldn't": 'prediction',
};
/** "have to", "needs to", "required to": obligation spelled with two words. */
const BEFORE_TO: Readonly<Record<string, ModalClass>> = { have: 'obligation', has: 'obligation', had: 'obligation', need: 'obligation', needs: 'obligation', required: 'obligation' };
const BREAK = /[,;:()[\]{}!?"'`‘’“”]|\.\s/u;
const HEAD_WINDOW = 4;

export interface ModalUse {
  readonly modal: number;
  readonly modalClass: ModalClass;
  /** Token index of the governed content word. */
  readonly head: number;
}

export function modalUses(text: CheckedText): ModalUse[] {
  const uses: ModalUse[] = [];
  const tokens = text.tokens;
  for (let i = 0; i < tokens.length; i++) {
    const word = tokens[i]!.lower;
    let modalClass: ModalClass | undefined = SINGLE[word];
    if (word.endsWith("'ll")) modalClass = 'prediction';
    let start = i;
    if (modalClass === undefined && word in BEFORE_TO && tokens[i + 1]?.lower === 'to') {
      modalClass = BEFORE_TO[word];
      start = i + 1;
    }
    if (modalClass === undefined) continue;
    // "may" as a month ("in May 2024") is not a modal.
    if (word === 'may' && tokens[i]!.raw === 'May' && i > 0 && /\d/u.test(tokens[i + 1]?.lower ?? '')) continue;
    for (let k = start + 1; k < tokens.length && k <= start + HEAD_WINDOW; k++) {
      if (BREAK.test(text.text.slice(tokens[k - 1]!.end, tokens[k]!.start))) break;
      if (tokens[k]!.term !== null && tokens[k]!.lower !== 'not' && SINGLE[tokens[k]!.lower] === undefined) {
        uses.push({ modal: i, modalClass, head: k });
        break;
      }
    }
  }
  return uses;
}

const useCache = new WeakMap<CheckedText, ModalUse[]>();
function usesOf(text: CheckedText): ModalUse[] {
  let uses = useCache.get(text);
  if (!uses) {
    uses = modalUses(text);
    useCache.set(text, uses);
  }
  return uses;
}

function phrase(text: CheckedText, use: ModalUse): string {
  return text.text.slice(text.tokens[use.modal]!.start, text.tokens[use.head]!.end);
}

/** How many of the body's sentences about the governed word are read (the closest to the claim first). */
export const MODAL_NEIGHBOURS = 3;

/**
 * Prediction and possibility ("will warn" / "can warn", "would allow" / "could allow") describe a
 * proposal interchangeably in design documents, so they are not a conflict. On the train half
 * this pair raised 15 of the 37 modal false alarms and caught 11 of the 56 swapped modals.
 */
function compatible(a: ModalClass, b: ModalClass): boolean {
  return (a === 'prediction' && b === 'possibility') || (a === 'possibility' && b === 'prediction');
}

export const checkModality: Detector = (input) => {
  if (!input.language.startsWith('en')) return [];
  const findings: RawFinding[] = [];
  const claim = input.claim;
  for (const use of usesOf(claim)) {
    const term = claim.tokens[use.head]!.term!;
    const on = (e: Evidence) => usesOf(e.checked).filter((u) => e.checked.tokens[u.head]!.term === term);
    // The body's closest sentences about the governed word, and the support itself.
    const near = [...new Set([...sentencesUsing(input, term, MODAL_NEIGHBOURS), ...input.support.filter((e) => e.checked.terms.has(term))])];
    if (near.some((e) => on(e).some((u) => u.modalClass === use.modalClass))) continue;
    // A body that says it plainly ("adds" for "will add") is a paraphrase, not a conflict.
    // The conflicting modal must be in a sentence about the claim: its support, its frame, or one sharing two more words.
    const about = new Set([...input.support, input.frame]);
    const conflict = near.filter((e) => about.has(e) || sharedTerms(claim, e.checked, new Set([term])).length >= 2).map((e) => ({ evidence: e, other: on(e).find((u) => u.modalClass !== use.modalClass && !compatible(u.modalClass, use.modalClass)) })).find((c) => c.other !== undefined);
    if (!conflict) continue;
    findings.push({ kind: 'modality', abstractSays: phrase(claim, use), bodySays: phrase(conflict.evidence.checked, conflict.other!), evidence: conflict.evidence });
  }
  return findings;
};
