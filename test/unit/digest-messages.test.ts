/** The panel's message checks for the digest, both ways (to-panel.ts, from-panel.ts). */
import assert from 'node:assert/strict';
import fc from 'fast-check';
import { digestDocuments } from '../../src/core/index';
import { digestView } from '../../src/extension/digest-view';
import { isToPanel, parsePanelMessage, type PanelDigest } from '../../src/extension/messages';

// Two invented notes on one bakery; the second repeats a sentence of the first, so a link is sent.
const FIRST = '# Bakery\n\nThe ovens are lit at four every morning. Rye loaves need twelve hours to rise.\n';
const SECOND = '# Bakery, winter\n\nThe ovens are lit at four every morning. In winter the shop opens an hour later.\n';

function sentDigest(): PanelDigest {
  const digest = digestDocuments(
    [
      { file: 'bakery.md', text: FIRST, format: 'markdown' },
      { file: 'winter.md', text: SECOND, format: 'markdown' },
    ],
    { budget: { unit: 'sentences', value: 6 } },
  );
  return { id: 4, ...digestView(digest).panel };
}

describe('panel messages: the digest (extension → panel)', () => {
  const digest = sentDigest();
  const doc = digest.documents.find((d) => d.sections.some((s) => s.lines.some((l) => l.alsoIn.length > 0)))!;
  const section = doc.sections.find((s) => s.lines.some((l) => l.alsoIn.length > 0))!;
  const line = section.lines.find((l) => l.alsoIn.length > 0)!;
  /** The sent digest with one line (the one with a link) replaced. */
  const withLine = (changed: unknown) => ({
    type: 'digest',
    digest: { ...digest, documents: [{ ...doc, sections: [{ ...section, lines: [changed] }] }] },
  });

  it('accepts a digest the extension really builds, and null (no digest)', () => {
    assert.equal(isToPanel({ type: 'digest', digest }), true);
    assert.equal(isToPanel(withLine(line)), true);
    assert.equal(isToPanel({ type: 'digest', digest: null }), true);
  });

  it('drops a digest with a wrong, missing or extra field anywhere', () => {
    const bad: unknown[] = [
      { type: 'digest' },
      { type: 'digest', digest: '<img src=x onerror=alert(1)>' },
      { type: 'digest', digest: { ...digest, id: -1 } },
      { type: 'digest', digest: { ...digest, id: 1.5 } },
      { type: 'digest', digest: { ...digest, headline: 3 } },
      { type: 'digest', digest: { ...digest, notices: [null] } },
      { type: 'digest', digest: { ...digest, html: '<b>x</b>' } },
      { type: 'digest', digest: { ...digest, documents: [{ ...doc, figures: undefined }] } },
      { type: 'digest', digest: { ...digest, documents: [{ ...doc, onclick: 'alert(1)' }] } },
      { type: 'digest', digest: { ...digest, documents: [{ ...doc, sections: [{ ...section, heading: ['x'] }] }] } },
      withLine({ ...line, target: '3' }),
      withLine({ ...line, target: -2 }),
      withLine({ ...line, text: { toString: 'x' } }),
      withLine({ ...line, alsoIn: [{ label: 'also in', target: Number.NaN }] }),
      withLine({ ...line, alsoIn: [{ label: 'also in', target: 1, href: 'https://example.invalid' }] }),
      withLine({ text: line.text, line: line.line, target: line.target }),
      { type: 'digest', digest, extra: true },
    ];
    for (const message of bad) assert.equal(isToPanel(message), false, JSON.stringify(message));
  });

  it('never throws on anything (property)', () => {
    fc.assert(
      fc.property(fc.anything(), (junk) => {
        isToPanel({ type: 'digest', digest: junk });
        isToPanel(withLine(junk));
      }),
      { numRuns: 1000 },
    );
  });
});

describe('panel messages: revealing and dismissing a digest (panel → extension)', () => {
  it('accepts dismissDigest with no other field, and nothing more', () => {
    assert.deepEqual(parsePanelMessage({ type: 'dismissDigest' }), { ok: true, message: { type: 'dismissDigest' } });
    assert.deepEqual(parsePanelMessage({ type: 'dismissDigest', digestId: 1 }), { ok: false, reason: 'unexpected fields on dismissDigest' });
  });

  it('accepts a well-formed revealDigest unchanged', () => {
    const message = { type: 'revealDigest', digestId: 4, target: 0 };
    assert.deepEqual(parsePanelMessage(message), { ok: true, message });
  });

  it('rejects a revealDigest with a wrong, missing or extra field, with a reason', () => {
    const bad: unknown[] = [
      { type: 'revealDigest', digestId: 4 },
      { type: 'revealDigest', target: 0 },
      { type: 'revealDigest', digestId: '4', target: 0 },
      { type: 'revealDigest', digestId: 4, target: -1 },
      { type: 'revealDigest', digestId: 4, target: 0.5 },
      { type: 'revealDigest', digestId: 4, target: Number.POSITIVE_INFINITY },
      { type: 'revealDigest', digestId: 4, target: 0, uri: 'file:///etc/passwd' },
    ];
    for (const message of bad) {
      const parsed = parsePanelMessage(message);
      assert.equal(parsed.ok, false, JSON.stringify(message));
      if (!parsed.ok) assert.equal(parsed.reason, 'malformed revealDigest');
    }
  });
});
