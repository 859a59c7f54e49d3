import assert from 'node:assert/strict';
import { readFileSync } from 'node:fs';
import { checkAbstract } from '../../src/core/check/abstract';
import { abstractView } from '../../src/extension/abstract-view';

describe('extension abstract view', () => {
  it('names an opening-text abstract as such in the headline', () => {
    const text = readFileSync(new URL('../../media/demo/ferry-timetable-planner.rst', import.meta.url), 'utf8');
    const report = checkAbstract(text, { format: 'restructuredtext', abstract: { kind: 'opening' } });
    assert.ok(report.ok);
    assert.match(abstractView(report, 'ferry-timetable-planner.rst').panel.headline, /^The opening text: \d+ sentences/);
  });

  it('turns an engine report into a headline and findings with spans inside the document', () => {
    const text = readFileSync(new URL('../../media/demo/abstract-check.md', import.meta.url), 'utf8');
    const report = checkAbstract(text, { format: 'markdown' });
    assert.ok(report.ok);
    const view = abstractView(report, 'abstract-check.md');
    const unsupported = report.abstract.sentences.filter((s) => !s.supported).length;
    const uncovered = report.sections.filter((s) => !s.covered).length;
    assert.match(view.panel.headline, new RegExp(`covers ${report.sections.length - uncovered} of ${report.sections.length} sections`));
    const claims = report.abstract.sentences.filter((s) => s.claim).length;
    const loose = report.findings.filter((f) => !report.abstract.sentences[f.abstractSentence]!.claim).length;
    assert.equal(view.panel.items.length, claims + loose + uncovered + (report.rouge ? 1 : 0) + report.notices.length);
    assert.equal(view.panel.items.filter((i) => i.severity === 'warning').length, unsupported + loose, 'a finding is shown once, inside its claim');
    assert.ok(view.findings.length > 0);
    for (const finding of view.findings) assert.ok(finding.span.start >= 0 && finding.span.end <= text.length && finding.span.start < finding.span.end);
    // Every place an item or link points to is inside the document; a supported claim links to its support lines.
    for (const span of view.places) assert.ok(span.start >= 0 && span.end <= text.length && span.start <= span.end);
    const targets = view.panel.items.flatMap((i) => [i.target, ...i.links.map((l) => l.target)]).filter((t) => t !== null);
    assert.ok(targets.every((t) => t! < view.places.length));
    const supported = view.panel.items.find((i) => i.severity === 'ok');
    if (supported) assert.ok(supported.links.length > 0 && supported.links.every((l) => /^line \d+$/.test(l.label)));
    // No item links the same body sentence twice, and link labels tell apart two sentences on one
    // line (the demo's changed-number claim cites two sentences of line 50).
    for (const item of view.panel.items) {
      const starts = item.links.map((l) => view.places[l.target]!.start);
      assert.equal(new Set(starts).size, starts.length, `${item.text}: ${item.links.map((l) => l.label).join(', ')}`);
      assert.equal(new Set(item.links.map((l) => l.label)).size, item.links.length, `${item.text}: ${item.links.map((l) => l.label).join(', ')}`);
    }
    assert.ok(view.panel.items.some((i) => i.links.some((l) => l.label === 'line 50 (2)')), 'the demo has two cited sentences on line 50');
    // Each uncovered section links to its heading's line.
    for (const section of report.sections.filter((s) => !s.covered)) {
      const item = view.panel.items.find((i) => i.text.includes(`“${section.heading}”`) && i.text.includes('leaves out'))!;
      assert.equal(text.slice(view.places[item.target!]!.start).split('\n')[0], text.slice(section.span.start).split('\n')[0]);
    }
  });

  it('shows the engine’s reason when there is no abstract to check', () => {
    const view = abstractView({ ok: false, reason: 'noAbstract', error: 'No section headed Summary or Abstract.' }, 'x.md');
    assert.equal(view.panel.headline, 'No section headed Summary or Abstract.');
    assert.deepEqual(view.findings, []);
  });
});
