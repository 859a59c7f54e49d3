import assert from 'node:assert/strict';
import { restoreState, SAVED_STATE_LIMITS, stateToSave } from '../../src/webview/panel-state';
import { PANEL_RESOURCE_FOLDERS } from '../../src/extension/panel-html';
// @ts-expect-error plain ESM build script without types
import { ENTRIES } from '../../scripts/build-entries.mjs';

describe('webview saved state (only what restoring needs)', () => {
  it('saves exactly scroll position, open parts and the summary id', () => {
    const saved = stateToSave(120, new Set(['settings', 'why-3']), 7);
    assert.deepEqual(Object.keys(saved).sort(), ['open', 'scrollY', 'summaryId']);
    assert.deepEqual(saved, { scrollY: 120, open: ['settings', 'why-3'], summaryId: 7 });
    assert.deepEqual(stateToSave(0, [], null), { scrollY: 0, open: [], summaryId: null });
  });

  it('reads back nothing else: document text, summaries or odd values in an old state are dropped', () => {
    const old = {
      scrollY: 40,
      open: ['details', 42, 'x'.repeat(SAVED_STATE_LIMITS.partName)],
      summaryId: 3,
      summary: { groups: [{ sentences: [{ text: 'The ferry leaves at nine.' }] }] },
      documentText: '# Secret plan',
    };
    const restored = restoreState(old);
    assert.deepEqual(restored, { scrollY: 40, open: ['details'], summaryId: 3 });
    assert.doesNotMatch(JSON.stringify(restored), /ferry|Secret/);
    assert.deepEqual(restoreState({ scrollY: Number.NaN, open: 'details', summaryId: 1.5 }), { scrollY: 0, open: [], summaryId: null });
    assert.deepEqual(restoreState({ scrollY: -5 }), { scrollY: 0, open: [], summaryId: null });
    assert.deepEqual(restoreState(null), { scrollY: 0, open: [], summaryId: null });
    assert.equal(restoreState({ open: Array.from({ length: 500 }, (_, i) => `p${i}`) }).open.length, SAVED_STATE_LIMITS.parts);
  });
});

describe('webview resource roots (dist/webview/ and media/ only)', () => {
  it('names exactly the panel script folder and media/', () => {
    assert.deepEqual(PANEL_RESOURCE_FOLDERS, [['dist', 'webview'], ['media']]);
  });

  it('puts no bundle but the panel script in dist/webview/ (so the root exposes nothing else)', () => {
    const inWebview = (ENTRIES as { out: string }[]).filter((entry) => entry.out.startsWith('dist/webview/')).map((entry) => entry.out);
    assert.deepEqual(inWebview, ['dist/webview/panel.js']);
  });
});
