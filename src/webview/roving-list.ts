/**
 * One Tab stop for a list of items: the current item has tabindex 0, the others -1; arrow keys,
 * Home and End move between them, Enter or Space acts on the current one. The controls inside an
 * item are reachable by Tab only while their item is current, so the list never floods the Tab
 * order (a long summary used to be 70 Tab stops).
 */
export interface RovingList {
  /** Index of the current item. */
  readonly current: number;
  focus(index: number): void;
}

const INNER = 'button, summary, [data-inner]';

export function rovingList(container: HTMLElement, items: readonly HTMLElement[], onActivate: (index: number) => void, start = 0): RovingList {
  let current = Math.max(0, Math.min(start, items.length - 1));
  const mark = (): void => {
    items.forEach((item, index) => {
      item.tabIndex = index === current ? 0 : -1;
      for (const inner of Array.from(item.querySelectorAll<HTMLElement>(INNER))) inner.tabIndex = index === current ? 0 : -1;
    });
  };
  const focus = (index: number): void => {
    if (items.length === 0) return;
    current = Math.max(0, Math.min(index, items.length - 1));
    mark();
    items[current]!.focus();
  };
  items.forEach((item, index) => {
    item.addEventListener('focusin', () => {
      if (current === index) return;
      current = index;
      mark();
    });
    item.addEventListener('keydown', (event) => {
      // Keys typed in an inner control (a repair button) act on that control.
      if (event.target !== item) return;
      switch (event.key) {
        case 'ArrowDown':
          focus(index + 1);
          break;
        case 'ArrowUp':
          focus(index - 1);
          break;
        case 'Home':
          focus(0);
          break;
        case 'End':
          focus(items.length - 1);
          break;
        case 'Enter':
        case ' ':
          onActivate(index);
          break;
        default:
          return;
      }
      event.preventDefault();
    });
  });
  container.setAttribute('data-roving', String(items.length));
  mark();
  return {
    get current() {
      return current;
    },
    focus,
  };
}
