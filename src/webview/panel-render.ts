/**
 * The panel's content, built from what the extension sent: the summary first (grouped by
 * section, each sentence with why it was picked behind a toggle), then the figures and section
 * bars in a collapsible part, and the abstract check in a place of its own, bound to its
 * document. Document text only ever goes in through `textContent` (el() children), never as HTML.
 */
import type { PanelAbstractCheck, PanelDigest, PanelGroup, PanelSentence, PanelShare, PanelSummary } from '../extension/messages';
import type { PanelText } from '../extension/panel-text';
import { el, type Child } from './dom';

export interface RenderActions {
  reveal(summaryId: number, sentence: number): void;
  repair(summaryId: number, warning: number, repair: number): void;
  revealCheck(checkId: number, target: number): void;
  dismissCheck(): void;
  revealDigest(digestId: number, target: number): void;
  dismissDigest(): void;
  /** Remembers which collapsible parts are open. */
  toggled(name: string, open: boolean): void;
}

/** A <details> part whose open state survives re-rendering. */
export function collapsible(name: string, label: string, open: boolean, body: Child[], actions: RenderActions, className = ''): HTMLDetailsElement {
  const details = el('details', { className: `part ${className}`.trim(), attrs: { 'data-part': name } }, [el('summary', {}, [label]), ...body]);
  details.open = open;
  details.addEventListener('toggle', () => actions.toggled(name, details.open));
  return details;
}

function renderSentence(summary: PanelSummary, sentence: PanelSentence, text: PanelText, actions: RenderActions, open: ReadonlySet<string>): HTMLElement {
  const meta: Child[] = [];
  if (sentence.isNew) meta.push(el('span', { className: 'badge-new', attrs: { title: text.newPickLabel } }, [text.newPick]));
  if (sentence.subPath.length > 0) meta.push(el('span', { className: 'sub-path' }, [sentence.subPath.join(' › ')]));
  if (sentence.rank === 0) meta.push(el('span', { className: 'rank' }, [text.addedByRepair]));
  if (sentence.edited) meta.push(el('span', { className: 'edited' }, [`${text.edited} ${sentence.edited}`]));
  const warnings = sentence.warnings.map((warning) =>
    el('div', { className: 'warning' }, [
      el('span', { className: 'warning-label' }, [text.mayNotStandAlone, ' ']),
      el('span', {}, [warning.message]),
      el(
        'div',
        { className: 'repairs' },
        warning.repairs.map((repair) => {
          const button = el('button', { className: 'secondary', attrs: { type: 'button' } }, [repair.label]);
          button.addEventListener('click', () => actions.repair(summary.id, warning.index, repair.index));
          return button;
        }),
      ),
    ]),
  );
  const whyName = `why-${sentence.sentence}`;
  const why = collapsible(
    whyName,
    text.why,
    open.has(whyName),
    [
      el('p', { className: 'why-words' }, [sentence.why]),
      sentence.whyNumbers.length > 0
        ? collapsible(`${whyName}-numbers`, text.numbers, open.has(`${whyName}-numbers`), [el('ul', { className: 'why-numbers' }, sentence.whyNumbers.map((line) => el('li', {}, [line])))], actions, 'numbers')
        : null,
    ],
    actions,
    'why',
  );
  const classes = ['pick', sentence.isNew ? 'new' : '', sentence.warnings.length > 0 ? 'flagged' : ''].filter(Boolean).join(' ');
  const label = sentence.isNew ? `${text.newPickLabel}: ${sentence.text}` : sentence.text;
  const item = el('li', { className: classes, attrs: { 'data-sentence': String(sentence.sentence), 'aria-label': label } }, [
    el('span', { className: 'pick-text' }, [sentence.text]),
    meta.length > 0 ? el('div', { className: 'meta' }, meta) : null,
    ...warnings,
    why,
  ]);
  item.addEventListener('click', (event) => {
    // Clicks on the toggles and repair buttons are theirs.
    if ((event.target as HTMLElement).closest('button, details')) return;
    actions.reveal(summary.id, sentence.sentence);
  });
  return item;
}

function renderGroup(summary: PanelSummary, group: PanelGroup, text: PanelText, actions: RenderActions, open: ReadonlySet<string>): HTMLElement {
  return el('li', { className: 'group', attrs: { 'data-heading': group.heading } }, [
    el('h3', { attrs: { title: group.heading } }, [el('span', { className: 'group-heading' }, [group.heading]), el('span', { className: 'group-share' }, [group.share])]),
    el(
      'ol',
      { className: 'picks' },
      group.sentences.map((sentence) => renderSentence(summary, sentence, text, actions, open)),
    ),
  ]);
}

function bar(kind: 'document' | 'summary', share: number): HTMLElement {
  const fill = el('div', { className: `bar-fill ${kind}` });
  fill.style.width = `${(share * 100).toFixed(1)}%`;
  return el('div', { className: 'bar', attrs: { 'aria-hidden': 'true' } }, [fill]);
}

function renderShares(shares: readonly PanelShare[], text: PanelText): HTMLElement | null {
  if (shares.length === 0) return null;
  return el('div', { className: 'shares' }, [
    el('p', { className: 'legend' }, [
      el('span', { className: 'swatch document', attrs: { 'aria-hidden': 'true' } }),
      text.legendDocument,
      ' ',
      el('span', { className: 'swatch summary', attrs: { 'aria-hidden': 'true' } }),
      text.legendSummary,
    ]),
    el(
      'ul',
      { className: 'share-list', attrs: { 'aria-label': text.sharesHeading } },
      shares.map((share) =>
        el('li', { className: 'share-row', attrs: { 'aria-label': `${share.heading}: ${share.label}` } }, [
          el('span', { className: 'share-heading', attrs: { title: `${share.heading}: ${share.label}` } }, [share.heading]),
          el('span', { className: 'share-bars' }, [bar('document', share.documentShare), bar('summary', share.summaryShare)]),
        ]),
      ),
    ),
  ]);
}

/** Key phrases on one wrapping line: a list for screen readers, compact on screen. */
function renderKeyPhrases(phrases: readonly string[], text: PanelText): HTMLElement | null {
  if (phrases.length === 0) return null;
  return el('div', { className: 'key-phrases' }, [
    el('span', { className: 'label', attrs: { id: 'key-phrases-label' } }, [text.keyPhrases]),
    el('ul', { attrs: { 'aria-labelledby': 'key-phrases-label' } }, phrases.map((phrase) => el('li', {}, [phrase]))),
  ]);
}

/** The summary: heading, figures line, the sentence list, then the collapsible figures part. */
export function renderSummary(summary: PanelSummary, text: PanelText, actions: RenderActions, open: ReadonlySet<string>): { element: HTMLElement; list: HTMLElement; items: HTMLElement[] } {
  const list = el(
    'ol',
    { className: 'summary-list', attrs: { 'aria-label': text.summaryList, 'data-summary-id': String(summary.id) } },
    summary.groups.map((group) => renderGroup(summary, group, text, actions, open)),
  );
  const items = Array.from(list.querySelectorAll<HTMLElement>('li.pick'));
  const name = summary.scope === 'selection' ? `${summary.documentName} (selection)` : summary.documentName;
  const element = el('section', { className: 'summary', attrs: { 'aria-label': `${text.summaryHeading}: ${name}` } }, [
    el('h2', { className: 'document-name', attrs: { title: name } }, [name]),
    el('p', { className: 'headline-figures' }, [
      el('span', { attrs: { 'data-figure': 'words' } }, [summary.figures.words]),
      ' · ',
      el('span', { attrs: { 'data-figure': 'reading' } }, [summary.figures.reading]),
    ]),
    summary.focus !== '' ? el('p', { className: 'focused-on' }, [el('span', { className: 'label' }, [text.focusedOn, ' ']), el('span', { attrs: { 'data-focus': '' } }, [summary.focus])]) : null,
    renderKeyPhrases(summary.keyPhrases, text),
    ...summary.notices.map((notice) => el('p', { className: 'summary-notice' }, [notice])),
    list,
    el('p', { className: 'note' }, [text.note]),
    collapsible(
      'details',
      text.details,
      open.has('details'),
      [
        el('dl', { className: 'figures' }, [
          el('div', { attrs: { 'data-figure': 'sentences' } }, [el('dt', {}, [text.method]), el('dd', {}, [`${summary.method} · ${summary.language}`])]),
          el('div', { attrs: { 'data-figure': 'count' } }, [el('dd', {}, [summary.figures.sentences])]),
          el('div', { attrs: { 'data-figure': 'sections' } }, [el('dd', {}, [summary.figures.sections])]),
        ]),
        renderShares(summary.shares, text),
        summary.leftOut.length > 0 ? el('ul', { className: 'left-out', attrs: { 'aria-label': text.leftOut } }, summary.leftOut.map((line) => el('li', {}, [line]))) : null,
      ],
      actions,
      'details-part',
    ),
  ]);
  return { element, list, items };
}

export function renderEmpty(text: PanelText): HTMLElement {
  return el('section', { className: 'empty', attrs: { 'aria-label': text.emptyTitle } }, [el('h2', {}, [text.emptyTitle]), el('p', {}, [text.emptyBody]), el('p', { className: 'note' }, [text.note])]);
}

/** The abstract check in its own place: its document, headline, and items whose lines are links. */
export function renderCheck(check: PanelAbstractCheck, text: PanelText, actions: RenderActions): { element: HTMLElement; items: HTMLElement[] } {
  const link = (label: string, target: number): HTMLElement => {
    const button = el('button', { className: 'link', attrs: { type: 'button', 'data-target': String(target) } }, [label]);
    button.addEventListener('click', () => actions.revealCheck(check.id, target));
    return button;
  };
  const items = check.items.map((item) => {
    const children: Child[] = [el('span', { className: 'check-text' }, [item.text])];
    if (item.links.length > 0) children.push(el('span', { className: 'check-links' }, item.links.map((l) => link(l.label, l.target))));
    const li = el('li', { className: `check-item ${item.severity}`, attrs: { 'data-severity': item.severity, 'aria-label': item.text } }, children);
    if (item.target !== null) {
      const target = item.target;
      li.dataset['target'] = String(target);
      li.addEventListener('click', (event) => {
        if ((event.target as HTMLElement).closest('button')) return;
        actions.revealCheck(check.id, target);
      });
    }
    return li;
  });
  const dismiss = el('button', { className: 'secondary dismiss', attrs: { type: 'button', title: text.dismiss, 'aria-label': `${text.dismiss}: ${text.checkHeading}` } }, ['×']);
  dismiss.addEventListener('click', () => actions.dismissCheck());
  const list = el('ol', { className: 'check-list', attrs: { 'aria-label': text.checkHeading } }, items);
  const element = el('section', { className: `check${check.stale ? ' stale' : ''}`, attrs: { 'aria-label': `${text.checkHeading}: ${check.documentName}`, 'data-check-id': String(check.id) } }, [
    el('h2', { className: 'check-title' }, [el('span', {}, [text.checkHeading, ' — ', check.documentName]), dismiss]),
    check.stale ? el('p', { className: 'check-stale', attrs: { role: 'note' } }, [text.checkStale]) : null,
    el('p', { className: 'check-headline' }, [check.headline]),
    list,
  ]);
  return { element, items: items.filter((item) => item.dataset['target'] !== undefined || item.querySelector('button')) };
}

/**
 * The digest in its own place: one part per document, its sections, each sentence a line that
 * opens its file at the sentence; "also in" links lead to the near-duplicates in other documents.
 */
export function renderDigest(digest: PanelDigest, text: PanelText, actions: RenderActions): { element: HTMLElement; items: HTMLElement[] } {
  const items: HTMLElement[] = [];
  const documents = digest.documents.map((doc) => {
    const sections = doc.sections.map((section) => {
      const lines = section.lines.map((line) => {
        const links = line.alsoIn.map((link) => {
          const button = el('button', { className: 'link', attrs: { type: 'button', 'data-target': String(link.target) } }, [link.label]);
          button.addEventListener('click', () => actions.revealDigest(digest.id, link.target));
          return button;
        });
        const li = el('li', { className: 'digest-line', attrs: { 'data-target': String(line.target), 'aria-label': `${line.text} (${line.line})` } }, [
          el('span', { className: 'digest-text' }, [line.text]),
          ' ',
          el('span', { className: 'digest-where' }, [line.line]),
          links.length > 0 ? el('span', { className: 'check-links digest-also' }, links) : null,
        ]);
        li.addEventListener('click', (event) => {
          if ((event.target as HTMLElement).closest('button')) return;
          actions.revealDigest(digest.id, line.target);
        });
        items.push(li);
        return li;
      });
      return el('div', { className: 'digest-section' }, [section.heading ? el('h4', { className: 'digest-heading' }, [section.heading]) : null, el('ol', { className: 'check-list' }, lines)]);
    });
    return el('section', { className: 'digest-document', attrs: { 'aria-label': doc.file } }, [
      el('h3', { className: 'digest-file' }, [el('span', {}, [doc.file]), ' ', el('span', { className: 'digest-figures' }, [doc.figures])]),
      ...sections,
    ]);
  });
  const dismiss = el('button', { className: 'secondary dismiss', attrs: { type: 'button', title: text.dismiss, 'aria-label': `${text.dismiss}: ${text.digestHeading}` } }, ['×']);
  dismiss.addEventListener('click', () => actions.dismissDigest());
  const element = el('section', { className: 'check digest', attrs: { 'aria-label': `${text.digestHeading}. ${text.digestList}`, 'data-digest-id': String(digest.id) } }, [
    el('h2', { className: 'check-title' }, [el('span', {}, [text.digestHeading]), dismiss]),
    el('p', { className: 'check-headline' }, [digest.headline]),
    // The same caution as the single summary: quoted sentences can lose their context.
    el('p', { className: 'note' }, [text.note]),
    ...digest.notices.map((notice) => el('p', { className: 'digest-notice', attrs: { role: 'note' } }, [notice])),
    ...documents,
  ]);
  return { element, items };
}
