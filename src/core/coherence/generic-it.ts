/**
 * Non-referential ("pleonastic") "it": "It is important to ...", "It seems that ...",
 * "It turns out ...", "It takes three hours to ...", "It rained". Such an "it" needs no antecedent.
 * The patterns are the textbook extraposition, raising and weather frames (common practice, no
 * source); each is tied to what follows so that "It is used to store ..." or "It is faster than
 * ..." still count as referring back.
 */
import { atSentenceEnd, type Token } from './tokens';

const set = (words: string): ReadonlySet<string> => new Set(words.split(/\s+/).filter(Boolean));

/** Adjectives that take an extraposed clause: "it is ADJ to/that/whether ...". */
const EXTRAPOSING = set(`
  important possible impossible necessary unnecessary essential crucial vital critical clear unclear
  obvious evident apparent true false common uncommon usual unusual normal customary useful helpful
  useless pointless advisable wise unwise reasonable sensible fair unfair tempting natural surprising
  unsurprising interesting striking remarkable notable odd strange worth worthwhile better best
  preferable desirable feasible acceptable sufficient enough good bad fine okay ok time rare
  easy easier easiest hard harder difficult simple simpler safe safer unsafe convenient inconvenient
  tough fun cheap cheaper expensive costly quick quicker faster slow slower impractical practical
  certain doubtful likely unlikely known unknown standard typical complex complicated confusing
  awkward annoying tedious painful straightforward trivial cumbersome challenging nicer nice
  clearer harder cleaner`);

/** Verbs that take an extraposed object: "makes it possible to", "find it useful to". */
const OBJECT_EXTRAPOSING_VERBS = set(`
  make makes made making find finds found finding consider considers considered deem deems deemed
  think thinks thought believe believes keep keeps kept`);

/** Adjectives where "it is ADJ to V" usually means the thing named before is ADJ to V. */
const TOUGH = set('easy easier easiest hard harder difficult simple simpler tough fun cheap cheaper expensive costly quick quicker faster slow slower convenient inconvenient safe safer unsafe');

/** "likely/certain to" raise the subject: "it is likely to fail" still refers back; only "that" is generic. */
const RAISING = set('likely unlikely certain');

/** Passive reporting verbs: "it is said/known/recommended that/to". */
const REPORTING = set(`
  said known believed assumed reported shown argued expected thought estimated recommended advised
  suggested claimed hoped feared understood agreed noted accepted required planned proposed
  recognised recognized`);

const COMPLEMENT = set('to that whether if how what when why where who which for');

/** Words we may skip between "it" and the adjective: be-forms, modals, "not", degree adverbs. */
const FILLER = set(`
  is was be been being are were would will can could may might should must has have had not also
  often usually generally always sometimes still now even very quite rather so too really
  particularly especially equally more most less least much far therefore thus then certainly
  probably perhaps typically clearly hardly rarely never almost nearly already no longer hence
  increasingly sometimes simply just`);

const RAISING_VERBS = set('seems seemed seem appears appeared appear');
const WEATHER = set('rains rained raining snows snowed snowing rain snow drizzled drizzling poured pouring hailed thundered');
const WEATHER_STATES = set('raining snowing windy rainy sunny cloudy foggy dark light cold hot warm chilly freezing humid dry wet');
const NOUN_FRAMES = set('idea practice habit pity shame mistake relief surprise requirement rule convention necessity must matter');

/** Is the "it" at `index` generic? */
export function isGenericIt(tokens: readonly Token[], index: number): boolean {
  const words = followingWords(tokens, index, 10);
  const [w1, w2] = [words[0]?.lower, words[1]?.lower];
  const implied = tokens[index]!.contracted; // "it's" already carries "is"
  if (!w1 && !implied) return false;

  if (w1 && RAISING_VERBS.has(w1)) return !!w2 && /^(that|to|as|like|likely|unlikely|clear|obvious|possible|probable|certain)$/.test(w2);
  if (w1 && /^(turns|turned|turn)$/.test(w1) && w2 === 'out') return true;
  if (w1 && /^(follows|followed|happens|happened|remains|remained|goes|went)$/.test(w1)) {
    return !!w2 && /^(that|to|without)$/.test(w2);
  }
  if (w1 && WEATHER.has(w1)) return true;
  if (w1 && /^(makes|made)$/.test(w1) && w2 === 'sense') return true;
  if (w1 && /^(pays|paid)$/.test(w1) && w2 === 'to') return true;
  if (w1 && /^(takes|took|costs|cost)$/.test(w1)) return takesTime(words, 1);
  // "It ends up being the case that ...", "It is not the case that ..."
  if (words.slice(0, 7).some((w, k) => w.lower === 'case' && words[k - 1]?.lower === 'the' && words[k + 1]?.lower === 'that')) return true;

  // Skip be-forms, modals and adverbs, then look for an extraposing adjective or a reporting verb.
  // After "make/find/consider" the "it" is an object and no be-form comes between.
  let i = 0;
  while (i < words.length && FILLER.has(words[i]!.lower)) i++;
  const afterObjectVerb = OBJECT_EXTRAPOSING_VERBS.has(previousWordOf(tokens, index));
  if (i === 0 && !implied && !afterObjectVerb) return false;
  const head = words[i]?.lower;
  if (!head) return false;
  // "It will likely take some time before ..."
  if (/^(take|takes|took|taken|taking)$/.test(head)) return takesTime(words, i + 1);
  // "It may be that ...", "It could be that ..."
  if (head === 'that' && words.slice(0, i).some((w) => w.lower === 'be')) return true;
  if (WEATHER_STATES.has(head) && (i + 1 >= words.length || atSentenceEnd(tokens, tokenIndex(words[i]!, tokens)))) return true;
  if (head === 'a' || head === 'an' || head === 'no' || head === 'good' || head === 'bad') {
    // "it is a good idea to", "it is no surprise that"
    const frame = words.slice(i + 1, i + 4).findIndex((w) => NOUN_FRAMES.has(w.lower));
    if (frame >= 0) return COMPLEMENT.has(words[i + 2 + frame]?.lower ?? '');
  }
  if (REPORTING.has(head)) return /^(that|to|whether)$/.test(words[i + 1]?.lower ?? '');
  if (!EXTRAPOSING.has(head)) return false;
  // "worth" takes a gerund: "It is worth checking ..."
  if (head === 'worth' || head === 'worthwhile') return true;
  const next = words[i + 1]?.lower ?? '';
  if (!COMPLEMENT.has(next)) return false;
  if (RAISING.has(head)) return next !== 'to';
  if (TOUGH.has(head) && next === 'to') {
    // "It is easy to install." has lost its object: "it" is the thing being installed.
    const rest = words.length - (i + 2);
    return rest > 2;
  }
  return true;
}

function followingWords(tokens: readonly Token[], index: number, count: number): Token[] {
  const out: Token[] = [];
  for (let i = index + 1; i < tokens.length && out.length < count; i++) {
    const token: Token = tokens[i]!;
    if (token.kind === 'punct') {
      if (/[.;:!?]/.test(token.text)) break;
    } else {
      out.push(token);
    }
  }
  return out;
}

/** "takes three hours to/for/before ...": the "it" stands for the time or effort. */
function takesTime(words: readonly Token[], from: number): boolean {
  return words.slice(from, from + 7).some((w) => /^(to|for|before|until)$/.test(w.lower));
}

function previousWordOf(tokens: readonly Token[], index: number): string {
  for (let i = index - 1; i >= 0; i--) if (tokens[i]!.kind !== 'punct') return tokens[i]!.lower;
  return '';
}

function tokenIndex(token: Token, tokens: readonly Token[]): number {
  return tokens.indexOf(token);
}
