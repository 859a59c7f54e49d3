/**
 * The `contributes.configuration` block and the restricted settings of package.json, generated
 * from the engine's option schema (src/core/options/schema.ts). `npm run sync-manifest` writes them;
 * test/unit/extension-manifest.test.ts fails when package.json and the schema disagree.
 */
import { ALL_OPTIONS, type OptionDefinition } from '../src/core/index';

export const SETTINGS_SECTION = 'tersely';

type Property = Record<string, unknown>;

/** English text of each `%key%` placeholder the block uses (package.nls.json; translations beside it). */
export type NlsStrings = Record<string, string>;

function property(definition: OptionDefinition<unknown>, nls: NlsStrings): Property {
  const { kind, setting } = definition;
  const base = `config.${setting!.key}`;
  const localized = (key: string, english: string): string => {
    nls[key] = english;
    return `%${key}%`;
  };
  const json = kind.json;
  const value = json.type === 'string' ? kind.toText(definition.default) : definition.default;
  const out: Property = { type: json.type };
  if (json.enum) out.enum = [...json.enum];
  if (json.enumDescriptions) out.enumDescriptions = json.enumDescriptions.map((text, i) => localized(`${base}.${json.enum![i]}`, text));
  if (json.minimum !== undefined) out.minimum = json.minimum;
  if (json.maximum !== undefined) out.maximum = json.maximum;
  if (json.pattern) out.pattern = json.pattern;
  if (json.patternErrorMessage) out.patternErrorMessage = localized(`${base}.patternError`, json.patternErrorMessage);
  if (json.items) out.items = { ...json.items };
  if (json.maxItems !== undefined) out.maxItems = json.maxItems;
  if (json.maxLength !== undefined) out.maxLength = json.maxLength;
  out.default = Array.isArray(value) ? [...value] : value;
  out.markdownDescription = localized(`${base}.description`, definition.description);
  if (setting!.scope) out.scope = setting!.scope;
  out.order = setting!.order;
  return out;
}

export interface SettingsManifest {
  readonly configuration: { readonly title: string; readonly properties: Record<string, Property> };
  readonly restrictedConfigurations: readonly string[];
  /** The English strings behind the placeholders, for package.nls.json. */
  readonly nls: NlsStrings;
}

export function settingsManifest(): SettingsManifest {
  const surfaced = ALL_OPTIONS.filter(([, d]) => d.setting).sort((a, b) => a[1].setting!.order - b[1].setting!.order);
  const properties: Record<string, Property> = {};
  const nls: NlsStrings = {};
  for (const [, definition] of surfaced) properties[`${SETTINGS_SECTION}.${definition.setting!.key}`] = property(definition, nls);
  return {
    nls,
    configuration: { title: 'Tersely', properties },
    restrictedConfigurations: surfaced.filter(([, d]) => d.setting!.restricted).map(([, d]) => `${SETTINGS_SECTION}.${d.setting!.key}`),
  };
}
