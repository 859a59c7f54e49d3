/**
 * The side panel's script (runs in the webview). Every message is checked field by field before
 * use (to-panel.ts); a malformed one is dropped and logged. Document text is put on the page with
 * `textContent` only. The saved webview state holds only what restoring needs (scroll position,
 * open parts, the summary id): the content itself is sent again by the extension on `ready`.
 */
import type { FromPanel, NoticeKind, PanelAbstractCheck, PanelControls, PanelDigest, PanelProgress, PanelSummary } from '../extension/messages';
import { PANEL_TEXT, type PanelText } from '../extension/panel-text';
import { isToPanel } from '../extension/to-panel';
import { el } from './dom';
import { renderCheck, renderDigest, renderEmpty, renderSummary, collapsible, type RenderActions } from './panel-render';
import { restoreState, stateToSave, type SavedState } from './panel-state';
import { progressView } from './progress-view';
import { rovingList, type RovingList } from './roving-list';

interface VsCodeApi {
  postMessage(message: FromPanel): void;
  getState(): unknown;
  setState(state: SavedState): void;
}
declare function acquireVsCodeApi(): VsCodeApi;

const vscode = acquireVsCodeApi();
const saved = restoreState(vscode.getState());
let text: PanelText = PANEL_TEXT;
let summary: PanelSummary | null = null;
let controls: PanelControls | null = null;
let check: PanelAbstractCheck | null = null;
let digest: PanelDigest | null = null;
let notice: { kind: NoticeKind; text: string } | null = null;
let busy: PanelProgress | null = null;
const open = new Set<string>(saved.open);
let summaryList: RovingList | null = null;

function save(): void {
  vscode.setState(stateToSave(window.scrollY, open, summary?.id ?? null));
}

const post = (message: FromPanel): void => vscode.postMessage(message);

const actions: RenderActions = {
  reveal: (summaryId, sentence) => post({ type: 'reveal', summaryId, sentence }),
  repair: (summaryId, warning, repair) => post({ type: 'applyRepair', summaryId, warning, repair }),
  revealCheck: (checkId, target) => post({ type: 'revealCheck', checkId, target }),
  dismissCheck: () => {
    check = null;
    renderCheckPart();
    post({ type: 'dismissCheck' });
  },
  revealDigest: (digestId, target) => post({ type: 'revealDigest', digestId, target }),
  dismissDigest: () => {
    digest = null;
    renderContent();
    renderDigestPart();
    post({ type: 'dismissDigest' });
  },
  toggled: (name, isOpen) => {
    if (isOpen) open.add(name);
    else open.delete(name);
    save();
  },
};

// ---------- skeleton: toolbar, progress, notice, content, settings, check, announcer ----------

const app = document.getElementById('app')!;
const toolbar = el('div', { className: 'toolbar', attrs: { role: 'toolbar' } });
const progress = progressView();
const noticeBox = el('div', { className: 'notice', attrs: { role: 'status', hidden: '' } });
const content = el('div', { className: 'content', attrs: { id: 'content' } });
const settingsPart = el('div', { className: 'settings-slot' });
const focusPart = el('div', { className: 'focus-slot' });
const checkPart = el('div', { className: 'check-slot' });
const digestPart = el('div', { className: 'digest-slot' });
const announcer = el('div', { className: 'visually-hidden', attrs: { role: 'status', 'aria-live': 'polite', id: 'announcer' } });
app.append(toolbar, focusPart, progress.element, noticeBox, content, checkPart, digestPart, settingsPart, announcer);

function commandButton(label: string, title: string, command: Extract<FromPanel, { type: 'command' }>['command'], primary: boolean, disabled = false): HTMLButtonElement {
  const button = el('button', { className: primary ? 'primary' : 'secondary', attrs: { type: 'button', title, 'aria-label': title, 'data-command': command } }, [label]);
  button.disabled = disabled;
  button.addEventListener('click', () => post({ type: 'command', command }));
  return button;
}

function renderToolbar(): void {
  const none = summary === null;
  const live = controls?.live ?? false;
  const liveButton = commandButton(live ? text.liveOn : text.liveOff, text.liveTitle, 'toggleLive', false);
  liveButton.id = 'live';
  liveButton.setAttribute('aria-pressed', String(live));
  toolbar.setAttribute('aria-label', text.summaryHeading);
  toolbar.replaceChildren(
    commandButton(text.summarize, text.summarizeTitle, 'summarizeDocument', true, busy?.task === 'summarize'),
    commandButton(text.copy, text.copyTitle, 'copySummary', false, none),
    commandButton(text.insert, text.insertTitle, 'insertSummary', false, none),
    liveButton,
  );
}

function renderSettings(): void {
  if (!controls) {
    settingsPart.replaceChildren();
    return;
  }
  const current = controls;
  const length = el('input', { attrs: { id: 'length', type: 'text', inputmode: 'text', spellcheck: 'false', 'aria-describedby': 'length-help', size: '7' } });
  length.value = current.length;
  const send = (): void => {
    if (length.value.trim() !== current.length) post({ type: 'setLength', length: length.value.trim() });
  };
  length.addEventListener('change', send);
  length.addEventListener('keydown', (event) => {
    if (event.key === 'Enter') send();
  });
  const method = el(
    'select',
    { attrs: { id: 'method' } },
    current.methods.map((m) => el('option', { attrs: { value: m.value, title: m.detail } }, [m.label])),
  );
  method.value = current.method;
  method.title = current.methods.find((m) => m.value === current.method)?.detail ?? '';
  method.addEventListener('change', () => post({ type: 'setMethod', method: method.value as PanelControls['method'] }));
  const balance = el('input', { attrs: { id: 'balance', type: 'checkbox' } });
  balance.checked = current.balance;
  balance.addEventListener('change', () => post({ type: 'setBalance', enabled: balance.checked }));
  settingsPart.replaceChildren(
    collapsible(
      'settings',
      text.settings,
      open.has('settings'),
      [
        el('div', { className: 'row' }, [el('label', { attrs: { for: 'length' } }, [text.length]), length, el('span', { className: 'help', attrs: { id: 'length-help' } }, [text.lengthHelp])]),
        el('div', { className: 'row' }, [el('label', { attrs: { for: 'method' } }, [text.method]), method]),
        el('div', { className: 'row' }, [balance, el('label', { attrs: { for: 'balance' } }, [text.balance])]),
      ],
      actions,
      'settings',
    ),
  );
}

/** The focus box: always in view under the toolbar; recent focuses offered as suggestions. */
function renderFocus(): void {
  if (!controls) {
    focusPart.replaceChildren();
    return;
  }
  const current = controls;
  const input = el('input', {
    attrs: { id: 'focus', type: 'search', spellcheck: 'false', list: 'recent-focuses', placeholder: text.focusPlaceholder, 'aria-describedby': 'focus-help', maxlength: '500' },
  });
  input.value = current.focus;
  const recent = el('datalist', { attrs: { id: 'recent-focuses' } }, current.recentFocuses.map((focus) => el('option', { attrs: { value: focus } })));
  const send = (value: string): void => {
    if (value.trim() !== current.focus) post({ type: 'setFocus', focus: value.trim() });
  };
  input.addEventListener('keydown', (event) => {
    if (event.key === 'Enter') send(input.value);
  });
  const apply = el('button', { className: 'secondary', attrs: { type: 'button', id: 'focus-apply', title: text.focusApplyTitle } }, [text.focusApply]);
  apply.addEventListener('click', () => send(input.value));
  const clear = el('button', { className: 'secondary', attrs: { type: 'button', id: 'focus-clear', title: text.focusClearTitle } }, [text.focusClear]);
  clear.disabled = current.focus === '';
  clear.addEventListener('click', () => send(''));
  focusPart.replaceChildren(
    el('div', { className: 'focus-row', attrs: { role: 'search', 'aria-label': text.focus } }, [el('label', { attrs: { for: 'focus' } }, [text.focus]), input, apply, clear, recent]),
    el('p', { className: 'help', attrs: { id: 'focus-help' } }, [text.focusHelp]),
  );
}

function renderNotice(): void {
  noticeBox.textContent = notice?.text ?? '';
  noticeBox.dataset['kind'] = notice?.kind ?? '';
  noticeBox.hidden = !notice || notice.text.length === 0;
  content.classList.toggle('stale', notice?.kind === 'stale');
}

function renderContent(): void {
  const hadFocus = content.contains(document.activeElement);
  const at = summaryList?.current ?? 0;
  if (!summary) {
    summaryList = null;
    // With a digest on show, "No summary yet" (and a second copy of the caution) would only push it down.
    content.replaceChildren(...(digest ? [] : [renderEmpty(text)]));
    return;
  }
  const current = summary;
  const { element, items } = renderSummary(current, text, actions, open);
  content.replaceChildren(element);
  summaryList = rovingList(element, items, (index) => actions.reveal(current.id, Number(items[index]!.dataset['sentence'])), Math.min(at, items.length - 1));
  if (hadFocus) summaryList.focus(summaryList.current);
}

function renderCheckPart(): void {
  if (!check) {
    checkPart.replaceChildren();
    return;
  }
  const current = check;
  const { element, items } = renderCheck(current, text, actions);
  checkPart.replaceChildren(element);
  rovingList(element, items, (index) => {
    const target = items[index]!.dataset['target'];
    if (target !== undefined) actions.revealCheck(current.id, Number(target));
  });
}

function renderDigestPart(): void {
  if (!digest) {
    digestPart.replaceChildren();
    return;
  }
  const current = digest;
  const { element, items } = renderDigest(current, text, actions);
  digestPart.replaceChildren(element);
  rovingList(element, items, (index) => actions.revealDigest(current.id, Number(items[index]!.dataset['target'])));
}

function renderAll(): void {
  document.documentElement.lang = text === PANEL_TEXT ? 'en' : document.documentElement.lang;
  renderToolbar();
  renderSettings();
  renderFocus();
  renderNotice();
  renderContent();
  renderCheckPart();
  renderDigestPart();
}

function handle(message: import('../extension/messages').ToPanel): void {
  switch (message.type) {
    case 'summary': {
      const isNewSummary = summary?.id !== message.summary.id;
      summary = message.summary;
      notice = null;
      renderNotice();
      renderContent();
      renderToolbar();
      // A new summary starts at its top; a repair of the same one keeps the place.
      if (isNewSummary) window.scrollTo(0, 0);
      break;
    }
    case 'controls':
      controls = message.controls;
      renderSettings();
      renderFocus();
      renderToolbar();
      break;
    case 'text':
      text = message.text;
      renderAll();
      break;
    case 'progress':
      busy = message.progress;
      progress.render(message.progress);
      content.setAttribute('aria-busy', String(message.progress !== null));
      renderToolbar();
      return;
    case 'notice':
      notice = message.text ? { kind: message.kind, text: message.text } : null;
      renderNotice();
      break;
    case 'abstractCheck': {
      const isNewCheck = message.check !== null && check?.id !== message.check.id;
      check = message.check;
      renderCheckPart();
      if (isNewCheck) checkPart.scrollIntoView({ block: 'start' });
      break;
    }
    case 'digest': {
      const isNewDigest = message.digest !== null && digest?.id !== message.digest.id;
      digest = message.digest;
      renderContent();
      renderDigestPart();
      if (isNewDigest) digestPart.scrollIntoView({ block: 'start' });
      break;
    }
    case 'announce':
      // Cleared first so the same words are announced again.
      announcer.textContent = '';
      setTimeout(() => (announcer.textContent = message.text), 50);
      return;
    case 'focus':
      if (summaryList) summaryList.focus(summaryList.current);
      else toolbar.querySelector<HTMLButtonElement>('button')?.focus();
      return;
    case 'clear':
      summary = null;
      renderContent();
      renderToolbar();
      break;
  }
  save();
}

window.addEventListener('message', (event: MessageEvent<unknown>) => {
  // Only the extension (through the webview host) posts to this window; anything else is dropped.
  if (isToPanel(event.data)) handle(event.data);
  else console.warn(`Tersely panel: ignored a malformed message${typeof (event.data as { type?: unknown })?.type === 'string' ? ` of type ${String((event.data as { type: string }).type).slice(0, 40)}` : ''}.`);
});

let scrollTimer: ReturnType<typeof setTimeout> | undefined;
window.addEventListener('scroll', () => {
  clearTimeout(scrollTimer);
  scrollTimer = setTimeout(save, 150);
});

renderAll();
window.scrollTo(0, saved.scrollY);
post({ type: 'ready' });
