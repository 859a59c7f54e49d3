/**
 * The `title` field of a front matter block. Only this one top-level key is read, so a full YAML
 * or TOML parser is not needed: `title: Text` (YAML) or `title = "Text"` (TOML), optionally quoted.
 */

const YAML_TITLE = /^title[ \t]*:[ \t]*(.*?)[ \t]*$/m;
const TOML_TITLE = /^title[ \t]*=[ \t]*(.*?)[ \t]*$/m;

export function frontMatterTitle(value: string, kind: 'yaml' | 'toml'): string | null {
  const match = (kind === 'yaml' ? YAML_TITLE : TOML_TITLE).exec(value);
  if (match === null) return null;
  const title = unquote(match[1]!).trim();
  return title.length > 0 ? title : null;
}

function unquote(raw: string): string {
  const first = raw[0];
  if ((first === '"' || first === "'") && raw.length >= 2 && raw.endsWith(first)) return raw.slice(1, -1);
  return raw;
}
