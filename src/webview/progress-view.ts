/**
 * The panel's busy state for a job that takes a while (the extension posts it after ~300 ms):
 * the stage by name and the stages done, current and to come, worded by the extension.
 */
import { SUMMARY_STAGES, type PanelProgress } from '../extension/messages';
import { el } from './dom';

export function progressView(): { readonly element: HTMLElement; render(value: PanelProgress | null): void } {
  const element = el('section', { className: 'progress', attrs: { role: 'status', 'aria-live': 'polite', hidden: '' } });
  const render = (value: PanelProgress | null): void => {
    element.hidden = value === null;
    if (!value) {
      element.replaceChildren();
      return;
    }
    const step = SUMMARY_STAGES.findIndex((entry) => entry.stage === value.stage);
    const children: Node[] = [el('p', { className: 'progress-title' }, [value.label])];
    if (value.task === 'summarize') {
      children.push(
        el(
          'ol',
          { className: 'stages' },
          value.stages.map((label, index) =>
            el('li', { attrs: { 'data-stage': SUMMARY_STAGES[index]?.stage ?? '', 'data-state': index < step ? 'done' : index === step ? 'current' : 'pending' } }, [label]),
          ),
        ),
      );
    }
    element.dataset['stage'] = value.stage;
    element.replaceChildren(...children);
  };
  return { element, render };
}
