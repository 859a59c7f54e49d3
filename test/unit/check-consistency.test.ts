import assert from 'node:assert/strict';
import { checkedText } from '../../src/core/check/consistency/claim-tokens';
import { checkComparatives } from '../../src/core/check/consistency/comparatives';
import type { DetectorInput, Evidence } from '../../src/core/check/consistency/detector';
import { checkIdentifiers, identifiersIn } from '../../src/core/check/consistency/identifiers';
import { checkModality, modalUses } from '../../src/core/check/consistency/modality';
import { checkNegation, NEGATION_CLOSENESS, negationScopes } from '../../src/core/check/consistency/negation';
import { checkNumbers } from '../../src/core/check/consistency/numbers';
import { numbersInText, quantitiesIn } from '../../src/core/check/consistency/quantities';

// Invented demo sentences (a city bike-share and a ferry timetable), one behaviour per test.
const evidence = (text: string, sentence = 0): Evidence => ({ sentence, checked: checkedText(text, 'en'), source: text, span: { start: 0, end: text.length } });

function input(claim: string, support: readonly string[], more: readonly string[] = []): DetectorInput {
  const supportEvidence = support.map((t, i) => evidence(t, i));
  const pool = [...supportEvidence, ...more.map((t, i) => evidence(t, 100 + i))];
  const numbers = new Set<number>();
  for (const e of pool) for (const q of quantitiesIn(e.checked)) if (typeof q.value === 'number') numbers.add(q.value);
  return {
    claim: checkedText(claim, 'en'),
    claimSource: claim,
    support: supportEvidence,
    pool,
    frame: supportEvidence[0] ?? null,
    body: { numbers, lowerSource: pool.map((e) => e.source.toLowerCase()).join('\n'), sentences: pool },
    language: 'en',
  };
}

describe('check consistency: quantities', () => {
  it('reads digits, number words, percentages, ratio words, dates and versions with what they count', () => {
    const found = quantitiesIn(checkedText('Twelve stations, 8,200 riders, 7.4% of trips, half the docks, 1 March 2024, version 1.2.3 and two hundred bikes.', 'en'));
    assert.deepEqual(found.map((q) => [q.kind, q.value]), [
      ['number', 12], ['number', 8200], ['percent', 7.4], ['ratio', 0.5], ['date', '2024-03-01'], ['version', '1.2.3'], ['number', 200],
    ]);
    assert.equal(found[0]!.phrase, 'Twelve stations');
    assert.ok(found[0]!.context.has('station'));
  });

  it('does not read "one" as a count in "one of" or "this one"', () => {
    assert.deepEqual(quantitiesIn(checkedText('One of the docks, and this one too.', 'en')), []);
  });
});

describe('check consistency: numbers', () => {
  it('reports a changed count of the same thing, with both sides', () => {
    const findings = checkNumbers(input('The scheme has 12 stations in the old town.', ['The scheme has 21 stations in the old town.']));
    assert.equal(findings.length, 1);
    assert.equal(findings[0]!.abstractSays, '12 stations');
    assert.equal(findings[0]!.bodySays, '21 stations');
  });

  it('accepts the same value written another way (twelve = 12, 50% = half)', () => {
    assert.deepEqual(checkNumbers(input('The scheme has twelve stations.', ['The scheme has 12 stations.'])), []);
    assert.deepEqual(checkNumbers(input('Rebalancing trips fell by 50% in May.', ['Rebalancing trips fell by half in May.'])), []);
  });

  it('reports a figure the body never writes anywhere, with no place to cite', () => {
    const findings = checkNumbers(input('Riders joined from 2019 onwards.', ['Riders joined in large numbers.']));
    assert.equal(findings.length, 1);
    assert.equal(findings[0]!.evidence, null);
    assert.match(findings[0]!.note ?? '', /never gives 2019/);
  });

  it('accepts a figure the body writes only outside its sentences (a table, a code block)', () => {
    const base = input('Riders joined from 2019 onwards.', ['Riders joined in large numbers.']);
    assert.deepEqual(checkNumbers({ ...base, body: { ...base.body, textNumbers: new Set([2019]) } }), []);
  });

  it('does not read a reference marker or a link target as a figure', () => {
    assert.deepEqual(checkNumbers(input('Riders joined early [3].', ['Riders joined in large numbers.'])), []);
    assert.deepEqual(checkNumbers(input('Riders joined early, see https://example.org/report/2019.', ['Riders joined in large numbers.'])), []);
  });

  it('does not read a number shown only in code or an inline target as a count', () => {
    assert.deepEqual(checkNumbers(input('Riders pay with `fare(2)` at the dock.', ['Riders pay at the dock.'])), []);
    assert.deepEqual(checkNumbers(input('_`Goal 3`: riders pay at the dock.', ['Riders pay at the dock.'])), []);
    // Written outside the code span as well: still a count.
    const outside = checkNumbers(input('Riders pay 2 fares with `fare(2)`.', ['Riders pay fares at the dock.']));
    assert.ok(outside.some((f) => f.abstractSays === '2 fares'), JSON.stringify(outside));
  });

  it('does not report a document reference the body never mentions, but does report a different one', () => {
    assert.deepEqual(checkNumbers(input('This follows proposal RFC 1728 for docks.', ['This follows the dock proposal.'])), []);
    assert.deepEqual(checkNumbers(input('Riders asked for it in issue #961.', ['Riders asked for it.'])), []);
    assert.deepEqual(checkNumbers(input('This builds on RFCs 352 and 955 for docks.', ['This builds on the dock proposals.'])), []);
    assert.equal(checkNumbers(input('This builds on 352 docks and 955 bikes.', ['This builds on the dock proposals.'])).length, 2);
    const changed = checkNumbers(input('This follows RFC 1728 for docks.', ['This follows RFC 1182 for docks.']));
    assert.equal(changed.length, 1);
    assert.equal(changed[0]!.bodySays, '1182');
  });

  it('reports a reference the body never names when the body names others of its kind, citing one', () => {
    // The support speaks of something else; the body names issue #961 elsewhere, never #964.
    const changed = checkNumbers(input('Riders asked for it in issue #964.', ['Riders asked for it.'], ['The dock fix follows issue #961 closely.']));
    assert.equal(changed.length, 1, JSON.stringify(changed));
    assert.equal(changed[0]!.note, 'the body never names #964');
    assert.equal(changed[0]!.bodySays, '#961');
    assert.equal(changed[0]!.evidence?.sentence, 100);
    // "RFC #1859" and "rfcs#3875" are references of the "#" kind too.
    assert.equal(checkNumbers(input('Replace RFC #5578 with docks.', ['Replace the dock proposal.'], ['See RFC #1859 for docks.'])).length, 1);
    // A reference word is named as the claim writes it, for one document.
    const listed = checkNumbers(input('This builds on RFCs 352 and 956 for docks.', ['This builds on the dock proposals.'], ['See RFC 352 and RFC 955.']));
    assert.deepEqual(listed.map((f) => f.note), ['the body never names RFC 956']);
    assert.equal(checkNumbers(input('Docks come first (rfcs#3878).', ['Docks come first.'], ['Proposal: rfcs#3875 for docks.'])).length, 1);
    // The body names this very reference: nothing to report; it names only another kind: not checked.
    assert.deepEqual(checkNumbers(input('Riders asked for it in issue #961.', ['Riders asked for it.'], ['See issue #961 and RFC 12.'])), []);
    assert.deepEqual(checkNumbers(input('This follows RFC 1728 for docks.', ['This follows the dock proposal.'], ['See issue #961.'])), []);
    // A "#" inside a link target stays a link.
    assert.deepEqual(checkNumbers(input('See https://example.org/docks#2019 for riders.', ['Riders joined.'], ['See issue #961.'])), []);
  });

  it('reads a number joined to its word ("6-dock stations")', () => {
    const findings = checkNumbers(input('The city opened 8-dock stations.', ['The city opened 6-dock stations.']));
    assert.equal(findings.length, 1);
    assert.equal(findings[0]!.bodySays, '6-dock stations');
  });

  it('reports a value the body never gives when it counts the same thing elsewhere', () => {
    const findings = checkNumbers(input('Vans moved 300 bikes a day.', ['Vans moved bikes between docks.'], ['On a busy day vans moved 240 bikes.']));
    assert.equal(findings.length, 1);
    assert.match(findings[0]!.note ?? '', /never gives 300/);
    assert.equal(findings[0]!.bodySays, '240 bikes');
  });

  it('takes the year of an ISO date as written, not its month and day', () => {
    const written = numbersInText('the pilot started on 2024-12-19 with 40 docks.');
    assert.ok(written.has(2024) && written.has(40));
    assert.ok(!written.has(12) && !written.has(19));
    // So "12 stations" is a figure the body never gives, although the date has a 12 in it.
    const claim = input('The pilot opened 12 stations.', ['The pilot opened stations across the city.']);
    const findings = checkNumbers({ ...claim, body: { ...claim.body, textNumbers: written } });
    assert.equal(findings.length, 1);
    assert.match(findings[0]!.note ?? '', /never gives 12/);
  });
});

describe('check consistency: negation (NegEx scope, Chapman et al. 2001)', () => {
  it('scopes a cue over the following words up to punctuation or a termination word', () => {
    const scopes = negationScopes(checkedText('The ferry does not stop at the pier, but it runs late.', 'en'));
    assert.equal(scopes.length, 1);
    assert.equal(checkedText('The ferry does not stop at the pier, but it runs late.', 'en').tokens[scopes[0]!.head!]!.lower, 'stop');
  });

  it('does not take a nominal negation ("has no cabins") as contradicted by a body that names the thing', () => {
    assert.deepEqual(checkNegation(input('The night ferry has no cabins for passengers.', ['The cabins for passengers are on the night ferry.'])), []);
    assert.equal(checkNegation(input('The night ferry does not stop at the pier.', ['The night ferry stops at the pier.'])).length, 1);
  });

  it('ignores pseudo-negations and a contrasting "not"', () => {
    assert.deepEqual(negationScopes(checkedText('Not only the ferry but also the bus runs late.', 'en')), []);
    assert.deepEqual(negationScopes(checkedText('Fares are a flat rate, not a distance charge.', 'en')), []);
  });

  it('reports a flipped negation in either direction', () => {
    const added = checkNegation(input('The new timetable does not reduce waiting times at the pier.', ['The new timetable does reduce waiting times at the pier.']));
    assert.equal(added.length, 1);
    assert.equal(added[0]!.abstractSays, 'does not reduce waiting');
    const removed = checkNegation(input('The new timetable does reduce waiting times at the pier.', ['The new timetable does not reduce waiting times at the pier.']));
    assert.equal(removed.length, 1);
    // In both directions the cited sentence must be close enough to the claim.
    const far = input('The new timetable does reduce waiting times at the pier.', ['The new timetable does not reduce waiting times at the pier.']);
    assert.deepEqual(checkNegation({ ...far, closeness: () => NEGATION_CLOSENESS / 2 }), []);
    assert.equal(checkNegation({ ...far, closeness: () => NEGATION_CLOSENESS }).length, 1);
  });

  it('reads the body where it uses the negated word, even when that sentence shares little else with the claim', () => {
    // The closest body sentence using "late" says plainly that the ferry runs late.
    const claim = 'On Sundays the island ferry is not late.';
    const findings = checkNegation(input(claim, ['On Sundays the island ferry carries bikes.'], ['The ferry is late most mornings.']));
    assert.equal(findings.length, 1);
    assert.equal(findings[0]!.abstractSays, 'is not late');
    assert.match(findings[0]!.bodySays ?? '', /^late/);
    // A body sentence that negates the word too agrees with the claim.
    assert.deepEqual(checkNegation(input(claim, ['On Sundays the island ferry carries bikes.'], ['The ferry is not late on Sundays.'])), []);
    // A body sentence too far from the claim (support strength below NEGATION_CLOSENESS) is not cited.
    const far = input(claim, ['On Sundays the island ferry carries bikes.'], ['The ferry is late most mornings.']);
    assert.deepEqual(checkNegation({ ...far, closeness: () => NEGATION_CLOSENESS / 2 }), []);
    assert.equal(checkNegation({ ...far, closeness: () => NEGATION_CLOSENESS }).length, 1);
    // A word the body never uses is left to the support rule.
    assert.deepEqual(checkNegation(input('On Sundays the island ferry is not crowded.', ['On Sundays the island ferry carries bikes.'])), []);
  });

  it('lets a body sentence that restates the claim decide, over other sentences that use the word', () => {
    const restated = 'Today the night ferry does not stop at the pier.';
    const other = 'The day ferry does not stop at the old pier.';
    const close = (e: Evidence) => (e.source === restated.replace(' not', '') ? 0.9 : 0.3);
    // The body restates the claim without its negation; another sentence negates "stop" of something else.
    const flipped = input('Today the night ferry does not stop at the pier.', [restated.replace(' not', '')], [other]);
    assert.deepEqual(checkNegation(flipped), [], 'without closeness figures the other sentence agrees, as before');
    const found = checkNegation({ ...flipped, closeness: close });
    assert.equal(found.length, 1, JSON.stringify(found));
    assert.equal(found[0]!.evidence?.source, restated.replace(' not', ''));
    // Two restatements that disagree: the body says it both ways, so nothing is reported.
    const both = input('Today the night ferry does not stop at the pier.', [restated.replace(' not', '')], [restated]);
    assert.deepEqual(checkNegation({ ...both, closeness: () => 0.9 }), []);
    // The other direction: the claim asserts, the restatement negates, a looser sentence asserts.
    const asserted = input('Today the night ferry does stop at the pier.', [restated], ['The day ferry stops at the old pier.']);
    assert.deepEqual(checkNegation(asserted), []);
    assert.equal(checkNegation({ ...asserted, closeness: (e) => (e.source === restated ? 0.9 : 0.3) }).length, 1);
  });

  it('stays silent when the pool agrees with the claim', () => {
    const findings = checkNegation(input('The new timetable does not reduce waiting times at the pier.', ['The new timetable does reduce waiting times at the pier.'], ['The new timetable does not reduce waiting times at the pier much.']));
    assert.deepEqual(findings, []);
  });
});

describe('check consistency: modality', () => {
  it('groups modal verbs by strength and finds the word each governs', () => {
    const uses = modalUses(checkedText('Operators must publish the timetable and may add a late crossing.', 'en'));
    assert.deepEqual(uses.map((u) => u.modalClass), ['obligation', 'possibility']);
  });

  it('does not take a quoted value for the word a modal governs (common practice, no source)', () => {
    // "should be 'cancelled'" names a status value, not a verb the modal commits to (invented demo sentence).
    assert.deepEqual(modalUses(checkedText("The crossing status should be 'cancelled' after a storm warning.", 'en')), []);
    assert.equal(modalUses(checkedText('The crossing should be cancelled after a storm warning.', 'en')).length, 1);
  });

  it('reports must against may on the same verb, and accepts a plain statement for "will"', () => {
    const swapped = checkModality(input('Operators must publish the winter timetable online.', ['Operators may publish the winter timetable online.']));
    assert.equal(swapped.length, 1);
    assert.equal(swapped[0]!.abstractSays, 'must publish');
    assert.equal(swapped[0]!.bodySays, 'may publish');
    assert.deepEqual(checkModality(input('Operators will publish the winter timetable online.', ['Operators publish the winter timetable online.'])), []);
  });

  it('accepts the claim\'s modal on the word anywhere in the body\'s closest sentences about it', () => {
    const claim = 'Operators must publish the winter timetable online.';
    assert.equal(checkModality(input(claim, ['Operators may publish the winter timetable online.'])).length, 1);
    assert.deepEqual(checkModality(input(claim, ['Operators may publish the winter timetable online.'], ['Each operator must publish its timetable.'])), []);
  });

  it('takes "will" and "can" for the same claim, but not "will" and "must"', () => {
    assert.deepEqual(checkModality(input('The kiosk will print a paper ticket on request.', ['The kiosk can print a paper ticket on request.'])), []);
    assert.deepEqual(checkModality(input('The kiosk could print a paper ticket on request.', ['The kiosk would print a paper ticket on request.'])), []);
    assert.equal(checkModality(input('The kiosk will print a paper ticket on request.', ['The kiosk must print a paper ticket on request.'])).length, 1);
  });
});

describe('check consistency: comparatives', () => {
  it('reports faster against slower about the same thing', () => {
    const findings = checkComparatives(input('Electric bikes are faster on the hill routes.', ['Electric bikes are slower on the hill routes.']));
    assert.equal(findings.length, 1);
    assert.equal(findings[0]!.abstractSays, 'faster');
  });

  it('needs "more"/"less" to qualify the same word', () => {
    assert.deepEqual(checkComparatives(input('Riders made more trips in summer.', ['Riders made fewer complaints in summer.'])), []);
    assert.equal(checkComparatives(input('Riders made more trips in summer.', ['Riders made fewer trips in summer.'])).length, 1);
  });
});

describe('check consistency: identifiers', () => {
  it('reads code spans, options, file names and paths from the source', () => {
    const found = identifiersIn('Set `max_docks` with --dock-limit in fleet.toml or call fleet::rebalance() here.');
    assert.deepEqual(found.map((i) => [i.kind, i.text]), [['code', 'max_docks'], ['option', '--dock-limit'], ['file', 'fleet.toml'], ['path', 'fleet::rebalance']]);
  });

  it('reports a swapped identifier in the same slot, and an option the body never mentions', () => {
    const swap = checkIdentifiers(input('The planner reads `dock_limit` from the config file.', ['The planner reads `van_capacity` from the config file.']));
    assert.equal(swap.length, 1);
    assert.equal(swap[0]!.bodySays, 'van_capacity');
    const absent = checkIdentifiers(input('Start the planner with --night-mode enabled.', ['Start the planner with the night settings enabled.']));
    assert.equal(absent.length, 1);
    assert.match(absent[0]!.note ?? '', /never mentions --night-mode/);
    // A snippet of code is written many ways: a different one in the body is not a swapped name.
    assert.deepEqual(checkIdentifiers(input('The planner skips a dock when `free == 0` holds.', ['The planner skips a dock when `dock.free() == 0` holds.'])), []);
    assert.equal(checkIdentifiers(input('The planner reads `dock_limit` from the file.', ['The planner reads `limit == 4` and `van_capacity` from the file.'])).length, 1);
    assert.deepEqual(checkIdentifiers(input('The planner reads `dock_limit` at start.', ['The planner reads `dock_limit` at start.'])), []);
  });

  it('counts a path as named by its last segment, and does not take an identifier of another kind in the same place for a swap', () => {
    assert.deepEqual(checkIdentifiers(input('Move the fleet::planner::Rebalancer type to a new crate.', ['Move the `Rebalancer` type and the `van_capacity` option to a new crate.'])), []);
    // Another path in the frame is still a swap.
    const swap = checkIdentifiers(input('Call fleet::planner::rebalance at night.', ['Call fleet::depot::restock at night.']));
    assert.equal(swap.length, 1);
    assert.equal(swap[0]!.bodySays, 'fleet::depot::restock');
    // A code span where the claim has a path, with the same word before it: not a swap.
    assert.deepEqual(checkIdentifiers(input('Read it from fleet::planner::limits at start.', ['Read it from `dock_limit` at start.'])), []);
  });
});
