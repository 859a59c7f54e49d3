import assert from 'node:assert/strict';
import * as coherence from '../../src/core/coherence/index';

describe('coherence: public API', () => {
  it('exports exactly the documented names', () => {
    assert.deepEqual(Object.keys(coherence).sort(), [
      'CONNECTIVES',
      'PDTB2_CONNECTIVES',
      'REPAIR_DEFAULTS',
      'danglingTrigger',
      'danglingTriggers',
      'findStandAloneProblems',
      'repairAutomatically',
    ]);
  });

  it('returns plain data from danglingTrigger (no extra fields)', () => {
    assert.deepEqual(coherence.danglingTrigger('However, the ferry was late.'), {
      trigger: 'connective',
      words: 'However',
      start: 0,
      end: 7,
    });
    assert.equal(coherence.danglingTrigger('The ferry was late.'), null);
  });
});
