import assert from 'node:assert/strict';
import { readdirSync, readFileSync } from 'node:fs';
import { l10nKeys } from '../../scripts/l10n-keys';

const root = new URL('../../', import.meta.url);
const json = (path: string): Record<string, string> => JSON.parse(readFileSync(new URL(path, root), 'utf8'));
const placeholders = (text: string): string[] => [...text.matchAll(/\{(\d+)\}/g)].map((m) => m[1]!).sort();

describe('localization: every user-visible string has a translation', () => {
  const manifest = readFileSync(new URL('package.json', root), 'utf8');
  const english = json('package.nls.json');

  it('package.json names every text by a %key% that package.nls.json defines', () => {
    const used = [...manifest.matchAll(/"%([^"%]+)%"/g)].map((m) => m[1]!);
    assert.ok(used.length > 40, `${used.length} keys`);
    for (const key of used) assert.ok(english[key], key);
    for (const key of Object.keys(english)) assert.ok(used.includes(key), `${key} is used`);
    // No English text left in place of a key where people read it.
    const parsed = JSON.parse(manifest);
    for (const command of parsed.contributes.commands) assert.match(command.title, /^%.+%$/, command.command);
    for (const property of Object.values(parsed.contributes.configuration.properties) as { markdownDescription: string }[]) assert.match(property.markdownDescription, /^%.+%$/);
  });

  for (const file of readdirSync(new URL('.', root)).filter((name) => /^package\.nls\.[a-z-]+\.json$/.test(name))) {
    it(`${file} translates every manifest string, with the same placeholders`, () => {
      const translated = json(file);
      assert.deepEqual(Object.keys(translated).sort(), Object.keys(english).sort());
      for (const [key, text] of Object.entries(translated)) {
        assert.ok(text.trim().length > 0 && text !== english[key] || /^[A-Z][a-z]+$/.test(text), `${file}: ${key} is translated`);
        assert.deepEqual(placeholders(text), placeholders(english[key]!), key);
      }
    });
  }

  const keys = l10nKeys();
  it('finds the strings the extension localizes (the scan itself works)', () => {
    assert.ok(keys.length > 100, `${keys.length} strings`);
    assert.ok(keys.includes('reads in about {0} min (document about {1} min)'));
    assert.ok(keys.includes('Summarize'));
  });

  const bundles = readdirSync(new URL('l10n/', root)).filter((name) => /^bundle\.l10n\.[a-z-]+\.json$/.test(name));
  it('ships at least one complete translation bundle', () => assert.ok(bundles.length >= 1));
  for (const file of bundles) {
    it(`l10n/${file} translates every string of the extension and the panel, with the same placeholders`, () => {
      const bundle = json(`l10n/${file}`);
      const missing = keys.filter((key) => !bundle[key]);
      assert.deepEqual(missing, [], `${missing.length} untranslated`);
      for (const key of keys) assert.deepEqual(placeholders(bundle[key]!), placeholders(key), key);
      assert.deepEqual(Object.keys(bundle).filter((key) => !keys.includes(key)), [], 'no stale entries');
    });
  }
});
