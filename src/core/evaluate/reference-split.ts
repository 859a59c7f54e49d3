/**
 * Cuts a document's own summary section (chosen by heading) out of it: the section becomes the
 * reference, the rest of the document the body to summarize. Used by the quality benchmark and by
 * training, so both read documents the same way.
 */
import { sameHeading } from '../text/headings';
import { parseDocument } from '../formats/registry';
import type { DocumentFormat, ParsedDocument, Section } from '../types';

export interface ReferenceSplit {
  /** The section's text after its heading line (sub-sections included). */
  readonly referenceText: string;
  /** The document with the whole section, heading included, removed. */
  readonly bodyText: string;
  /** The section that was cut out (offsets into the original text). */
  readonly section: Section;
}

/** Headings compare case-insensitively, ignoring surrounding space and a trailing colon. */

/** The first section headed `heading`, split off; null when there is none. */
export function splitReference(
  text: string,
  heading: string,
  format: DocumentFormat = 'markdown',
  parsed: ParsedDocument = parseDocument(text, { format }),
): ReferenceSplit | null {
  const section = parsed.sections.find((s) => s.headingSpan !== null && sameHeading(s.heading, heading));
  if (!section || !section.headingSpan) return null;
  const base = parsed.baseOffset;
  const start = section.span.start - base;
  const end = section.span.end - base;
  return {
    referenceText: text.slice(section.headingSpan.end - base, end),
    // Keep a line break where the section was so the text around it does not run together.
    bodyText: text.slice(0, start) + '\n' + text.slice(end),
    section,
  };
}

export interface IntroductionSplit {
  /** The introduction, without lines that hold only a URL (the blueprint line). */
  readonly referenceText: string;
  /** The title block, then everything from the first section heading on. */
  readonly bodyText: string;
}

/** A line that is only a URL, such as `https://blueprints.launchpad.net/nova/+spec/name`. */
const URL_LINE = /^[ \t]*<?[a-zA-Z][a-zA-Z0-9+.-]*:\/\/\S+>?[ \t]*$/gm;

/**
 * Splits a document at its introduction (the nova-specs corpus README's procedure, used by its
 * benchmark and by training on documents without a summary section); null when there is no section heading after it. The title
 * block is the document title (and subtitle) when the first heading is a title holding the other
 * sections; otherwise there is none and the introduction starts at the top.
 */
export function splitIntroduction(text: string, format: DocumentFormat = 'restructuredtext', parsed: ParsedDocument = parseDocument(text, { format })): IntroductionSplit | null {
  const headings = parsed.sections.filter((s) => s.headingSpan !== null);
  const [first, second] = headings;
  if (first === undefined) return null;
  const local = (offset: number) => offset - parsed.baseOffset;
  const titled = first.depth === 1 && second !== undefined && second.parent === first.index;
  const firstSection = titled ? second! : first;
  let introStart = 0;
  if (titled) {
    introStart = local(first.headingSpan!.end);
    const subtitle = parsed.skipped.find((s) => s.reason === 'subtitle' && local(s.span.start) >= introStart);
    if (subtitle !== undefined && local(subtitle.span.end) <= local(firstSection.headingSpan!.start)) introStart = local(subtitle.span.end);
  }
  const sectionStart = local(firstSection.headingSpan!.start);
  return {
    referenceText: text.slice(introStart, sectionStart).replace(URL_LINE, ''),
    bodyText: text.slice(0, introStart) + '\n\n' + text.slice(sectionStart),
  };
}
