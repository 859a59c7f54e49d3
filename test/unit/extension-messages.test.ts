import assert from 'node:assert/strict';
import fc from 'fast-check';
import { isToPanel, parsePanelMessage, progressLabel, SUMMARY_STAGES, type FromPanel } from '../../src/extension/messages';
import { buildPanelSummary } from '../../src/extension/panel-model';
import { PANEL_TEXT } from '../../src/extension/panel-text';
import { ferrySummary } from './extension-fixture';

const valid: FromPanel[] = [
  { type: 'ready' },
  { type: 'reveal', summaryId: 3, sentence: 12 },
  { type: 'applyRepair', summaryId: 3, warning: 0, repair: 2 },
  { type: 'setLength', length: '5s' },
  { type: 'setLength', length: '100%' },
  { type: 'setLength', length: '120w' },
  { type: 'revealCheck', checkId: 2, target: 0 },
  { type: 'dismissCheck' },
  { type: 'command', command: 'checkAbstract' },
  { type: 'setMethod', method: 'textrank' },
  { type: 'setBalance', enabled: false },
  { type: 'command', command: 'insertSummary' },
];

describe('extension messages: validating what the panel sends', () => {
  it('accepts every well-formed message unchanged', () => {
    for (const message of valid) assert.deepEqual(parsePanelMessage(message), { ok: true, message });
  });

  it('rejects unknown types, wrong field types, out-of-range values and extra fields, with a reason', () => {
    const bad: unknown[] = [
      null,
      'reveal',
      42,
      [],
      {},
      { type: 'evaluate', code: 'alert(1)' },
      { type: 'reveal', summaryId: '3', sentence: 1 },
      { type: 'reveal', summaryId: 3, sentence: -1 },
      { type: 'reveal', summaryId: 3, sentence: 1.5 },
      { type: 'reveal', summaryId: 3, sentence: Number.NaN },
      { type: 'reveal', summaryId: 3, sentence: 1, href: 'https://example.invalid' },
      { type: 'applyRepair', summaryId: 1, warning: 0, repair: 99 },
      { type: 'setLength', length: '3 pages' },
      { type: 'setLength', length: '101%' },
      { type: 'setLength', length: '0s' },
      { type: 'setLength', length: 15 },
      { type: 'setLength', length: '15%', unit: 'percent' },
      { type: 'revealCheck', checkId: 1, target: -1 },
      { type: 'dismissCheck', checkId: 1 },
      { type: 'setMethod', method: '__proto__' },
      { type: 'setBalance', enabled: 'true' },
      { type: 'command', command: 'workbench.action.terminal.new' },
      { type: 'ready', extra: true },
    ];
    for (const raw of bad) {
      const result = parsePanelMessage(raw);
      assert.equal(result.ok, false, JSON.stringify(raw));
      if (!result.ok) assert.ok(result.reason.length > 0);
    }
  });

  it('never throws and never accepts a message with a field it does not know (property)', () => {
    fc.assert(
      fc.property(fc.anything(), (raw) => {
        const result = parsePanelMessage(raw);
        if (result.ok) {
          assert.ok(typeof raw === 'object' && raw !== null);
          assert.deepEqual(Object.keys(raw).sort(), Object.keys(result.message).sort());
        }
      }),
      { numRuns: 3000 },
    );
  });

  it('never accepts a mutated valid message whose fields are the wrong type (property)', () => {
    fc.assert(
      fc.property(fc.constantFrom(...valid.filter((m) => m.type !== 'ready')), fc.oneof(fc.string(), fc.object(), fc.constant(null), fc.double()), (message, junk) => {
        const keys = Object.keys(message).filter((key) => key !== 'type');
        const key = keys[0]!;
        const mutated = { ...message, [key]: junk };
        const result = parsePanelMessage(mutated);
        if (result.ok) assert.deepEqual(result.message, mutated); // only when junk happens to be valid
      }),
      { numRuns: 2000 },
    );
  });
});

describe('extension messages: the webview side check', () => {
  const summary = buildPanelSummary(ferrySummary(), 3, 'ferry.md', 'document');
  const progress = { task: 'summarize', stage: 'ranking', label: 'Summarizing…', stages: ['a', 'b', 'c'] };

  it('accepts what the extension really sends', () => {
    assert.equal(isToPanel({ type: 'summary', summary }), true);
    assert.equal(isToPanel({ type: 'progress', progress }), true);
    assert.equal(isToPanel({ type: 'progress', progress: null }), true);
    assert.equal(isToPanel({ type: 'clear' }), true);
    assert.equal(isToPanel({ type: 'text', text: PANEL_TEXT }), true);
    assert.equal(isToPanel({ type: 'announce', text: 'Summary ready.' }), true);
  });

  it('checks every field: a malformed unit, a wrong type deep inside, a missing or extra field each drop the message', () => {
    const group = summary.groups[0]!;
    const sentence = group.sentences[0]!;
    const withSentence = (changed: unknown) => ({ type: 'summary', summary: { ...summary, groups: [{ ...group, sentences: [changed] }] } });
    assert.equal(isToPanel(withSentence({ ...sentence, rank: 'first' })), false);
    assert.equal(isToPanel(withSentence({ ...sentence, subPath: [1] })), false);
    assert.equal(isToPanel(withSentence({ ...sentence, isNew: undefined })), false);
    assert.equal(isToPanel(withSentence({ ...sentence, onclick: 'alert(1)' })), false);
    assert.equal(isToPanel({ type: 'summary', summary: { ...summary, shares: [{ heading: 'x', documentShare: 2, summaryShare: 0, label: '' }] } }), false);
    assert.equal(isToPanel({ type: 'summary', summary: { ...summary, figures: { words: 1 } } }), false);
    assert.equal(isToPanel({ type: 'summary', summary: '<img src=x onerror=alert(1)>' }), false);
    assert.equal(isToPanel({ type: 'progress', progress: { ...progress, stage: 'dancing' } }), false);
    assert.equal(isToPanel({ type: 'progress', progress: 'ranking' }), false);
    assert.equal(isToPanel({ type: 'text', text: { ...PANEL_TEXT, note: 5 } }), false);
    assert.equal(isToPanel({ type: 'busy', busy: true }), false);
    assert.equal(isToPanel({ type: 'html', html: '<b>x</b>' }), false);
    assert.equal(isToPanel(null), false);
  });

  it('never throws on anything (property)', () => {
    fc.assert(
      fc.property(fc.anything(), fc.constantFrom('summary', 'controls', 'text', 'progress', 'notice', 'abstractCheck', 'announce', 'clear'), (junk, type) => {
        isToPanel(junk);
        isToPanel({ type, summary: junk, controls: junk, text: junk, progress: junk, check: junk, kind: junk });
      }),
      { numRuns: 2000 },
    );
  });
});

describe('extension messages: progress wording', () => {
  it('names each stage of a summary, in order, with its step', () => {
    assert.deepEqual(
      SUMMARY_STAGES.map((entry) => entry.stage),
      ['reading', 'ranking', 'checking'],
    );
    assert.equal(progressLabel({ task: 'summarize', stage: 'reading' }), 'Summarizing: reading the document (step 1 of 3)…');
    assert.equal(progressLabel({ task: 'summarize', stage: 'ranking' }), 'Summarizing: ranking sentences (step 2 of 3)…');
    assert.equal(progressLabel({ task: 'summarize', stage: 'checking' }), 'Summarizing: picking and checking sentences (step 3 of 3)…');
    assert.equal(progressLabel({ task: 'summarize', stage: 'waiting' }), 'Summarizing: waiting for the engine…');
    assert.equal(progressLabel({ task: 'checkAbstract', stage: 'checkingAbstract' }), 'Checking the abstract…');
  });
});
