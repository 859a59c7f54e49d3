/**
 * Section levels and the document title, as the specification decides them.
 *
 * - Levels: each adornment style (underline character, or overline + underline characters) gets
 *   the next level the first time it appears; a later title must use a known style at most one
 *   level below the current section, or a new style exactly one level below. Other titles are
 *   inconsistent and are not sections.
 * - Document title: when the first element (comments, targets and the like aside) is a title of
 *   level 1 and no other level-1 title follows, it is the document's title; when the next
 *   element is then the only level-2 title, that one is the subtitle.
 *
 * Depths: the document title is depth 1 (the Markdown H1), its sections continue below it; a
 * subtitle is not a section (its level is consumed), so its sections start at depth 2.
 */
import type { Block, TitleBlock } from './blocks';

export interface TitlePlan {
  /** Depth of each title, or null for an inconsistent one. */
  readonly depthOf: ReadonlyMap<TitleBlock, number | null>;
  readonly documentTitle: TitleBlock | null;
  readonly subtitle: TitleBlock | null;
}

function isPreamble(block: Block, levels: ReadonlyMap<TitleBlock, number | null>): boolean {
  if (block.kind === 'skip') return block.preamble === true;
  return block.kind === 'title' && levels.get(block) === null;
}

export function planTitles(blocks: readonly Block[]): TitlePlan {
  const levels = new Map<TitleBlock, number | null>();
  const styles: string[] = [];
  let current = 0;
  for (const block of blocks) {
    if (block.kind !== 'title') continue;
    const known = styles.indexOf(block.style);
    let level: number | null;
    if (known < 0) {
      level = styles.length === current ? current + 1 : null;
      if (level !== null) styles.push(block.style);
    } else {
      level = known + 1 <= current + 1 ? known + 1 : null;
    }
    if (level !== null) current = level;
    levels.set(block, level);
  }

  const titles = blocks.filter((b): b is TitleBlock => b.kind === 'title');
  const countAt = (level: number) => titles.filter((t) => levels.get(t) === level).length;
  const firstAfter = (from: number): { block: Block | undefined; index: number } => {
    let index = from;
    while (index < blocks.length && isPreamble(blocks[index]!, levels)) index++;
    return { block: blocks[index], index };
  };

  let documentTitle: TitleBlock | null = null;
  let subtitle: TitleBlock | null = null;
  const first = firstAfter(0);
  if (first.block?.kind === 'title' && levels.get(first.block) === 1 && countAt(1) === 1) {
    documentTitle = first.block;
    const second = firstAfter(first.index + 1);
    if (second.block?.kind === 'title' && levels.get(second.block) === 2 && countAt(2) === 1) subtitle = second.block;
  }

  const depthOf = new Map<TitleBlock, number | null>();
  for (const [title, level] of levels) {
    depthOf.set(title, level === null ? null : subtitle !== null && level > 2 ? level - 1 : level);
  }
  return { depthOf, documentTitle, subtitle };
}
