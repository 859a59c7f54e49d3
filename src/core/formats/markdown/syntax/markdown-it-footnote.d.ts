// markdown-it-footnote ships no type declarations; this is the one export the reader uses.
declare module 'markdown-it-footnote' {
  import type { MarkdownIt } from 'markdown-it';

  export default function footnote(md: MarkdownIt): void;
}
