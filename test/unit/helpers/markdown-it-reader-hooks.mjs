// Module resolution hook for the twin test run (npm run test:markdown-it), for modules loaded
// through `import`: see use-markdown-it-reader.mjs.
import { redirect } from './markdown-it-reader-redirect.mjs';

export async function resolve(specifier, context, nextResolve) {
  const resolved = await nextResolve(specifier, context);
  const url = redirect(resolved.url, context.parentURL ?? '');
  return url === resolved.url ? resolved : { ...resolved, url };
}
