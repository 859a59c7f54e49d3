/**
 * Every English string the extension sends through `vscode.l10n.t`: the literals in
 * src/extension, the panel's labels, the stage names, the feature words and labels and the method
 * descriptions. test/unit/extension-l10n.test.ts checks each translation bundle holds them all.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { METHOD_INFO } from '../src/core/index';
import { MAXENT_FEATURES } from '../src/core/rank/trained/maxent-features';
import { SUMMARY_STAGES } from '../src/extension/messages';
import { PANEL_TEXT } from '../src/extension/panel-text';
import { FEATURE_LABELS, FEATURE_WORDS } from '../src/extension/why-text';

const LITERAL = /\bt\(\s*'((?:[^'\\]|\\.)*)'/g;

export function l10nKeys(): string[] {
  const keys = new Set<string>();
  const dir = new URL('../src/extension/', import.meta.url);
  for (const file of readdirSync(dir).filter((f) => f.endsWith('.ts'))) {
    const source = readFileSync(new URL(file, dir), 'utf8');
    for (const match of source.matchAll(LITERAL)) keys.add(match[1]!.replace(/\\'/g, "'").replace(/\\\\/g, '\\'));
  }
  for (const value of Object.values(PANEL_TEXT)) keys.add(value);
  for (const stage of SUMMARY_STAGES) keys.add(stage.label);
  for (const value of Object.values(FEATURE_WORDS)) keys.add(value);
  for (const value of Object.values(FEATURE_LABELS)) keys.add(value);
  // The values of the trained models' discrete features (the naive Bayes features are among them).
  for (const feature of MAXENT_FEATURES) if (feature.arity > 1) for (const value of feature.values) keys.add(value);
  for (const method of METHOD_INFO) {
    keys.add(method.label);
    keys.add(method.detail);
    keys.add(method.numbers);
  }
  return [...keys].sort();
}

if (process.argv[1]?.endsWith('l10n-keys.ts')) console.log(JSON.stringify(l10nKeys(), null, 2));
