import assert from 'node:assert/strict';
import { headingPrior, sectionPriors } from '../../src/core/rank/heading-prior';
import { HEADING_CLASSES } from '../../src/core/text/headings';

describe('heading prior (Edmundson 1969 location idea)', () => {
  it('favours headings that state the problem or the proposal', () => {
    for (const heading of ['Motivation', 'Overview', 'Goals', 'Introduction', 'Background', '1. Introduction']) {
      assert.ok(headingPrior(heading) > 1.2, `${heading}: ${headingPrior(heading)}`);
    }
    assert.ok(headingPrior('Design') > 1);
  });

  it('disfavours headings that weigh options, list open questions or point elsewhere', () => {
    for (const heading of ['Alternatives', 'Unresolved questions', 'Drawbacks', 'References', 'Prior art', 'Future possibilities', 'Future work']) {
      assert.ok(headingPrior(heading) < 0.8, `${heading}: ${headingPrior(heading)}`);
    }
  });

  it('is neutral for headings it does not know, and ignores case and punctuation', () => {
    assert.equal(headingPrior('Parser changes'), 1);
    assert.equal(headingPrior(''), 1);
    assert.equal(headingPrior('MOTIVATION:'), headingPrior('motivation'));
  });

  it('averages the rules a heading matches ("Rationale and alternatives")', () => {
    const rationale = headingPrior('Rationale');
    const alternatives = headingPrior('Alternatives');
    assert.equal(headingPrior('Rationale and alternatives'), (rationale + alternatives) / 2);
  });

  it('lets a longer phrase override the words inside it ("Future work" is one rule)', () => {
    // "Future work" is an aside; "work" alone names nothing, "future" alone is also an aside.
    assert.ok(HEADING_CLASSES.aside.phrases.includes('Future work'));
    assert.equal(headingPrior('Future work'), HEADING_CLASSES.aside.prior);
    assert.equal(headingPrior('Design and future work'), (HEADING_CLASSES.proposal.prior + HEADING_CLASSES.aside.prior) / 2);
  });

  it('reads "Non-goals" as a discussion, not as the goals it negates; "Copyright" and "Footnotes" as back matter', () => {
    for (const heading of ['Non-goals', 'Non Goals', 'Non-goals of this RFC']) assert.equal(headingPrior(heading), HEADING_CLASSES.discussion.prior, heading);
    assert.equal(headingPrior('Goals'), HEADING_CLASSES.introduction.prior);
    assert.equal(headingPrior('Copyright'), HEADING_CLASSES.backMatter.prior);
    assert.equal(headingPrior('Footnotes'), HEADING_CLASSES.backMatter.prior);
    assert.equal(headingPrior('Rejected ideas'), HEADING_CLASSES.aside.prior);
  });

  it('does not mistake "reference-level explanation" for a references section', () => {
    assert.ok(headingPrior('Reference-level explanation') > 1);
  });

  it('reads numbered and abbreviated headings ("IV. Results", "TL;DR")', () => {
    assert.equal(headingPrior('IV. Results'), HEADING_CLASSES.proposal.prior);
    assert.equal(headingPrior('TL;DR'), HEADING_CLASSES.abstract.prior);
  });

  it('lets a section with an unknown heading inherit its parent’s prior', () => {
    const priors = sectionPriors([
      { heading: '', parent: null },
      { heading: 'Motivation', parent: 0 },
      { heading: 'Parser changes', parent: 1 },
      { heading: 'Drawbacks', parent: 0 },
      { heading: 'Open items', parent: null },
    ]);
    assert.equal(priors[0], 1);
    assert.equal(priors[2], priors[1]);
    assert.ok(priors[3]! < 1);
    assert.equal(priors[4], 1);
  });
});
