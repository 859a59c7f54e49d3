/**
 * Closed word classes of English that the stand-alone checks lean on. These are small, closed
 * lists (common practice, no source); open classes (nouns, verbs) are never listed, only guessed
 * from their neighbours.
 */

const set = (words: string): ReadonlySet<string> => new Set(words.split(/\s+/).filter(Boolean));

/** Words that open a noun phrase. */
export const DETERMINERS = set(`
  the a an each every this that these those its their our your my his her no any some all both
  either neither another other such many several few most much one two three four five`);

export const PREPOSITIONS = set(`
  about above across after against along amid among around at before behind below beneath beside
  besides between beyond by despite during except for from in inside into like near of off on onto
  out outside over past per since through throughout to toward towards under underneath until unlike
  up upon via with within without`);

/** Subordinating conjunctions: a clause they open is part of the same sentence. */
export const SUBORDINATORS = set(`
  because although though if when whenever while whilst once unless until till since as whereas
  wherever where after before lest`);

export const MODALS_AND_AUXILIARIES = set(`
  is are was were be been being am has have had do does did can could will would shall should may
  might must also still only often usually always never rarely sometimes`);

/** Personal and possessive pronouns that need an antecedent (third person only). */
export const THIRD_PERSON = set('it its they them their theirs he him his she her hers');

/** First and second person pronouns: they point at the writer or the reader, not at earlier text. */
export const SPEAKER_PRONOUNS = set('i me my we us our you your');

/** Words that are never a noun phrase's head, so never an antecedent. */
export const FUNCTION_WORDS = new Set<string>([
  ...DETERMINERS,
  ...PREPOSITIONS,
  ...SUBORDINATORS,
  ...MODALS_AND_AUXILIARIES,
  ...THIRD_PERSON,
  ...SPEAKER_PRONOUNS,
  ...set(`and or but nor so yet then than not there here what which who whom whose how why just
    very quite rather too more less least same own`),
]);

/** A rough plural test for an open-class word ("readings", "ferries" yes; "glass", "status" no). */
export function looksPlural(word: string): boolean {
  return /[^su]s$/.test(word) && !/(ss|us|is|ous)$/.test(word) && word.length > 3;
}
