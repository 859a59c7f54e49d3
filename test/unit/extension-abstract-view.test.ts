import assert from 'node:assert/strict';
import { readFileSync } from 'node:fs';
import { checkAbstract } from '../../src/core/check/abstract';
import { abstractView } from '../../src/extension/abstract-view';

describe('extension abstract view', () => {
  it('turns an engine report into a headline and findings with spans inside the document', () => {
    const text = readFileSync(new URL('../../media/demo/abstract-check.md', import.meta.url), 'utf8');
    const report = checkAbstract(text, { format: 'markdown' });
    assert.ok(report.ok);
    const view = abstractView(report, 'abstract-check.md');
    const unsupported = report.abstract.sentences.filter((s) => !s.supported).length;
    const uncovered = report.sections.filter((s) => !s.covered).length;
    assert.match(view.panel.headline, new RegExp(`covers ${report.sections.length - uncovered} of ${report.sections.length} sections`));
    assert.equal(view.panel.findings.length, unsupported + uncovered + report.notices.length);
    assert.ok(view.findings.length > 0);
    for (const finding of view.findings) assert.ok(finding.span.start >= 0 && finding.span.end <= text.length && finding.span.start < finding.span.end);
  });

  it('shows the engine’s reason when there is no abstract to check', () => {
    const view = abstractView({ ok: false, reason: 'noAbstract', error: 'No section headed Summary or Abstract.' }, 'x.md');
    assert.equal(view.panel.headline, 'No section headed Summary or Abstract.');
    assert.deepEqual(view.findings, []);
  });
});
