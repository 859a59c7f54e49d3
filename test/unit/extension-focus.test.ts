import assert from 'node:assert/strict';
import { summarize } from '../../src/core/index';
import { cleanFocus, FocusState, RECENT_FOCUS_LIMIT, withRecent } from '../../src/extension/recent-focuses';
import { buildPanelSummary, KEY_PHRASES_SHOWN } from '../../src/extension/panel-model';
import { parsePanelMessage } from '../../src/extension/from-panel';
import { isToPanel } from '../../src/extension/to-panel';
import { HARBOUR_DOCUMENT } from './helpers/harbour-document';


class MemoryMemento {
  readonly values = new Map<string, unknown>();
  get<T>(key: string, defaultValue: T): T {
    return (this.values.has(key) ? this.values.get(key) : defaultValue) as T;
  }
  async update(key: string, value: unknown): Promise<void> {
    this.values.set(key, value);
  }
}

describe('extension focus: the focus box and its recent focuses', () => {
  it('keeps the newest focus first, without repeats, at most a few', () => {
    assert.deepEqual(withRecent(['cafe prices', 'parking'], 'Parking'), ['Parking', 'cafe prices']);
    assert.deepEqual(withRecent(['a', 'b'], ''), ['a', 'b'], 'an empty focus (back to general) is not remembered');
    let recent: string[] = [];
    for (const focus of ['one', 'two', 'three', 'four', 'five', 'six', 'seven']) recent = withRecent(recent, focus);
    assert.equal(recent.length, RECENT_FOCUS_LIMIT);
    assert.deepEqual(recent.slice(0, 2), ['seven', 'six']);
  });

  it('collapses the selection’s line breaks and cuts it at the schema’s 500 characters', () => {
    assert.equal(cleanFocus('  night\n  ferry\ttickets  '), 'night ferry tickets');
    assert.equal(cleanFocus('x'.repeat(800)).length, 500);
  });

  it('stores the recent focuses per workspace and drops anything stored that is not text', async () => {
    const memento = new MemoryMemento();
    const state = new FocusState(memento);
    assert.equal(state.current, '');
    await state.set('cafe  prices');
    await state.set('parking');
    assert.equal(state.current, 'parking');
    assert.deepEqual(new FocusState(memento).recent, ['parking', 'cafe prices']);
    memento.values.set('tersely.recentFocuses', ['ok', 3, { evil: true }, '']);
    assert.deepEqual(new FocusState(memento).recent, ['ok']);
    const fresh = new FocusState(memento);
    assert.equal(fresh.current, '', 'a new session starts with a general summary');
  });
});

describe('extension panel model: focus and key phrases', () => {
  it('carries the focus and says when the document has little about it (the engine’s notice reaches the panel)', () => {
    const summary = summarize(HARBOUR_DOCUMENT, { budget: { unit: 'sentences', value: 4 }, focus: 'soup' });
    const panel = buildPanelSummary(summary, 3, 'harbour.md', 'document');
    assert.equal(panel.focus, 'soup');
    assert.deepEqual(panel.groups.flatMap((g) => g.sentences.map((s) => s.text)), ['The cafe sells soup and bread.']);
    assert.ok(panel.notices.some((n) => /little about the focus "soup"/.test(n)), panel.notices.join(' | '));
    assert.equal(isToPanel({ type: 'summary', summary: panel }), true);
    const general = buildPanelSummary(summarize(HARBOUR_DOCUMENT, {}), 4, 'harbour.md', 'document');
    assert.equal(general.focus, '');
  });

  it('shows a few key phrases, best first, exactly the engine’s', () => {
    const summary = summarize(HARBOUR_DOCUMENT, {});
    assert.ok(summary.keyPhrases.length > 0);
    const panel = buildPanelSummary(summary, 1, 'harbour.md', 'document');
    assert.deepEqual(panel.keyPhrases, summary.keyPhrases.slice(0, KEY_PHRASES_SHOWN).map((p) => p.text));
    assert.ok(panel.keyPhrases.length <= KEY_PHRASES_SHOWN);
    assert.equal(isToPanel({ type: 'summary', summary: { ...panel, keyPhrases: [7] } }), false, 'a malformed key phrase is refused');
  });
});

describe('extension panel messages: setFocus', () => {
  it('accepts a focus of up to 500 characters, the empty one included, and nothing else', () => {
    assert.deepEqual(parsePanelMessage({ type: 'setFocus', focus: 'cafe prices' }), { ok: true, message: { type: 'setFocus', focus: 'cafe prices' } });
    assert.equal(parsePanelMessage({ type: 'setFocus', focus: '' }).ok, true);
    assert.equal(parsePanelMessage({ type: 'setFocus', focus: 'x'.repeat(501) }).ok, false);
    assert.equal(parsePanelMessage({ type: 'setFocus', focus: 5 }).ok, false);
    assert.equal(parsePanelMessage({ type: 'setFocus', focus: 'a', extra: 1 }).ok, false);
  });
});
