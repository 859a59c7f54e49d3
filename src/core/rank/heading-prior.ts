/**
 * Heading prior: how likely a section's sentences are to belong in a summary, judged from the
 * section's heading alone.
 *
 * Idea from H. P. Edmundson, "New Methods in Automatic Extracting", JACM 16(2), 1969: the
 * "location" method gives sentences under headings such as Introduction or Conclusions more weight
 * (Edmundson collected a "heading dictionary" of such words), the "title" method rewards sentences
 * that share words with headings. This module is the location part, with a general English
 * vocabulary of headings found in design documents, reports and papers (common practice, no
 * source): sections that state the problem and the proposal carry more weight than sections that
 * weigh options, list open questions or point elsewhere.
 */

export interface HeadingRule {
  /** Lower-case words that must appear consecutively in the heading. */
  readonly phrase: readonly string[];
  /** Multiplier for the section's sentences: 1 is neutral, above 1 favours, below 1 disfavours. */
  readonly weight: number;
}

/** Heading words and their weights. A heading matching several rules gets their mean weight. */
export const DEFAULT_HEADING_RULES: readonly HeadingRule[] = [
  ...rules(1.5, ['summary', 'abstract', 'tl;dr', 'tldr', 'synopsis', 'executive summary', 'in brief', 'at a glance']),
  ...rules(1.4, ['overview', 'introduction', 'motivation', 'goals', 'goal', 'objectives', 'objective', 'purpose', 'aims']),
  ...rules(1.25, ['background', 'problem', 'problem statement', 'proposal', 'proposed', 'solution', 'design', 'approach', 'explanation', 'description', 'guide', 'walkthrough', 'conclusion', 'conclusions', 'key ideas', 'results', 'findings', 'recommendation', 'recommendations', 'context', 'scope', 'requirements']),
  ...rules(0.9, ['implementation', 'rationale', 'details', 'examples', 'example', 'usage', 'specification', 'semantics', 'syntax', 'grammar', 'migration', 'compatibility', 'documentation', 'teaching', 'teach']),
  ...rules(0.75, ['discussion', 'risks', 'caveats', 'limitations', 'costs', 'cost', 'security', 'performance', 'testing', 'timeline', 'schedule', 'status', 'notes', 'terminology', 'definitions', 'glossary']),
  ...rules(0.6, ['alternatives', 'alternative', 'drawbacks', 'drawback', 'downsides', 'unresolved', 'open questions', 'open issues', 'questions', 'faq', 'future', 'future work', 'possibilities', 'extensions', 'prior art', 'related work', 'history', 'appendix', 'appendices']),
  ...rules(0.4, ['references', 'bibliography', 'see also', 'further reading', 'links', 'acknowledgements', 'acknowledgments', 'credits', 'changelog', 'change log', 'revision history', 'license', 'contents', 'table of contents']),
];

function rules(weight: number, phrases: readonly string[]): HeadingRule[] {
  return phrases.map((phrase) => ({ phrase: headingWords(phrase), weight }));
}

/** Heading words: lower case, split on anything but letters, digits, ';' (for "tl;dr") and apostrophes. */
export function headingWords(heading: string): string[] {
  return heading.toLowerCase().match(/[\p{L}\p{N};']+/gu) ?? [];
}

function containsPhrase(words: readonly string[], phrase: readonly string[]): boolean {
  if (phrase.length === 0) return false;
  outer: for (let i = 0; i + phrase.length <= words.length; i++) {
    for (let k = 0; k < phrase.length; k++) if (words[i + k] !== phrase[k]) continue outer;
    return true;
  }
  return false;
}

/**
 * Weight of one heading (1 when no rule matches). Only the longest matching phrases count, so
 * "future work" is judged by its own rule rather than by "future" and "work" separately.
 */
export function headingPrior(heading: string, table: readonly HeadingRule[] = DEFAULT_HEADING_RULES): number {
  const words = headingWords(heading);
  const matched = table.filter((rule) => containsPhrase(words, rule.phrase));
  const kept = matched.filter(
    (rule) => !matched.some((other) => other !== rule && other.phrase.length > rule.phrase.length && containsPhrase(other.phrase, rule.phrase)),
  );
  if (kept.length === 0) return 1;
  return kept.reduce((sum, rule) => sum + rule.weight, 0) / kept.length;
}

/** Whether any rule speaks about this heading (a neutral weight of 1 can also come from a match). */
export function headingIsKnown(heading: string, table: readonly HeadingRule[] = DEFAULT_HEADING_RULES): boolean {
  const words = headingWords(heading);
  return table.some((rule) => containsPhrase(words, rule.phrase));
}

/**
 * Prior of every section: its own heading's weight, or, when no rule knows its heading, the
 * nearest enclosing section's ("Examples" under "Design" inherits nothing; an unknown
 * "Parser changes" under "Design" inherits Design's weight).
 */
export function sectionPriors(
  sections: readonly { readonly heading: string; readonly parent: number | null }[],
  table: readonly HeadingRule[] = DEFAULT_HEADING_RULES,
): Float64Array {
  const priors = new Float64Array(sections.length);
  sections.forEach((section, index) => {
    if (headingIsKnown(section.heading, table)) {
      priors[index] = headingPrior(section.heading, table);
    } else {
      // Parents come before their children in document order, so the parent's prior is ready.
      priors[index] = section.parent === null ? 1 : priors[section.parent]!;
    }
  });
  return priors;
}

/** The prior of each sentence's section, one value per sentence (a ranker-shaped view). */
export function headingPriorScores(
  doc: {
    readonly sections: readonly { readonly heading: string; readonly parent: number | null }[];
    readonly sentences: readonly { readonly section: number }[];
  },
  table: readonly HeadingRule[] = DEFAULT_HEADING_RULES,
): Float64Array {
  const priors = sectionPriors(doc.sections, table);
  return Float64Array.from(doc.sentences, (sentence) => priors[sentence.section] ?? 1);
}
