// Loaded with --import (after tsx) for the twin test run, npm run test:markdown-it: every test
// then runs with the markdown-it reader in place of the mdast reader, through the engine's own
// parseDocument, and nothing else changes. Test files reach the engine through `require` (mocha
// on Node with require(esm), tsx compiling TypeScript) or through `import`; both are redirected.
import Module, { register } from 'node:module';
import { redirect } from './markdown-it-reader-redirect.mjs';

register('./markdown-it-reader-hooks.mjs', import.meta.url);

const resolveFilename = Module._resolveFilename;
Module._resolveFilename = function (request, parent, ...rest) {
  return redirect(resolveFilename.call(this, request, parent, ...rest), parent?.filename ?? '');
};

process.env.TERSELY_MARKDOWN_READER = 'markdown-it';
