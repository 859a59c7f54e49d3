/** Writes the settings block of package.json, and its English strings in package.nls.json, from the option schema: `npm run sync-manifest`. */
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { settingsManifest } from './settings-manifest';

const path = new URL('../package.json', import.meta.url);
const manifest = JSON.parse(readFileSync(path, 'utf8')) as {
  contributes: { configuration: unknown };
  capabilities: { untrustedWorkspaces: { restrictedConfigurations: readonly string[] } };
};
const generated = settingsManifest();
manifest.contributes.configuration = generated.configuration;
manifest.capabilities.untrustedWorkspaces.restrictedConfigurations = generated.restrictedConfigurations;
writeFileSync(path, JSON.stringify(manifest, null, 2) + '\n');
// The English strings: generated setting texts replace the old ones; the hand-written rest (commands, views, colours) stays.
const nlsPath = new URL('../package.nls.json', import.meta.url);
const nls = existsSync(nlsPath) ? (JSON.parse(readFileSync(nlsPath, 'utf8')) as Record<string, string>) : {};
for (const key of Object.keys(nls)) if (key.startsWith('config.')) delete nls[key];
writeFileSync(nlsPath, JSON.stringify({ ...nls, ...generated.nls }, null, 2) + '\n');
console.log(`package.json: ${Object.keys(generated.configuration.properties).length} settings, ${generated.restrictedConfigurations.length} restricted`);
