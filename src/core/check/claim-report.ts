/**
 * One abstract sentence's entry in the report: its verdict under the one rule (abstract-report.ts,
 * `ClaimVerdict`), its support with the reason in words, its findings with places and lines, and
 * whether it copies the body.
 */
import { balanceUnits } from '../select/units';
import type { AnalyzedDocument, ParsedDocument, Span } from '../types';
import type { AbstractSentence } from './abstract-locator';
import type { AbstractSentenceCheck, ClaimVerdict, ConsistencyFinding, CopiedFrom, SupportingSentence } from './abstract-report';
import type { CheckBody } from './abstract-match';
import { locate } from './consistency/claim-tokens';
import type { RawFinding } from './consistency/detector';
import type { CopyMatch } from './copy';
import type { Alignment, SupportSettings } from './support';
import { normalizedTerms } from './support';

const unitCache = new WeakMap<ParsedDocument, Int32Array>();
export function unitsOf(doc: ParsedDocument): Int32Array {
  let units = unitCache.get(doc);
  if (!units) unitCache.set(doc, (units = balanceUnits(doc, 1).unitOfSection));
  return units;
}

/** 1-based line of a document offset. */
export function lineOf(body: CheckBody, doc: ParsedDocument, offset: number): number {
  return body.lines.lineNumber(offset - doc.baseOffset);
}

/** Term → the word as written, for a sentence's words. */
function surfaces(words: readonly string[], language: string): Map<string, string> {
  const map = new Map<string, string>();
  for (const word of words) {
    // A hyphenated word gives a term per part ("text-message" → "text", "messag").
    for (const part of word.includes('-') ? word.split('-') : [word]) {
      const terms = normalizedTerms([part], language);
      if (terms.length === 1 && !map.has(terms[0]!)) map.set(terms[0]!, part);
    }
  }
  return map;
}

const quoted = (words: readonly string[]) => words.map((w) => `“${w}”`).join(', ');
const percent = (x: number) => `${Math.round(x * 100)}%`;

export type ClaimKind = 'claim' | 'lead-in' | 'link';

export interface ClaimReportInput {
  readonly analyzed: AnalyzedDocument;
  readonly body: CheckBody;
  readonly sentence: AbstractSentence;
  readonly index: number;
  /** A claim of its own, or not judged: a lead-in (too few content words) or a pointer to a link (abstract-match.ts). */
  readonly kind: ClaimKind;
  readonly alignment: Alignment;
  readonly findings: readonly RawFinding[];
  readonly copy: CopyMatch | null;
  readonly settings: SupportSettings;
}

export function claimReport(input: ClaimReportInput): AbstractSentenceCheck {
  const { analyzed, body, sentence, alignment, settings } = input;
  const { doc, language } = analyzed;
  const units = unitsOf(doc);
  const claimWords = surfaces(sentence.wordList, language);
  const place = (position: number): Omit<SupportingSentence, 'words' | 'related'> => {
    const source = doc.sentences[body.sentences[position]!]!;
    const unit = units[source.section]!;
    return {
      sentence: source.index,
      text: source.text,
      span: source.span,
      line: lineOf(body, doc, source.span.start),
      section: unit,
      heading: doc.sections[unit]!.heading,
      similarity: alignment.single[position]!,
    };
  };
  const strength = alignment.strength;
  const claim = input.kind === 'claim';
  const linked = claim && strength >= settings.supported;
  let support: SupportingSentence[];
  if (linked || !claim) {
    support = alignment.picks.map((pick) => {
      const bodyWords = surfaces(analyzed.words[body.sentences[pick.position]!]!, language);
      return {
        ...place(pick.position),
        words: pick.matched.filter((m) => m.via === null).map((m) => claimWords.get(m.term) ?? m.term),
        related: pick.matched.filter((m) => m.via !== null).map((m) => ({ abstract: claimWords.get(m.term) ?? m.term, body: bodyWords.get(m.via!) ?? m.via! })),
      };
    });
  } else {
    const closest = alignment.picks[0];
    support = closest ? [{ ...place(closest.position), words: closest.matched.filter((m) => m.via === null).map((m) => claimWords.get(m.term) ?? m.term), related: [] }] : [];
  }

  const findings = input.findings.map((raw) => findingReport(raw, input));
  let verdict: ClaimVerdict;
  if (!claim) verdict = 'notAClaim';
  else if (!linked) verdict = 'unsupported';
  else if (findings.length > 0) verdict = 'contradicted';
  else verdict = 'supported';

  return {
    index: input.index,
    text: sentence.text,
    span: sentence.span,
    line: sentence.span ? lineOf(body, doc, sentence.span.start) : null,
    support,
    similarity: strength,
    claim,
    supported: verdict === 'supported' || verdict === 'notAClaim',
    verdict,
    reason: reasonFor(verdict, strength, support, findings, settings, input.kind),
    findings,
    copy: input.copy ? copiedFrom(input.copy, input) : null,
  };
}

function findingReport(raw: RawFinding, input: ClaimReportInput): ConsistencyFinding {
  const { analyzed, body, sentence } = input;
  const doc = analyzed.doc;
  const abstractSpan = locate(sentence.source, sentence.span, raw.abstractSays);
  let bodyPlace: ConsistencyFinding['body'] = null;
  if (raw.evidence) {
    const span = raw.bodySays ? locate(raw.evidence.source, raw.evidence.span, raw.bodySays)! : raw.evidence.span;
    bodyPlace = { sentence: raw.evidence.sentence, span, sentenceSpan: raw.evidence.span, line: lineOf(body, doc, span.start) };
  }
  let message: string;
  if (raw.note && bodyPlace && raw.bodySays) message = `abstract: ${raw.abstractSays} — ${raw.note}; nearest, line ${bodyPlace.line}: ${raw.bodySays}`;
  else if (raw.note) message = `abstract: ${raw.abstractSays} — ${raw.note}`;
  else message = `abstract: ${raw.abstractSays} — body, line ${bodyPlace?.line ?? '?'}: ${raw.bodySays ?? ''}`;
  return {
    kind: raw.kind,
    abstractSentence: input.index,
    abstractSays: raw.abstractSays,
    abstractSpan,
    abstractLine: abstractSpan ? lineOf(body, doc, abstractSpan.start) : null,
    bodySays: raw.bodySays,
    body: bodyPlace,
    message,
  };
}

function copiedFrom(copy: CopyMatch, input: ClaimReportInput): CopiedFrom {
  const doc = input.analyzed.doc;
  const sentences = copy.positions.map((p) => input.body.sentences[p]!);
  const first = doc.sentences[sentences[0]!]!.span;
  const last = doc.sentences[sentences.at(-1)!]!.span;
  const span: Span = { start: first.start, end: last.end };
  return { kind: copy.kind, sentences, span, line: lineOf(input.body, doc, span.start), containment: copy.containment };
}

function reasonFor(verdict: ClaimVerdict, strength: number, support: readonly SupportingSentence[], findings: readonly ConsistencyFinding[], settings: SupportSettings, kind: ClaimKind): string {
  if (verdict === 'notAClaim') return kind === 'link' ? 'points to a web address, which the body cannot support; not judged' : 'a lead-in or a line with too few content words; not judged';
  if (verdict === 'contradicted') {
    const more = findings.length > 1 ? ` (and ${findings.length - 1} more)` : '';
    return `the body says otherwise — ${findings[0]!.message}${more}`;
  }
  if (verdict === 'unsupported') {
    const closest = support[0];
    if (!closest) return 'nothing in the body shares its content words';
    const words = closest.words.length > 0 ? `, sharing ${quoted(closest.words.slice(0, 4))}` : '';
    return `its closest body sentences match it at ${percent(strength)}, below the ${percent(settings.supported)} the rule asks (closest: line ${closest.line}${words})`;
  }
  const parts = support.map((s, i) => {
    const what = s.words.length > 0 ? `${i === 0 ? 'has' : 'adds'} ${quoted(s.words.slice(0, 5))}` : 'adds related words';
    return `line ${s.line} (${s.heading || 'opening text'}) ${what}`;
  });
  const related = support.flatMap((s) => s.related).slice(0, 3).map((r) => `“${r.abstract}” matched by “${r.body}”`);
  const via = related.length > 0 ? `; ${related.join(', ')} (words this document uses together)` : '';
  return `${parts.join('; ')}${via} — match ${percent(strength)}`;
}

