import assert from 'node:assert/strict';
import fc from 'fast-check';
import { danglingTrigger, danglingTriggers } from '../../src/core/coherence/index';

const first = (text: string) => {
  const hit = danglingTrigger(text);
  return hit ? `${hit.trigger}:${hit.words}` : null;
};

describe('coherence: pronouns', () => {
  it('flags subject, possessive and object pronouns near the start that have no antecedent', () => {
    assert.equal(first('It runs for twenty minutes at dawn.'), 'pronoun:It');
    assert.equal(first('They usually sell out before ten.'), 'pronoun:They');
    assert.equal(first('Its battery lasts three weeks.'), 'pronoun:Its');
    assert.equal(first('In practice, it rarely needs a reset.'), 'pronoun:it');
    assert.equal(first('We moved them to the cold room.'), 'pronoun:them');
    assert.equal(first("It's faster than the paper log."), "pronoun:It's");
  });

  it('accepts a pronoun whose antecedent comes earlier in the same sentence', () => {
    assert.equal(first('When volunteers finish a shift, they log their hours.'), null);
    assert.equal(first('If the probe reads wet, it skips the cycle.'), null);
    assert.equal(first('Unless a sailing is cancelled, the timetable shows it in green.'), null);
    assert.equal(first('Each orchard row has its own valve.'), null);
  });

  it('checks number roughly: "they" after a singular noun still dangles', () => {
    assert.equal(first('When the booking opens, they fill within an hour.'), 'pronoun:they');
    assert.equal(first('When the bookings open, they fill within an hour.'), null);
  });

  it('does not let an object pronoun point at its own clause subject (binding principle B, from memory)', () => {
    assert.equal(first('The team moved them to the cold room.'), 'pronoun:them');
  });

  it('treats a noun in a leading prepositional phrase as no antecedent', () => {
    assert.equal(first('After the storm, it reported 140 km/h.'), 'pronoun:it');
  });

  // Halliday and Hasan (1976), "Cohesion in English", open with this recipe pair to show a pronoun
  // that only makes sense with the sentence before it (quoted from memory).
  it('flags the object pronoun of the classic "cooking apples" example', () => {
    assert.equal(first('Wash and core six cooking apples.'), null);
    assert.equal(first('Put them into a fireproof dish.'), 'pronoun:them');
  });
});

describe('coherence: generic "it"', () => {
  const generic = [
    'It is important to wipe the blades.',
    'It is possible to book a whole night.',
    'It seems that the sensors drain fast.',
    'It turns out most returns are late.',
    'It is worth checking the tide table.',
    'It takes three hours for rye to rise.',
    'It is not clear whether slang belongs.',
    'It makes sense to charge overnight.',
    'It rained for nine days.',
    "It's a good idea to learn the hymns.",
    'It is recommended that samples are tested.',
    'It can be hard to find the path after dark.',
    'It is likely that the pass closes.',
  ];
  for (const sentence of generic) {
    it(`does not flag: ${sentence}`, () => assert.equal(first(sentence), null));
  }

  const referential = [
    'It is used to store the daily totals.',
    'It is faster than the paper log.',
    'It is easy to install.',
    'It is likely to fail in winter.',
    'It seems slow on old phones.',
  ];
  for (const sentence of referential) {
    it(`still flags: ${sentence}`, () => assert.equal(danglingTrigger(sentence)?.trigger, 'pronoun'));
  }
});

describe('coherence: demonstratives', () => {
  it('flags "this/these/those/such" with their noun, and bare "this/that"', () => {
    assert.equal(first('This approach saves water.'), 'demonstrative:This approach');
    assert.equal(first('These changes halved the queue.'), 'demonstrative:These changes');
    assert.equal(first('This means the list works offline.'), 'demonstrative:This');
    assert.equal(first('That made the gripper reliable.'), 'demonstrative:That');
    assert.equal(first('Such a delay is rare.'), 'demonstrative:Such a delay');
    assert.equal(first('We chose this layout for small screens.'), 'demonstrative:this layout');
    assert.equal(first('At that point, the valve had been open for hours.'), 'demonstrative:that point');
  });

  it('does not flag "that" as a complementizer or relative pronoun', () => {
    assert.equal(first('We propose that the loan period be ten days.'), null);
    assert.equal(first('Note that the dome closes in rain.'), null);
    assert.equal(first('That the controller survived surprised everyone.'), null);
    assert.equal(first('Tools that come back dirty are cleaned.'), null);
  });

  it('does not flag self-reference, time phrases, "those who" or "such as"', () => {
    assert.equal(first('This section lists the landings.'), null);
    assert.equal(first('This guide explains the booking.'), null);
    // A design document's "this design" / "this plan" is the document itself, as "this proposal" is.
    assert.equal(first('This design keeps the crossings the tide allows.'), null);
    assert.equal(first('This plan replaces the printed timetable.'), null);
    assert.equal(first('This approach replaces the printed timetable.'), 'demonstrative:This approach');
    assert.equal(first('This year the club built two robots.'), null);
    assert.equal(first('Those who borrow a ladder sign a note.'), null);
    assert.equal(first('Tools such as saws need a briefing.'), null);
  });

  it('accepts "this" later in a sentence whose first clause supplies the referent', () => {
    assert.equal(first('The new oven heats faster, and this lets the bakers start later.'), null);
  });
});

describe('coherence: back-references', () => {
  it('flags the former/latter, above/below pointers and "as mentioned"', () => {
    assert.equal(first('The latter is cheaper.'), 'backReference:The latter');
    assert.equal(first('The former takes a photo.'), 'backReference:The former');
    assert.equal(first('The steps above must be repeated.'), 'backReference:above');
    assert.equal(first('The above settings apply in summer.'), 'backReference:The above');
    assert.equal(first('Repeat the procedure described above.'), 'backReference:described above');
    assert.equal(first('See below for the abbreviations.'), 'backReference:See below');
    assert.equal(first('As mentioned, the guide works offline.'), 'backReference:As mentioned');
    assert.equal(first('As noted earlier, the dome shuts in wind.'), 'backReference:As noted earlier');
    assert.equal(first('The aforementioned valve is replaced yearly.'), 'backReference:aforementioned');
    assert.equal(first('Entries follow the previous step.'), 'backReference:the previous step');
    assert.equal(first('We doubt the last option is needed.'), 'backReference:the last option');
    assert.equal(first('In the second case the ferry waits at the pier.'), 'backReference:the second case');
    assert.equal(first('The following example shows a dock schedule in the new format.'), 'backReference:The following example');
    assert.equal(first('Operators paste the following snippet into the ferry config.'), 'backReference:the following snippet');
    assert.equal(first('Add the following lines to the pier config to start the ticket scanner.'), 'backReference:the following lines');
    assert.equal(first('Run the following command on every dock server.'), 'backReference:the following command');
  });

  it('does not flag "the former" as "ex-", "above" as a preposition, or a named source', () => {
    assert.equal(first('The first option keeps the printed timetable.'), null);
    assert.equal(first('Of the three ferries, the last one sails at nine.'), null);
    assert.equal(first('We compared the old timetable and the tide plan, and the second approach won.'), null);
    assert.equal(first('The former head baker supplies the starter.'), null);
    assert.equal(first('The latter half of the year is busy.'), null);
    assert.equal(first('Readings above 35 degrees raise an alert.'), null);
    assert.equal(first('Above all, return tools clean.'), null);
    assert.equal(first('Temperatures below zero stop the pump.'), null);
    assert.equal(first('As described in the style guide, units stay.'), null);
    assert.equal(first('The following day the ferry sails at noon.'), null);
  });
});

describe('coherence: additive back-references', () => {
  it('flags "also" near the start and final "too", "as well", "either", and "Another ..."', () => {
    assert.equal(first('The app also sells tickets.'), 'additive:also');
    assert.equal(first('The basses rehearse on Tuesdays too.'), 'additive:too');
    assert.equal(first('The glossary supports Welsh as well.'), 'additive:as well');
    assert.equal(first('The backup does not log errors either.'), 'additive:either');
    assert.equal(first('Another option is to bake the night before.'), 'additive:Another option');
    assert.equal(first('The other ferry runs only in summer.'), 'additive:The other ferry');
  });

  it('does not flag "also" that adds within the sentence, or in "also known as"', () => {
    assert.equal(first('The desk lends and also repairs tools.'), null);
    assert.equal(first('Not only drills but also ladders are lent.'), null);
    assert.equal(first('The square, also known as the market, floods.'), null);
    assert.equal(first('The glossary supports Welsh as well as Irish.'), null);
    assert.equal(first('The dough is far too wet.'), null);
  });
});

describe('coherence: trigger reporting', () => {
  it('lists every trigger in reading order, the first one wins', () => {
    const hits = danglingTriggers('However, this approach also avoids it.');
    assert.deepEqual(
      hits.map((h) => h.trigger),
      // "it" is the object of "avoids", so "this approach" cannot be its antecedent.
      ['connective', 'demonstrative', 'additive', 'pronoun'],
    );
    assert.equal(danglingTrigger('However, this approach also avoids it.')?.trigger, 'connective');
  });

  it('reports offsets that slice back to the words, for any text (property)', () => {
    const words = ['However,', 'it', 'this', 'approach', 'the', 'latter', 'also', 'too', 'that', 'as', 'mentioned,',
      'valve', 'opens', 'They', 'such', 'above', 'is', 'important', 'to', 'and', '.', '“', 'ferries', 'Another'];
    fc.assert(
      fc.property(fc.array(fc.constantFrom(...words), { maxLength: 14 }), fc.constantFrom('', ' ', '  '), (parts, pad) => {
        const text = pad + parts.join(' ');
        for (const hit of danglingTriggers(text)) {
          assert.equal(text.slice(hit.start, hit.end), hit.words);
          assert.ok(hit.start >= 0 && hit.end > hit.start && hit.end <= text.length);
        }
        const hits = danglingTriggers(text);
        for (let i = 1; i < hits.length; i++) assert.ok(hits[i]!.start >= hits[i - 1]!.end, 'hits overlap or are out of order');
      }),
      { numRuns: 400 },
    );
  });

  it('finds nothing in an empty or punctuation-only sentence', () => {
    assert.equal(danglingTrigger(''), null);
    assert.equal(danglingTrigger('—'), null);
  });
});

describe('coherence: demonstratives further into the sentence', () => {
  it('flags "these + noun" anywhere in a simple first clause', () => {
    assert.equal(first('The compiler currently tries hard to enforce these rules.'), 'demonstrative:these rules');
  });

  it('accepts a demonstrative whose noun was named earlier in the sentence', () => {
    assert.equal(first('Because consts need the match property, and this property cannot be checked, generics are refused.'), null);
  });

  it('stops at the first clause link: a later clause may hold the referent', () => {
    assert.equal(first('The scheduler retries failed jobs twice and these retries are logged.'), null);
  });
});
