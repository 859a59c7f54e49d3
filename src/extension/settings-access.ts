/**
 * Tersely's settings as the extension reads them: fresh on every use, through the one parser
 * (settings.ts), with each problem logged; and written back where the user's value lives.
 */
import * as vscode from 'vscode';
import { parseSettings, type SettingKey, type TerselySettings } from './settings';

export const SETTINGS_SECTION = 'tersely';

export class SettingsAccess {
  constructor(private readonly log: vscode.LogOutputChannel) {}

  read(): TerselySettings {
    const configuration = vscode.workspace.getConfiguration(SETTINGS_SECTION);
    const { settings, problems } = parseSettings((key) => configuration.get(key));
    for (const problem of problems) this.log.warn(problem);
    return settings;
  }

  /** Writes where the user's value lives now (workspace folder, workspace or user settings). */
  async update(key: SettingKey, value: unknown): Promise<void> {
    const configuration = vscode.workspace.getConfiguration(SETTINGS_SECTION);
    const inspected = configuration.inspect(key);
    const target =
      inspected?.workspaceFolderValue !== undefined
        ? vscode.ConfigurationTarget.WorkspaceFolder
        : inspected?.workspaceValue !== undefined
          ? vscode.ConfigurationTarget.Workspace
          : vscode.ConfigurationTarget.Global;
    await configuration.update(key, value, target);
  }
}
