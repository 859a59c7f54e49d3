/**
 * The side panel's script (runs in the webview). Every piece of document text is put on the page
 * with `textContent` or as an attribute value set through the DOM — never parsed as HTML — so a
 * document full of markup stays inert text. The panel keeps its state with getState/setState so
 * hiding and re-showing it loses nothing.
 */
import {
  isToPanel,
  type FromPanel,
  type NoticeKind,
  type PanelAbstractCheck,
  type PanelControls,
  type PanelGroup,
  type PanelSentence,
  type PanelShare,
  type PanelSummary,
  type ToPanel,
} from '../extension/messages';
import { LENGTH_BOUNDS, LENGTH_UNITS, METHOD_NAMES, type LengthUnit } from '../extension/settings';
import { el, type Child } from './dom';
import { progressView } from './progress-view';

interface VsCodeApi {
  postMessage(message: FromPanel): void;
  getState(): unknown;
  setState(state: PanelState): void;
}
declare function acquireVsCodeApi(): VsCodeApi;

interface PanelState {
  summary: PanelSummary | null;
  controls: PanelControls | null;
  notice: { kind: NoticeKind; text: string } | null;
  abstractCheck: PanelAbstractCheck | null;
  scrollY: number;
}

const vscode = acquireVsCodeApi();
const state: PanelState = restoreState();

const UNIT_LABELS: Record<LengthUnit, string> = { sentences: 'sentences', percent: '% of words', words: 'words' };
const METHOD_LABELS: Record<string, string> = {
  blend: 'Blend (default)',
  position: 'Position',
  luhn: 'Luhn',
  edmundson: 'Edmundson',
  lexrank: 'LexRank',
  textrank: 'TextRank',
  centroid: 'Centroid',
  bayes: 'Naive Bayes (trained)',
};

function restoreState(): PanelState {
  const saved = vscode.getState() as Partial<PanelState> | undefined;
  return {
    summary: saved?.summary ?? null,
    controls: saved?.controls ?? null,
    notice: saved?.notice ?? null,
    abstractCheck: saved?.abstractCheck ?? null,
    scrollY: typeof saved?.scrollY === 'number' ? saved.scrollY : 0,
  };
}

function save(): void {
  vscode.setState(state);
}

const integer = new Intl.NumberFormat('en', { maximumFractionDigits: 0 });
const percent = (fraction: number): string => `${Math.round(fraction * 100)}%`;

// ---------- static skeleton ----------

const app = document.getElementById('app')!;
const note = el('p', { className: 'note', attrs: { role: 'note' } }, [
  'Extractive summary: these sentences are quoted from the document and can lose the context around them.',
]);
const progress = progressView();

const lengthValue = el('input', { attrs: { id: 'length-value', type: 'number', inputmode: 'numeric', 'aria-label': 'Summary length' } });
const lengthUnit = el('select', { attrs: { id: 'length-unit', 'aria-label': 'Length unit' } }, LENGTH_UNITS.map((unit) => el('option', { attrs: { value: unit } }, [UNIT_LABELS[unit]])));
const method = el('select', { attrs: { id: 'method' } }, METHOD_NAMES.map((name) => el('option', { attrs: { value: name } }, [METHOD_LABELS[name] ?? name])));
const balance = el('input', { attrs: { id: 'balance', type: 'checkbox' } });
const liveButton = el('button', { className: 'secondary', attrs: { type: 'button', id: 'live', 'aria-pressed': 'false', title: 'Follow edits and the active editor' } }, ['Live']);

function commandButton(label: string, command: Extract<FromPanel, { type: 'command' }>['command'], title: string, primary = false): HTMLButtonElement {
  const button = el('button', { className: primary ? 'primary' : 'secondary', attrs: { type: 'button', title, 'data-command': command } }, [label]);
  button.addEventListener('click', () => vscode.postMessage({ type: 'command', command }));
  return button;
}

const controls = el('section', { className: 'controls', attrs: { 'aria-label': 'Summary settings' } }, [
  el('div', { className: 'row' }, [el('label', { attrs: { for: 'length-value' } }, ['Length']), lengthValue, lengthUnit]),
  el('div', { className: 'row' }, [el('label', { attrs: { for: 'method' } }, ['Method']), method]),
  el('div', { className: 'row' }, [balance, el('label', { attrs: { for: 'balance' } }, ['Balance topics across sections'])]),
  el('div', { className: 'actions' }, [
    commandButton('Summarize', 'summarizeDocument', 'Summarize the active document', true),
    liveButton,
    commandButton('Copy', 'copySummary', 'Copy the summary as Markdown'),
    commandButton('Insert', 'insertSummary', 'Insert the summary into the document (one undoable edit)'),
  ]),
]);
liveButton.addEventListener('click', () => vscode.postMessage({ type: 'command', command: 'toggleLive' }));

const noticeBox = el('div', { className: 'notice', attrs: { role: 'status', 'aria-live': 'polite', hidden: '' } });
const content = el('div', { className: 'content', attrs: { id: 'content' } });
app.append(note, progress.element, controls, noticeBox, content);

function sendLength(): void {
  const unit = lengthUnit.value as LengthUnit;
  const bounds = LENGTH_BOUNDS[unit];
  const raw = Math.round(Number(lengthValue.value));
  const value = Number.isFinite(raw) ? Math.min(bounds.max, Math.max(bounds.min, raw)) : bounds.min;
  lengthValue.value = String(value);
  vscode.postMessage({ type: 'setLength', unit, value });
}

lengthValue.addEventListener('change', sendLength);
lengthUnit.addEventListener('change', () => {
  const bounds = LENGTH_BOUNDS[lengthUnit.value as LengthUnit];
  lengthValue.min = String(bounds.min);
  lengthValue.max = String(bounds.max);
  lengthValue.step = String(bounds.step);
  sendLength();
});
method.addEventListener('change', () => vscode.postMessage({ type: 'setMethod', method: method.value as PanelControls['method'] }));
balance.addEventListener('change', () => vscode.postMessage({ type: 'setBalance', enabled: balance.checked }));

// ---------- rendering ----------

function renderControls(value: PanelControls | null): void {
  if (!value) return;
  const bounds = LENGTH_BOUNDS[value.unit];
  lengthUnit.value = value.unit;
  lengthValue.min = String(bounds.min);
  lengthValue.max = String(bounds.max);
  lengthValue.step = String(bounds.step);
  if (document.activeElement !== lengthValue) lengthValue.value = String(value.value);
  method.value = value.method;
  balance.checked = value.balance;
  liveButton.setAttribute('aria-pressed', String(value.live));
  liveButton.textContent = value.live ? 'Live: on' : 'Live: off';
}

function renderNotice(value: PanelState['notice']): void {
  noticeBox.textContent = value?.text ?? '';
  noticeBox.dataset['kind'] = value?.kind ?? '';
  noticeBox.hidden = !value || value.text.length === 0;
  content.classList.toggle('stale', value?.kind === 'stale');
}

function figure(name: string, label: string, value: string): HTMLElement {
  return el('div', { className: 'figure', attrs: { 'data-figure': name } }, [el('dt', {}, [label]), el('dd', {}, [value])]);
}

function renderFigures(summary: PanelSummary): HTMLElement {
  const f = summary.figures;
  return el('dl', { className: 'figures' }, [
    figure('words', 'Words', `${integer.format(f.wordsIn)} → ${integer.format(f.wordsOut)}`),
    figure('compression', 'Compression', percent(f.compression)),
    figure('sections', 'Sections covered', `${f.sectionsCovered} / ${f.sectionsWithContent}`),
    figure('reading', 'Reads in', `about ${integer.format(Math.max(1, Math.round(f.minutesToRead)))} min (document about ${integer.format(Math.max(1, Math.round(f.documentMinutesToRead)))} min)`),
  ]);
}

function bar(kind: 'document' | 'summary', share: number, label: string): HTMLElement {
  const fill = el('div', { className: `bar-fill ${kind}` });
  fill.style.width = `${Math.max(0, Math.min(100, share * 100)).toFixed(1)}%`;
  return el('div', { className: 'bar', attrs: { role: 'img', 'aria-label': label } }, [fill]);
}

function renderShares(shares: readonly PanelShare[]): HTMLElement | null {
  if (shares.length === 0) return null;
  const rows = shares.map((share) =>
    el('div', { className: 'share-row' }, [
      el('div', { className: 'share-heading', attrs: { title: share.heading } }, [share.heading]),
      el('div', { className: 'share-bars' }, [
        bar('document', share.documentShare, `${share.heading}: ${percent(share.documentShare)} of the document`),
        bar('summary', share.summaryShare, `${share.heading}: ${percent(share.summaryShare)} of the summary`),
      ]),
      el('div', { className: 'share-numbers' }, [`${percent(share.documentShare)} → ${percent(share.summaryShare)}`]),
    ]),
  );
  return el('section', { className: 'shares', attrs: { 'aria-label': 'Where the summary comes from' } }, [
    el('h3', {}, ['Where the summary comes from']),
    el('div', { className: 'legend' }, [
      el('span', { className: 'swatch document', attrs: { 'aria-hidden': 'true' } }),
      'share of the document ',
      el('span', { className: 'swatch summary', attrs: { 'aria-hidden': 'true' } }),
      'share of the summary',
    ]),
    ...rows,
  ]);
}

function renderSentence(summary: PanelSummary, sentence: PanelSentence): HTMLElement {
  const button = el('button', { className: 'sentence', attrs: { type: 'button', 'data-sentence': String(sentence.sentence), title: 'Show this sentence in the editor' } }, [sentence.text]);
  button.addEventListener('click', () => vscode.postMessage({ type: 'reveal', summaryId: summary.id, sentence: sentence.sentence }));
  const meta: Child[] = [];
  if (sentence.subPath.length > 0) meta.push(el('span', { className: 'sub-path' }, [sentence.subPath.join(' › ')]));
  meta.push(el('span', { className: 'rank' }, [sentence.rank > 0 ? `rank ${sentence.rank}` : 'added by a repair']));
  if (sentence.edited) meta.push(el('span', { className: 'edited' }, [`edited: ${sentence.edited}`]));
  const warnings = sentence.warnings.map((warning) =>
    el('div', { className: 'warning', attrs: { role: 'note' } }, [
      el('span', { className: 'warning-label' }, ['May not stand alone: ']),
      el('span', {}, [warning.message]),
      el(
        'div',
        { className: 'repairs' },
        warning.repairs.map((repair) => {
          const repairButton = el('button', { className: 'secondary', attrs: { type: 'button' } }, [repair.label]);
          repairButton.addEventListener('click', () => vscode.postMessage({ type: 'applyRepair', summaryId: summary.id, warning: warning.index, repair: repair.index }));
          return repairButton;
        }),
      ),
    ]),
  );
  return el('li', { className: sentence.warnings.length > 0 ? 'flagged' : '' }, [button, el('div', { className: 'meta' }, meta), ...warnings]);
}

function renderGroup(summary: PanelSummary, group: PanelGroup): HTMLElement {
  return el('section', { className: 'group', attrs: { 'data-heading': group.heading } }, [
    el('h3', {}, [el('span', { className: 'group-heading' }, [group.heading]), el('span', { className: 'group-share' }, [`${percent(group.summaryShare)} of summary`])]),
    el(
      'ol',
      {},
      group.sentences.map((sentence) => renderSentence(summary, sentence)),
    ),
  ]);
}

function renderAbstract(check: PanelAbstractCheck | null): HTMLElement | null {
  if (!check) return null;
  return el('section', { className: 'abstract', attrs: { 'aria-label': 'Abstract check' } }, [
    el('h3', {}, ['Abstract check']),
    el('p', {}, [check.headline]),
    el(
      'ul',
      {},
      check.findings.map((finding) => el('li', { className: finding.severity }, [finding.message])),
    ),
  ]);
}

function renderContent(): void {
  const summary = state.summary;
  const children: Child[] = [];
  if (!summary) {
    const start = el('button', { className: 'primary', attrs: { type: 'button' } }, ['Summarize the active document']);
    start.addEventListener('click', () => vscode.postMessage({ type: 'command', command: 'summarizeDocument' }));
    children.push(el('p', { className: 'empty' }, ['No summary yet. Open a Markdown or text document and summarize it.']), start);
  } else {
    children.push(
      el('h2', { className: 'document-name' }, [summary.scope === 'selection' ? `${summary.documentName} (selection)` : summary.documentName]),
      el('p', { className: 'method' }, [`${METHOD_LABELS[summary.method] ?? summary.method} · language ${summary.language} · ${summary.figures.sentencesOut} of ${summary.figures.sentencesIn} sentences`]),
      renderFigures(summary),
      ...summary.notices.map((notice) => el('p', { className: 'summary-notice' }, [notice])),
      renderShares(summary.shares),
      el(
        'div',
        { className: 'summary', attrs: { 'data-summary-id': String(summary.id) } },
        summary.groups.map((group) => renderGroup(summary, group)),
      ),
    );
  }
  children.push(renderAbstract(state.abstractCheck));
  content.replaceChildren(...children.filter((child): child is Node | string => Boolean(child)));
}

function handle(message: ToPanel): void {
  switch (message.type) {
    case 'summary':
      state.summary = message.summary;
      state.notice = null;
      renderNotice(null);
      renderContent();
      break;
    case 'controls':
      state.controls = message.controls;
      renderControls(message.controls);
      break;
    case 'progress':
      progress.render(message.progress);
      content.setAttribute('aria-busy', String(message.progress !== null));
      return;
    case 'notice':
      state.notice = message.text ? { kind: message.kind, text: message.text } : null;
      renderNotice(state.notice);
      break;
    case 'abstractCheck':
      state.abstractCheck = message.check;
      renderContent();
      break;
    case 'clear':
      state.summary = null;
      renderContent();
      break;
  }
  save();
}

window.addEventListener('message', (event: MessageEvent<unknown>) => {
  // Only the extension (through the webview host) posts to this window; anything else is dropped.
  if (isToPanel(event.data)) handle(event.data);
});

let scrollTimer: ReturnType<typeof setTimeout> | undefined;
window.addEventListener('scroll', () => {
  clearTimeout(scrollTimer);
  scrollTimer = setTimeout(() => {
    state.scrollY = window.scrollY;
    save();
  }, 150);
});

renderControls(state.controls);
renderNotice(state.notice);
renderContent();
window.scrollTo(0, state.scrollY);
vscode.postMessage({ type: 'ready' });
