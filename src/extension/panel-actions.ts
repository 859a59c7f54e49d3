/** What the side panel asks for (already validated by parsePanelMessage), carried out. */
import * as vscode from 'vscode';
import type { TerselyContext } from './context';
import type { FromPanel } from './messages';
import { settingKeyOf } from './settings';

export async function handlePanelMessage(context: TerselyContext, message: FromPanel): Promise<void> {
  const { actions, settings } = context;
  switch (message.type) {
    case 'ready':
      return;
    case 'reveal':
      await actions.reveal(message.summaryId, message.sentence);
      return;
    case 'revealCheck':
      await context.abstractCheck.reveal(message.checkId, message.target);
      return;
    case 'revealDigest':
      await context.digester.reveal(message.digestId, message.target);
      return;
    case 'dismissCheck':
      context.abstractCheck.dismiss();
      return;
    case 'dismissDigest':
      context.digester.dismiss();
      return;
    case 'applyRepair':
      await actions.repair({ summaryId: message.summaryId, warning: message.warning, repair: message.repair });
      return;
    case 'setLength':
      await settings.update(settingKeyOf('budget')!, message.length);
      return;
    case 'setMethod':
      await settings.update(settingKeyOf('method')!, message.method);
      return;
    case 'setBalance':
      await settings.update(settingKeyOf('balance')!, message.enabled);
      return;
    case 'setFocus':
      await context.setFocus(message.focus);
      return;
    case 'command':
      await vscode.commands.executeCommand(`tersely.${message.command}`);
      return;
  }
}
