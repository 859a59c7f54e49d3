// An esbuild plugin for every bundle that holds the Markdown reader: markdown-it's published build
// sets each class field through Babel's `_defineProperty(this, "name", value)` helper (every Token,
// every block and inline state). All fields of the whole library then go through one shared keyed
// store, which the runtime cannot specialise; as plain assignments (`this.name = value`) they are
// ordinary monomorphic stores. Measured in one process on 1 MB of corpus Markdown: a bare
// markdown-it parse 78-80 ms → 42-53 ms, the engine's whole reading 206-231 ms → 175-185 ms.
//
// The helper assigns unless the name is already on the prototype chain, where it defines an own
// property instead; markdown-it's classes have no accessors and no fields named like a method, so
// the assignment does the same. Both are checked here, and a build whose markdown-it no longer has
// this shape fails instead of shipping it unchanged or half changed.
import { readFile } from 'node:fs/promises';

const DIST_FILE = /[\\/]markdown-it[\\/]dist[\\/]markdown-it\.(?:mjs|cjs\.js)$/;
// `_defineProperty(this, "name", ` with an optional doc comment before the name; the call's closing
// parenthesis then closes the one opened in the replacement.
const FIELD = /_defineProperty\(\s*this,\s*(?:\/\*\*[\s\S]*?\*\/\s*)?"([A-Za-z_$][\w$]*)",\s*/g;
const ACCESSOR = /^\s*(?:static\s+)?(?:get|set)\s+[A-Za-z_$#][\w$]*\s*\(/m;
const METHOD = /^\t(?!(?:if|for|while|switch|catch|with|return|function)\b)(?:async\s+)?([A-Za-z_$][\w$]*)\s*\([^)]*\)\s*\{/gm;

/** The source with class fields as assignments; throws when the source is not shaped as expected. */
export function fieldsAsAssignments(source, file = 'markdown-it') {
  const fail = (why) => {
    throw new Error(`markdown-it-fields: ${file}: ${why}; update scripts/markdown-it-fields.mjs for this markdown-it version`);
  };
  if (ACCESSOR.test(source)) fail('a class has a getter or setter, which an assignment would call');
  const methods = new Set([...source.matchAll(METHOD)].map((m) => m[1]));
  const fields = new Set();
  const out = source.replace(FIELD, (_, name) => {
    fields.add(name);
    return `this.${name} = (`;
  });
  if (fields.size === 0) fail('no field set through _defineProperty(this, …) was found');
  if (/_defineProperty\(\s*this\b/.test(out)) fail('a field set through _defineProperty(this, …) was left');
  const clash = [...fields].filter((name) => methods.has(name));
  if (clash.length > 0) fail(`fields named like methods (${clash.join(', ')})`);
  return out;
}

export const markdownItFields = {
  name: 'markdown-it-fields',
  setup(build) {
    build.onLoad({ filter: DIST_FILE }, async (args) => ({ contents: fieldsAsAssignments(await readFile(args.path, 'utf8'), args.path), loader: 'js' }));
  },
};
