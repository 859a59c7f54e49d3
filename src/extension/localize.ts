/**
 * The editor's localization API in one place: the wording used for every user-visible string
 * (`vscode.l10n.t`, translations in l10n/bundle.l10n.*.json; the manifest's in package.nls*.json)
 * and the panel's labels, translated before they are sent.
 */
import * as vscode from 'vscode';
import { PANEL_TEXT, type PanelText } from './panel-text';
import { wordingFor, type Wording } from './wording';

export function editorWording(): Wording {
  return wordingFor(vscode.env.language || 'en', (message, args) => vscode.l10n.t(message, ...args));
}

export function localizedPanelText(): PanelText {
  return Object.fromEntries(Object.entries(PANEL_TEXT).map(([key, english]) => [key, vscode.l10n.t(english)])) as unknown as PanelText;
}
