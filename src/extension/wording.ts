/**
 * How the extension words things for people: a message with `{0}`-style placeholders goes through
 * `t` (the editor's localization API in the extension, plain substitution in tests), and numbers
 * are formatted for the display language. Pure, so the wording is tested under Node.
 */
export interface Wording {
  /** The display language (BCP 47). */
  readonly language: string;
  t(message: string, ...args: (string | number)[]): string;
  /** A whole number in the display language ("2,444", "2.444"). */
  count(value: number): string;
  /** A share 0-1 as a percentage ("6%"). */
  percent(share: number): string;
}

export function substitute(message: string, args: readonly (string | number)[]): string {
  return message.replace(/\{(\d+)\}/g, (whole, index: string) => {
    const value = args[Number(index)];
    return value === undefined ? whole : String(value);
  });
}

export function wordingFor(language: string, t: (message: string, args: (string | number)[]) => string = substitute): Wording {
  let counts: Intl.NumberFormat;
  let percents: Intl.NumberFormat;
  try {
    counts = new Intl.NumberFormat(language, { maximumFractionDigits: 0 });
    percents = new Intl.NumberFormat(language, { style: 'percent', maximumFractionDigits: 0 });
  } catch {
    counts = new Intl.NumberFormat('en', { maximumFractionDigits: 0 });
    percents = new Intl.NumberFormat('en', { style: 'percent', maximumFractionDigits: 0 });
  }
  return {
    language,
    t: (message, ...args) => t(message, args),
    count: (value) => counts.format(value),
    percent: (share) => percents.format(share),
  };
}

/** English wording (tests, and the CLI-free paths that have no editor). */
export const ENGLISH: Wording = wordingFor('en');

/** "1st", "2nd", "3rd", "11th" in English; other languages get the translated "no. {0}". */
export function ordinal(wording: Wording, n: number): string {
  if (!wording.language.toLowerCase().startsWith('en')) return wording.t('no. {0}', wording.count(n));
  const tens = n % 100;
  const suffix = tens >= 11 && tens <= 13 ? 'th' : n % 10 === 1 ? 'st' : n % 10 === 2 ? 'nd' : n % 10 === 3 ? 'rd' : 'th';
  return `${wording.count(n)}${suffix}`;
}
