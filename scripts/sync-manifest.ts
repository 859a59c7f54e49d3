/** Writes the settings block of package.json from the option schema: `npm run sync-manifest`. */
import { readFileSync, writeFileSync } from 'node:fs';
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
console.log(`package.json: ${Object.keys(generated.configuration.properties).length} settings, ${generated.restrictedConfigurations.length} restricted`);
