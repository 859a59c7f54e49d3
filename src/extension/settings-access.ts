/**
 * Tersely's settings as the extension reads them: fresh on every use, through the one parser
 * (settings.ts). Each invalid setting is reported once, with its name and the reason, in the log
 * and as a message that opens the setting; written back where the user's value lives.
 */
import * as vscode from 'vscode';
import { describeProblem, parseSettings, SETTINGS_SECTION, type SettingProblem, type TerselySettings } from './settings';

export { SETTINGS_SECTION };

export class SettingsAccess {
  /** Problems already reported (setting + reason), so a bad value is shown once, not on every read. */
  private readonly reported = new Set<string>();

  constructor(private readonly log: vscode.LogOutputChannel) {}

  read(): TerselySettings {
    const configuration = vscode.workspace.getConfiguration(SETTINGS_SECTION);
    const { settings, problems } = parseSettings((key) => configuration.get(key));
    for (const problem of problems) this.report(problem);
    return settings;
  }

  /** Problems reported so far (the in-editor tests read it through the API). */
  get reportedProblems(): readonly string[] {
    return [...this.reported];
  }

  private report(problem: SettingProblem): void {
    const id = `${problem.setting}\u0000${problem.reason}`;
    if (this.reported.has(id)) return;
    this.reported.add(id);
    const message = describeProblem(problem);
    this.log.warn(message);
    const open = vscode.l10n.t('Open the setting');
    void vscode.window.showWarningMessage(message, open).then((choice) => {
      if (choice === open) void vscode.commands.executeCommand('workbench.action.openSettings', problem.setting);
    });
  }

  /** Writes where the user's value lives now (workspace folder, workspace or user settings). */
  async update(key: string, value: unknown): Promise<void> {
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
