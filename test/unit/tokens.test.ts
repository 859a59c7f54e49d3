import assert from 'node:assert/strict';
import { deu, eng, fra, rus } from 'stopword';
import porterModule from 'natural/lib/natural/stemmers/porter_stemmer.js';
import { languageFor } from '../../src/core/text/languages';
import {
  SUPPORTED_LANGUAGES,
  contentTerms,
  detectLanguage,
  stem,
  stopWords,
  wordTokens,
} from '../../src/core/text/tokens';

/** natural exports the single steps of its Porter stemmer for testing; our typings only name `stem`. */
interface PorterSteps {
  step1a(word: string): string;
  step1b(word: string): string;
  step1c(word: string): string;
  step2(word: string): string;
  step3(word: string): string;
  step4(word: string): string;
  step5a(word: string): string;
  step5b(word: string): string;
}
const porterSteps = porterModule as unknown as PorterSteps;

/**
 * The worked examples of each step, from M. F. Porter, "An algorithm for suffix stripping",
 * Program 14(3), 130-137, 1980 (the step tables; cross-checked against the tables quoted in the
 * docstrings of NLTK's nltk/stem/porter.py). Each pair is the input and output of that one step.
 */
const PAPER_STEP_EXAMPLES: Readonly<Record<keyof PorterSteps, readonly (readonly [string, string])[]>> = {
  step1a: [['caresses', 'caress'], ['ponies', 'poni'], ['ties', 'ti'], ['caress', 'caress'], ['cats', 'cat']],
  step1b: [
    ['feed', 'feed'], ['agreed', 'agree'], ['plastered', 'plaster'], ['bled', 'bled'], ['motoring', 'motor'],
    ['sing', 'sing'], ['conflated', 'conflate'], ['troubled', 'trouble'], ['sized', 'size'], ['hopping', 'hop'],
    ['tanned', 'tan'], ['falling', 'fall'], ['hissing', 'hiss'], ['fizzed', 'fizz'], ['failing', 'fail'],
    ['filing', 'file'],
  ],
  step1c: [['happy', 'happi'], ['sky', 'sky']],
  step2: [
    ['relational', 'relate'], ['conditional', 'condition'], ['rational', 'rational'], ['valenci', 'valence'],
    ['hesitanci', 'hesitance'], ['digitizer', 'digitize'], ['conformabli', 'conformable'], ['radicalli', 'radical'],
    ['differentli', 'different'], ['vileli', 'vile'], ['analogousli', 'analogous'], ['vietnamization', 'vietnamize'],
    ['predication', 'predicate'], ['operator', 'operate'], ['feudalism', 'feudal'], ['decisiveness', 'decisive'],
    ['hopefulness', 'hopeful'], ['callousness', 'callous'], ['formaliti', 'formal'], ['sensitiviti', 'sensitive'],
    ['sensibiliti', 'sensible'],
  ],
  step3: [
    ['triplicate', 'triplic'], ['formative', 'form'], ['formalize', 'formal'], ['electriciti', 'electric'],
    ['electrical', 'electric'], ['hopeful', 'hope'], ['goodness', 'good'],
  ],
  step4: [
    ['revival', 'reviv'], ['allowance', 'allow'], ['inference', 'infer'], ['airliner', 'airlin'],
    ['gyroscopic', 'gyroscop'], ['adjustable', 'adjust'], ['defensible', 'defens'], ['irritant', 'irrit'],
    ['replacement', 'replac'], ['adjustment', 'adjust'], ['dependent', 'depend'], ['adoption', 'adopt'],
    ['homologou', 'homolog'], ['communism', 'commun'], ['activate', 'activ'], ['angulariti', 'angular'],
    ['homologous', 'homolog'], ['effective', 'effect'], ['bowdlerize', 'bowdler'],
  ],
  step5a: [['probate', 'probat'], ['rate', 'rate'], ['cease', 'ceas']],
  step5b: [['controll', 'control'], ['roll', 'roll']],
};

/**
 * Whole-word results of the full algorithm for words from the paper's tables, derived by hand by
 * running the paper's later steps on each step's output (e.g. agreed -> agree in step 1b, then
 * step 5a removes the final e since m(agre) = 1 and "agre" does not end consonant-vowel-consonant).
 * "generalizations" -> "gener" is the paper's own multi-step example in its introduction (from memory).
 */
const FULL_ALGORITHM: readonly (readonly [string, string])[] = [
  ['caresses', 'caress'], ['ponies', 'poni'], ['ties', 'ti'], ['caress', 'caress'], ['cats', 'cat'],
  ['feed', 'feed'], ['agreed', 'agre'], ['plastered', 'plaster'], ['motoring', 'motor'], ['sing', 'sing'],
  ['conflated', 'conflat'], ['troubled', 'troubl'], ['sized', 'size'], ['hopping', 'hop'], ['tanned', 'tan'],
  ['falling', 'fall'], ['hissing', 'hiss'], ['fizzed', 'fizz'], ['failing', 'fail'], ['filing', 'file'],
  ['happy', 'happi'], ['sky', 'sky'], ['relational', 'relat'], ['conditional', 'condit'], ['rational', 'ration'],
  ['valenci', 'valenc'], ['digitizer', 'digit'], ['generalizations', 'gener'],
];

describe('tokens', () => {
  describe('wordTokens', () => {
    it('lower-cases words and keeps inner apostrophes, hyphens and periods', () => {
      assert.deepEqual(wordTokens('Don\u2019t re-run the Rate-Limit job on node.js!'), [
        "don't", 're-run', 'the', 'rate-limit', 'job', 'on', 'node.js',
      ]);
    });

    it('keeps numbers, decimals, thousands and versions whole', () => {
      assert.deepEqual(wordTokens('v1.2.3 costs $1,000.50 (3.14%) in 2024.'), ['v1.2.3', 'costs', '1,000.50', '3.14', 'in', '2024']);
    });

    it('drops punctuation and symbols', () => {
      assert.deepEqual(wordTokens('\u2014 -- ... !? \u{1F680} *'), []);
    });

    it('handles letters outside Latin', () => {
      assert.deepEqual(wordTokens('Stra\u00dfe, \u0414\u043e\u043c \u00e9t\u00e9 na\u00efve'), ['stra\u00dfe', '\u0434\u043e\u043c', '\u00e9t\u00e9', 'na\u00efve']);
    });

    it('emits Han, Kana and Hangul characters one by one', () => {
      assert.deepEqual(wordTokens('\u6771\u4eac\u306f\u9ad8\u3044'), ['\u6771', '\u4eac', '\u306f', '\u9ad8', '\u3044']);
      assert.deepEqual(wordTokens('\uc11c\uc6b8'), ['\uc11c', '\uc6b8']);
      assert.deepEqual(wordTokens('AI\u3068ML'), ['ai', '\u3068', 'ml']);
    });

    it('still yields tokens for Thai text', () => {
      const tokens = wordTokens('\u0e20\u0e32\u0e29\u0e32\u0e44\u0e17\u0e22\u0e07\u0e48\u0e32\u0e22');
      // Node and browsers have Intl.Segmenter, which finds the word boundaries Thai leaves unwritten.
      assert.ok(tokens.length > 1, JSON.stringify(tokens));
      assert.equal(tokens.join(''), '\u0e20\u0e32\u0e29\u0e32\u0e44\u0e17\u0e22\u0e07\u0e48\u0e32\u0e22');
    });
  });

  describe('stopWords (from the stopword package)', () => {
    it('holds every word of the package list for the language', () => {
      // Reference library: the `stopword` npm package's own arrays.
      for (const [lang, list] of [['en', eng], ['de', deu], ['fr', fra], ['ru', rus]] as const) {
        const set = stopWords(lang);
        for (const word of list) assert.ok(set.has(word), `${lang}: ${word}`);
      }
    });

    it('knows the obvious function words', () => {
      assert.ok(stopWords('en').has('the'));
      assert.ok(stopWords('de').has('der'));
      assert.ok(stopWords('fr').has('le'));
      assert.ok(stopWords('en-GB').has('and'), 'region suffix ignored');
      assert.ok(!stopWords('en').has('pump'));
    });

    it('is empty for an unknown language', () => {
      assert.equal(stopWords('xx').size, 0);
    });

    it('has a list for every supported language', () => {
      for (const lang of SUPPORTED_LANGUAGES) assert.ok(stopWords(lang).size > 20, lang);
    });
  });

  describe('Porter stemmer (English)', () => {
    for (const [step, examples] of Object.entries(PAPER_STEP_EXAMPLES) as [keyof PorterSteps, readonly (readonly [string, string])[]][]) {
      it(`${step} gives the results printed in Porter (1980)`, () => {
        for (const [input, output] of examples) assert.equal(porterSteps[step](input), output, `${step}(${input})`);
      });
    }

    it('stem() runs all steps in order, as the paper composes them', () => {
      const compose = (word: string): string =>
        porterSteps.step5b(porterSteps.step5a(porterSteps.step4(porterSteps.step3(porterSteps.step2(
          porterSteps.step1c(porterSteps.step1b(porterSteps.step1a(word))))))));
      for (const examples of Object.values(PAPER_STEP_EXAMPLES)) {
        for (const [input] of examples) assert.equal(stem(input, 'en'), compose(input), input);
      }
    });

    it('gives the whole-word stems derived from the paper', () => {
      for (const [input, output] of FULL_ALGORITHM) assert.equal(stem(input, 'en'), output, input);
    });

    it('documents where natural departs from the 1980 paper', () => {
      // Known divergence: natural's step 2 also has -bli -> -ble and -logi -> -log, which Porter
      // added to the algorithm after the paper (the paper has only -abli -> -able). Under the
      // paper's rules both words below would leave step 2 unchanged.
      assert.equal(porterSteps.step2('possibli'), 'possible');
      assert.equal(porterSteps.step2('analogi'), 'analog');
    });

    it('returns the same stem from the cache', () => {
      assert.equal(stem('relational', 'en'), stem('relational', 'en'));
      assert.equal(stem('motoring', 'en'), 'motor');
    });
  });

  describe('stem (other languages)', () => {
    it('conflates inflected forms (common practice, no source)', () => {
      const pairs: [string, string, string][] = [
        ['de', 'katzen', 'katze'],
        ['fr', 'chanteuses', 'chanteuse'],
        ['es', 'perros', 'perro'],
        ['it', 'gatti', 'gatto'],
        ['pt', 'casas', 'casa'],
        ['nl', 'fietsen', 'fiets'],
        ['sv', 'bilarna', 'bilar'],
        ['no', 'bilene', 'bilen'],
        ['ru', '\u043a\u043d\u0438\u0433\u0438', '\u043a\u043d\u0438\u0433\u0430'],
      ];
      for (const [lang, a, b] of pairs) assert.equal(stem(a, lang), stem(b, lang), `${lang}: ${a} / ${b}`);
    });

    it('leaves words alone for a language without a stemmer', () => {
      assert.equal(stem('samochody', 'pl'), 'samochody');
      assert.equal(stem('running', 'xx'), 'running');
    });
  });

  describe('contentTerms', () => {
    it('drops stop words and short tokens, splits hyphens, strips possessives, stems the rest', () => {
      const words = wordTokens("The operator's rate-limit was relaxed for 3 connected clients in v1.2, e.g. re-runs.");
      assert.deepEqual(contentTerms(words, 'en'), ['oper', 'rate', 'limit', 'relax', 'connect', 'client', 'v1.2', 'run']);
    });

    it('keeps ideographs although they are one character long', () => {
      assert.deepEqual(contentTerms(wordTokens('\u6771\u4eac\u7684\u5929\u6c14'), 'zh'), ['\u6771', '\u4eac', '\u5929', '\u6c14']);
    });
  });

  describe('detectLanguage', () => {
    // Invented sample sentences.
    const samples: [string, string][] = [
      ['en', 'The crew checked the pumps before the night shift, and they found that the valve was loose.'],
      ['de', 'Die Mannschaft hat die Pumpen vor der Nachtschicht gepr\u00fcft, und sie fand, dass das Ventil locker war.'],
      ['fr', "L'\u00e9quipe a v\u00e9rifi\u00e9 les pompes avant le quart de nuit et elle a trouv\u00e9 que la vanne \u00e9tait desserr\u00e9e."],
      ['es', 'El equipo revis\u00f3 las bombas antes del turno de noche y encontr\u00f3 que la v\u00e1lvula estaba suelta.'],
      ['it', 'La squadra ha controllato le pompe prima del turno di notte e ha trovato che la valvola era allentata.'],
      ['pt', 'A equipe verificou as bombas antes do turno da noite e descobriu que a v\u00e1lvula estava solta.'],
      ['nl', 'De ploeg controleerde de pompen voor de nachtdienst en vond dat de klep los zat.'],
      ['sv', 'Laget kontrollerade pumparna f\u00f6re nattskiftet och fann att ventilen var l\u00f6s.'],
      ['ru', '\u041a\u043e\u043c\u0430\u043d\u0434\u0430 \u043f\u0440\u043e\u0432\u0435\u0440\u0438\u043b\u0430 \u043d\u0430\u0441\u043e\u0441\u044b \u043f\u0435\u0440\u0435\u0434 \u043d\u043e\u0447\u043d\u043e\u0439 \u0441\u043c\u0435\u043d\u043e\u0439, \u0438 \u043e\u043d\u0430 \u043d\u0430\u0448\u043b\u0430, \u0447\u0442\u043e \u043a\u043b\u0430\u043f\u0430\u043d \u0431\u044b\u043b \u043d\u0435 \u0437\u0430\u043a\u0440\u0435\u043f\u043b\u0451\u043d.'],
      ['ja', '\u4e57\u54e1\u306f\u591c\u52e4\u306e\u524d\u306b\u30dd\u30f3\u30d7\u3092\u70b9\u691c\u3057\u3001\u30d0\u30eb\u30d6\u304c\u7de9\u3093\u3067\u3044\u308b\u3053\u3068\u3092\u898b\u3064\u3051\u307e\u3057\u305f\u3002'],
      ['zh', '\u73ed\u7ec4\u5728\u591c\u73ed\u4e4b\u524d\u68c0\u67e5\u4e86\u6cf5\uff0c\u53d1\u73b0\u9600\u95e8\u677e\u4e86\u3002'],
      ['ko', '\uc791\uc5c5\uc790\ub4e4\uc740 \uc57c\uac04 \uadfc\ubb34 \uc804\uc5d0 \ud38c\ud504\ub97c \uc810\uac80\ud588\uace0 \ubc38\ube0c\uac00 \ud5d0\uac81\ub2e4\ub294 \uac83\uc744 \ubc1c\uacac\ud588\ub2e4.'],
    ];
    for (const [lang, text] of samples) {
      it(`recognizes ${lang}`, () => assert.equal(detectLanguage(text), lang));
    }

    it('defaults to English when there is nothing to go on', () => {
      assert.equal(detectLanguage(''), 'en');
      assert.equal(detectLanguage('1234 5678 !!!'), 'en');
    });

    it('counts a script in characters: accented and astral Latin letters count once each', () => {
      // Five Cyrillic letters against Latin ones; 'é' and U+1DF00 (Latin Extended-G) are Latin, digits and marks are not.
      const cyrillic = 'жжжжж';
      assert.equal(languageFor(detectLanguage(`${cyrillic} ab12`))?.script, 'cyrillic');
      assert.equal(languageFor(detectLanguage(`${cyrillic} ab\u{1DF00}\u{1DF00}`))?.script, 'cyrillic'); // 4 Latin
      assert.equal(languageFor(detectLanguage(`${cyrillic} abé\u{1DF00}\u{1DF00}x`))?.script, 'latin'); // 6 Latin
      assert.equal(languageFor(detectLanguage(`${cyrillic} abcd!?`))?.script, 'cyrillic');
      assert.equal(languageFor(detectLanguage(`${cyrillic} ABCDéF`))?.script, 'latin');
    });

    it('only returns supported languages', () => {
      for (const [, text] of samples) assert.ok(SUPPORTED_LANGUAGES.includes(detectLanguage(text)));
    });
  });
});
