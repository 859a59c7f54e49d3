// What src/core/formats/registry.ts gets in place of ./markdown/markdown in the twin test run.
export { parseMarkdownFast as parseMarkdown } from '../../../src/core/formats/markdown-it/index';
export type { MarkdownOptions } from '../../../src/core/formats/markdown/markdown-walker';
