import assert from 'node:assert/strict';
import { inputProblem, looksBinary } from '../../src/core/input-guard';

describe('input guard', () => {
  it('refuses text over the size limit with the figures in the message', () => {
    const message = inputProblem('x'.repeat(2001), 2000);
    assert.match(message ?? '', /2,001 characters.*2,000-character limit/);
    assert.equal(inputProblem('x'.repeat(2000), 2000), null);
  });

  it('treats NUL bytes and control-character noise as binary, not tabs or CRLF', () => {
    assert.ok(looksBinary('abc\u0000def'));
    assert.ok(looksBinary('\u0001\u0002\u0003 a few words'));
    assert.ok(!looksBinary('tab\tseparated\r\nlines\n'));
  });
});
