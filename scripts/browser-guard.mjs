// An esbuild plugin for bundles that run in a browser (the web extension, its engine worker, the
// panel script): any import of a Node built-in fails the build, naming the module and who imported it.
import { builtinModules } from 'node:module';

const names = builtinModules.filter((name) => !name.startsWith('_')).map((name) => name.replace(/[/\\^$.*+?()[\]{}|-]/g, '\\$&'));
const NODE_BUILTIN = new RegExp(`^(node:.*|(${names.join('|')})(/.*)?)$`);

export const noNodeBuiltins = {
  name: 'no-node-builtins',
  setup(build) {
    build.onResolve({ filter: NODE_BUILTIN }, (args) => ({
      errors: [{ text: `"${args.path}" is a Node built-in, but this bundle runs in a browser (imported by ${args.importer || 'the entry point'})` }],
    }));
  },
};
