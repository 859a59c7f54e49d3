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
