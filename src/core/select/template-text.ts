/**
 * Template text: sentences a team's document template puts in every document (instructions,
 * questions left unanswered). They come from two places — the template files a caller passes
 * (the command line and the extension read them; the engine only sees their text) and the
 * sentences `tersely train` found recurring across the training folder (stored in the model's
 * optional `templateText` field) — and a sentence found in either is never picked.
 */
import { parseDocument } from '../formats/registry';
import type { DocumentFormat, ParsedDocument } from '../types';
import { normalizeSentence } from './sentence-kinds';

/** A template as callers pass it: its text, Markdown unless a format is given. */
export type TemplateInput = string | { readonly text: string; readonly format?: DocumentFormat };

export const TEMPLATE_LIMITS = {
  /** Templates per request (a workspace has a handful). */
  maxTemplates: 50,
  /** Characters per template (conventional templates are a few KB). */
  maxTemplateChars: 100_000,
  /** Learned sentences stored in a model, and characters per sentence. */
  maxLearned: 2_000,
  maxLearnedChars: 1_000,
} as const;

export const TEMPLATE_LEARNING_DEFAULTS = {
  /** A sentence is template text when it occurs in at least this share of the independent training documents… */
  minShare: 0.005,
  /** …and in at least this many of them (common practice, no source: a handful of copies is a pattern, two is a quote). */
  minDocuments: 4,
  /** Shorter sentences ("None.", "Yes.") recur as answers, not as template text; the placeholder rules handle them. */
  minWords: 3,
  /** Documents sharing this share of the smaller one's sentences are copies of one another (one family). */
  familyOverlap: 0.2,
} as const;

/** Checks what a caller passed as templates; throws a message naming what is wrong. */
export function checkTemplates(value: unknown): readonly { readonly text: string; readonly format: DocumentFormat }[] {
  if (!Array.isArray(value)) throw new TypeError('expected a list of template texts');
  if (value.length > TEMPLATE_LIMITS.maxTemplates) throw new TypeError(`has ${value.length} templates, more than ${TEMPLATE_LIMITS.maxTemplates}`);
  return value.map((entry: unknown, k) => {
    const text = typeof entry === 'string' ? entry : typeof entry === 'object' && entry !== null ? (entry as { text?: unknown }).text : undefined;
    const format = typeof entry === 'object' && entry !== null ? ((entry as { format?: unknown }).format ?? 'markdown') : 'markdown';
    if (typeof text !== 'string') throw new TypeError(`template ${k + 1} must be text`);
    if (text.length > TEMPLATE_LIMITS.maxTemplateChars) throw new TypeError(`template ${k + 1} is longer than ${TEMPLATE_LIMITS.maxTemplateChars.toLocaleString('en-US')} characters`);
    if (format !== 'markdown' && format !== 'plaintext' && format !== 'restructuredtext') throw new TypeError(`template ${k + 1} has an unknown format`);
    return { text, format };
  });
}

/** Checks a model's `templateText` field; throws a message naming what is wrong. */
export function checkLearnedTemplateText(value: unknown): readonly string[] {
  if (!Array.isArray(value)) throw new TypeError('"templateText" must be a list of sentences');
  if (value.length > TEMPLATE_LIMITS.maxLearned) throw new TypeError(`"templateText" has ${value.length} sentences, more than ${TEMPLATE_LIMITS.maxLearned}`);
  return value.map((entry: unknown, k) => {
    if (typeof entry !== 'string' || entry.length > TEMPLATE_LIMITS.maxLearnedChars) throw new TypeError(`"templateText"[${k}] must be text of at most ${TEMPLATE_LIMITS.maxLearnedChars} characters`);
    return entry;
  });
}

/** Normalized sentences of the templates and the learned template text. */
export function templateKeys(templates: readonly { readonly text: string; readonly format: DocumentFormat }[], learned: readonly string[] = []): Set<string> {
  const keys = new Set<string>();
  for (const template of templates) {
    for (const sentence of parseDocument(template.text, { format: template.format }).sentences) {
      const key = normalizeSentence(sentence.text);
      if (key) keys.add(key);
    }
  }
  for (const sentence of learned) {
    const key = normalizeSentence(sentence);
    if (key) keys.add(key);
  }
  return keys;
}

/**
 * Sentences that recur across independent documents, most frequent first: what a template leaves
 * in every copy. A document revised and filed again (a proposal re-submitted for a new release)
 * repeats its own sentences too, so documents that share a large part of their sentences are
 * counted as one family, and a sentence counts once per family.
 * Returned as first written, normalized only for counting.
 */
export function learnTemplateText(documents: readonly ParsedDocument[], settings = TEMPLATE_LEARNING_DEFAULTS): string[] {
  const keySets = documents.map((doc) => {
    const keys = new Map<string, string>();
    for (const sentence of doc.sentences) {
      const key = normalizeSentence(sentence.text);
      if (key && key.split(' ').length >= settings.minWords && !keys.has(key)) keys.set(key, sentence.text);
    }
    return keys;
  });
  const family = documentFamilies(keySets.map((keys) => [...keys.keys()]), settings.familyOverlap);
  const seen = new Map<string, { text: string; families: Set<number> }>();
  keySets.forEach((keys, d) => {
    for (const [key, text] of keys) {
      const entry = seen.get(key);
      if (entry) entry.families.add(family[d]!);
      else seen.set(key, { text, families: new Set([family[d]!]) });
    }
  });
  const families = new Set(family).size;
  const needed = Math.max(settings.minDocuments, Math.ceil(settings.minShare * families));
  return [...seen.values()]
    .filter((entry) => entry.families.size >= needed && entry.text.length <= TEMPLATE_LIMITS.maxLearnedChars)
    .sort((a, b) => b.families.size - a.families.size || (a.text < b.text ? -1 : a.text > b.text ? 1 : 0))
    .slice(0, TEMPLATE_LIMITS.maxLearned)
    .map((entry) => entry.text);
}

/**
 * Groups documents that share at least `overlap` of the smaller one's sentences (union-find over
 * pairs found through an inverted index of sentences; sentences in many documents are skipped
 * there, since they are the template text we look for, not evidence of copying).
 */
/** Two documents sharing fewer sentences than this are not copies, whatever their length. */
const MIN_SHARED = 3;

function documentFamilies(keys: readonly (readonly string[])[], overlap: number): Int32Array {
  const parent = Int32Array.from(keys.keys());
  const find = (d: number): number => {
    while (parent[d] !== d) {
      parent[d] = parent[parent[d]!]!;
      d = parent[d]!;
    }
    return d;
  };
  const postings = new Map<string, number[]>();
  keys.forEach((list, d) => {
    for (const key of list) {
      const docs = postings.get(key);
      if (docs) docs.push(d);
      else postings.set(key, [d]);
    }
  });
  const shared = new Map<number, number>();
  const pairKey = (a: number, b: number) => a * keys.length + b;
  // Sentences in very many documents are what we are looking for, not evidence of copying (and would cost n² pairs).
  const common = Math.max(16, Math.ceil(Math.sqrt(keys.length)));
  for (const docs of postings.values()) {
    if (docs.length < 2 || docs.length > common) continue;
    for (let x = 0; x < docs.length; x++) for (let y = x + 1; y < docs.length; y++) shared.set(pairKey(docs[x]!, docs[y]!), (shared.get(pairKey(docs[x]!, docs[y]!)) ?? 0) + 1);
  }
  for (const [pair, count] of shared) {
    const a = Math.floor(pair / keys.length);
    const b = pair % keys.length;
    if (count >= MIN_SHARED && count >= overlap * Math.min(keys[a]!.length, keys[b]!.length)) parent[find(a)] = find(b);
  }
  return Int32Array.from(keys.keys(), find);
}
