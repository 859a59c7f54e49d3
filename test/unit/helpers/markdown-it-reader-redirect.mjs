// The one redirection of the twin test run: where the engine's src/core/formats/registry.ts
// imports the mdast reader (./markdown/markdown), it gets the markdown-it reader instead. Works on
// file URLs and on paths alike.
const READER = '/src/core/formats/markdown/markdown.ts';
const IMPORTER = '/src/core/formats/registry.ts';
const SHIM = new URL('./markdown-it-as-default-reader.ts', import.meta.url);

export function redirect(resolved, parent) {
  if (!resolved.endsWith(READER) || !parent.endsWith(IMPORTER)) return resolved;
  return resolved.startsWith('file:') ? SHIM.href : SHIM.pathname;
}
