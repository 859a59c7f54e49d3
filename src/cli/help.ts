export const HELP = `tersely — short, faithful, extractive summaries of Markdown and plain text

Usage
  tersely summarize FILE... [options]   summarize files ("-" reads standard input)
  tersely check FILE [options]          check a hand-written abstract against its document
  tersely train DIR [options]           learn sentence weights from documents with their own summaries

summarize options
  --sentences N        summary length in sentences
  --words N            summary length in words (a hard limit)
  --ratio R            summary length as a share of the document's words, 0.01-1 (default 0.15,
                       at least 3 sentences)
  --method NAME        blend (default), position, luhn, edmundson, lexrank, textrank, centroid, bayes
  --no-balance         do not share the length across sections
  --balance-depth N    heading levels that count as sections for balance (default 1)
  --exclude HEADING    leave out sections with this heading (repeatable; default: References,
                       Changelog, Contents, License, Acknowledgements)
  --repair MODE        suggest (default: flag sentences that may not stand alone) or auto (repair them)
  --include-tables     summarize table cells as prose
  --lang CODE          language for stop words and stemming: auto (default), en, de, fr, es, ...
  --model FILE         model for --method bayes (from tersely train)
  --plain-text         treat every input as plain text (default: by file extension; stdin is Markdown)
  --format FORMAT      text (default), markdown, or json (one object per file, one per line)

check options
  --abstract-heading TEXT   the section holding the abstract (default: Summary, Abstract or TL;DR)
  --abstract FILE           read the abstract from a separate file instead
  --format FORMAT           text (default) or json
  --lang CODE               language for stop words and stemming (default: auto)

train options
  --reference-heading TEXT  heading of the section holding each document's own summary (required)
  --out FILE                where to write the model (required)
  --match REGEX             only files whose name matches (e.g. '^\\d*[02468]-')
  --lang CODE               language of the documents (default: auto)
  --quiet                   no progress lines

The summary quotes sentences from the document; it can drop context that a sentence relied on.
Colour is used on terminals unless NO_COLOR is set.
`;
