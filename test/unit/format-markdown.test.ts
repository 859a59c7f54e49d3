import assert from 'node:assert/strict';
import { escapeMarkdown } from '../../src/core/render/markdown';

describe('escapeMarkdown', () => {
  it('neutralises markup characters and list markers in quoted prose', () => {
    assert.equal(escapeMarkdown('Use *all* of [docs](x) <b>'), 'Use \\*all\\* of \\[docs\\](x) \\<b\\>');
    assert.equal(escapeMarkdown('- not a list'), '\\- not a list');
    assert.equal(escapeMarkdown('1. not a list'), '1\\. not a list');
    assert.equal(escapeMarkdown('# not a heading'), '\\# not a heading');
  });
});
