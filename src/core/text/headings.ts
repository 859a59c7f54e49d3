/**
 * The one vocabulary of section headings: how headings are compared, and which kind of section a
 * heading names. The heading prior, Edmundson's location method, the abstract locator, the
 * default excluded sections and the trained model's section feature all read this table.
 *
 * The classes and phrases are a general English vocabulary of headings in design documents,
 * reports and papers (common practice, no source). Edmundson (1969) built the same kind of
 * "heading dictionary" for his location method.
 */

// Hoisted: the bundler turns a \p{…} literal into `new RegExp(…)`, which inside a function runs at every call.
const HEADING_WORD = /[\p{L}\p{N}]+(?:['’][\p{L}\p{N}]+)*/gu;

export type HeadingClass = 'abstract' | 'introduction' | 'proposal' | 'detail' | 'discussion' | 'aside' | 'backMatter';

export interface HeadingClassEntry {
  /**
   * How likely the section's sentences are to belong in a summary, as a multiplier (1 neutral):
   * sections that state the problem and the proposal weigh more than those that weigh options,
   * list open questions or point elsewhere.
   */
  readonly prior: number;
  /** Headings of this class, as people write them; matched as whole words anywhere in a heading. */
  readonly phrases: readonly string[];
}

export const HEADING_CLASSES: Readonly<Record<HeadingClass, HeadingClassEntry>> = {
  abstract: { prior: 1.5, phrases: ['Summary', 'Abstract', 'TL;DR', 'TLDR', 'Synopsis', 'Executive summary', 'In brief', 'At a glance'] },
  introduction: { prior: 1.4, phrases: ['Overview', 'Introduction', 'Motivation', 'Goals', 'Goal', 'Objectives', 'Objective', 'Purpose', 'Aims'] },
  proposal: {
    prior: 1.25,
    phrases: [
      'Background', 'Problem', 'Problem statement', 'Proposal', 'Proposed', 'Solution', 'Design', 'Approach', 'Explanation',
      'Description', 'Guide', 'Walkthrough', 'Conclusion', 'Conclusions', 'Key ideas', 'Results', 'Findings', 'Recommendation',
      'Recommendations', 'Context', 'Scope', 'Requirements',
    ],
  },
  detail: {
    prior: 0.9,
    phrases: [
      'Implementation', 'Rationale', 'Details', 'Examples', 'Example', 'Usage', 'Specification', 'Semantics', 'Syntax', 'Grammar',
      'Migration', 'Compatibility', 'Documentation', 'Teaching', 'Teach',
    ],
  },
  discussion: {
    prior: 0.75,
    phrases: [
      'Discussion', 'Risks', 'Caveats', 'Limitations', 'Costs', 'Cost', 'Security', 'Performance', 'Testing', 'Timeline', 'Schedule',
      'Status', 'Notes', 'Terminology', 'Definitions', 'Glossary', 'Non-goals', 'Test plan',
    ],
  },
  aside: {
    prior: 0.6,
    phrases: [
      'Alternatives', 'Alternative', 'Drawbacks', 'Drawback', 'Downsides', 'Unresolved', 'Open questions', 'Open issues', 'Questions',
      'FAQ', 'Future', 'Future work', 'Possibilities', 'Extensions', 'Prior art', 'Related work', 'History', 'Appendix', 'Appendices',
      'Rejected ideas',
    ],
  },
  backMatter: {
    prior: 0.4,
    phrases: [
      'References', 'Bibliography', 'See also', 'Further reading', 'Links', 'Acknowledgements', 'Acknowledgments', 'Credits',
      'Changelog', 'Change log', 'Revision history', 'License', 'Copyright', 'Footnotes', 'Contents', 'Table of contents',
    ],
  },
};

/** Section headings left out of summaries unless the user says otherwise: the back matter. */
export const DEFAULT_EXCLUDED_HEADINGS: readonly string[] = HEADING_CLASSES.backMatter.phrases;

/**
 * Tried only when no abstract-class heading is present: an "Overview" is often an introduction
 * rather than a summary, so it never wins over a real "Summary".
 */
export const FALLBACK_ABSTRACT_HEADINGS: readonly string[] = ['Overview'];

const NUMBERING = /^\s*(?:\d+(?:\.\d+)*\.?|[ivxlc]+\.|[a-z]\))\s+/iu;

/** Heading words: section numbering dropped ("2.1", "IV."), lower case, letters and digits only. */
export function headingWords(heading: string): string[] {
  return heading.replace(NUMBERING, '').toLowerCase().match(HEADING_WORD) ?? [];
}

/** Headings compared without numbering, punctuation or case: "7. References" matches "references". */
export function normalizeHeading(heading: string): string {
  return headingWords(heading).join(' ');
}

export function sameHeading(a: string, b: string): boolean {
  return normalizeHeading(a) === normalizeHeading(b);
}

interface ClassPhrase {
  readonly words: readonly string[];
  readonly headingClass: HeadingClass;
}

const CLASS_PHRASES: readonly ClassPhrase[] = (Object.keys(HEADING_CLASSES) as HeadingClass[]).flatMap((headingClass) =>
  HEADING_CLASSES[headingClass].phrases.map((phrase) => ({ words: headingWords(phrase), headingClass })),
);

function containsPhrase(words: readonly string[], phrase: readonly string[]): boolean {
  if (phrase.length === 0) return false;
  outer: for (let i = 0; i + phrase.length <= words.length; i++) {
    for (let k = 0; k < phrase.length; k++) if (words[i + k] !== phrase[k]) continue outer;
    return true;
  }
  return false;
}

/**
 * The classes a heading names, one entry per matching phrase. Only the longest matching phrases
 * count, so "Future work" is judged by its own entry rather than by "Future" and "work" apart.
 */
export function headingClassesOf(heading: string): HeadingClass[] {
  // Several rankers and the selector ask about every section's heading: each heading is read once.
  let classes = classesByHeading.get(heading);
  if (classes === undefined) {
    classes = classesOfHeading(heading);
    if (classesByHeading.size >= MAX_CACHED_HEADINGS) classesByHeading.clear();
    classesByHeading.set(heading, classes);
  }
  return [...classes];
}

const classesByHeading = new Map<string, readonly HeadingClass[]>();
const MAX_CACHED_HEADINGS = 10_000;

function classesOfHeading(heading: string): HeadingClass[] {
  const words = headingWords(heading);
  const matched = CLASS_PHRASES.filter((entry) => containsPhrase(words, entry.words));
  return matched
    .filter((entry) => !matched.some((other) => other !== entry && other.words.length > entry.words.length && containsPhrase(other.words, entry.words)))
    .map((entry) => entry.headingClass);
}
