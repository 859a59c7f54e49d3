/**
 * Heading prior: how likely a section's sentences are to belong in a summary, judged from the
 * section's heading alone.
 *
 * Idea from H. P. Edmundson, "New Methods in Automatic Extracting", JACM 16(2), 1969: the
 * "location" method gives sentences under headings such as Introduction or Conclusions more weight
 * (Edmundson collected a "heading dictionary" of such words). The vocabulary and the weight of each
 * kind of heading live in text/headings.ts.
 */
import { HEADING_CLASSES, headingClassesOf } from '../text/headings';

/** Weight of one heading: the mean prior of the heading classes it names, 1 when it names none. */
export function headingPrior(heading: string): number {
  const classes = headingClassesOf(heading);
  if (classes.length === 0) return 1;
  return classes.reduce((sum, c) => sum + HEADING_CLASSES[c].prior, 0) / classes.length;
}

/**
 * Prior of every section: its own heading's weight, or, when the vocabulary does not know its
 * heading, the nearest enclosing section's (an unknown "Parser changes" under "Design" inherits
 * Design's weight).
 */
export function sectionPriors(sections: readonly { readonly heading: string; readonly parent: number | null }[]): Float64Array {
  const priors = new Float64Array(sections.length);
  sections.forEach((section, index) => {
    if (headingClassesOf(section.heading).length > 0) {
      priors[index] = headingPrior(section.heading);
    } else {
      // Parents come before their children in document order, so the parent's prior is ready.
      priors[index] = section.parent === null ? 1 : priors[section.parent]!;
    }
  });
  return priors;
}

/** The prior of each sentence's section, one value per sentence (a ranker-shaped view). */
export function headingPriorScores(doc: {
  readonly sections: readonly { readonly heading: string; readonly parent: number | null }[];
  readonly sentences: readonly { readonly section: number }[];
}): Float64Array {
  const priors = sectionPriors(doc.sections);
  return Float64Array.from(doc.sentences, (sentence) => priors[sentence.section] ?? 1);
}
