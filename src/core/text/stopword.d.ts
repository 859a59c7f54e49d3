/**
 * Typings for the per-language files of the `stopword` package (each exports one array of stop
 * words named by its ISO 639-3 code). The engine imports these files one by one so that every
 * bundle, whatever its platform settings, carries only the lists it uses.
 */
declare module 'stopword/src/stopwords_ara.js' {
  export const ara: readonly string[];
}
declare module 'stopword/src/stopwords_dan.js' {
  export const dan: readonly string[];
}
declare module 'stopword/src/stopwords_deu.js' {
  export const deu: readonly string[];
}
declare module 'stopword/src/stopwords_eng.js' {
  export const eng: readonly string[];
}
declare module 'stopword/src/stopwords_fas.js' {
  export const fas: readonly string[];
}
declare module 'stopword/src/stopwords_fin.js' {
  export const fin: readonly string[];
}
declare module 'stopword/src/stopwords_fra.js' {
  export const fra: readonly string[];
}
declare module 'stopword/src/stopwords_ind.js' {
  export const ind: readonly string[];
}
declare module 'stopword/src/stopwords_ita.js' {
  export const ita: readonly string[];
}
declare module 'stopword/src/stopwords_jpn.js' {
  export const jpn: readonly string[];
}
declare module 'stopword/src/stopwords_kor.js' {
  export const kor: readonly string[];
}
declare module 'stopword/src/stopwords_nld.js' {
  export const nld: readonly string[];
}
declare module 'stopword/src/stopwords_nob.js' {
  export const nob: readonly string[];
}
declare module 'stopword/src/stopwords_pol.js' {
  export const pol: readonly string[];
}
declare module 'stopword/src/stopwords_por.js' {
  export const por: readonly string[];
}
declare module 'stopword/src/stopwords_rus.js' {
  export const rus: readonly string[];
}
declare module 'stopword/src/stopwords_spa.js' {
  export const spa: readonly string[];
}
declare module 'stopword/src/stopwords_swe.js' {
  export const swe: readonly string[];
}
declare module 'stopword/src/stopwords_ukr.js' {
  export const ukr: readonly string[];
}
declare module 'stopword/src/stopwords_zho.js' {
  export const zho: readonly string[];
}

/** The package index (tests compare against it; the engine never imports it). Lists used here only. */
declare module 'stopword' {
  export const ara: readonly string[];
  export const dan: readonly string[];
  export const deu: readonly string[];
  export const eng: readonly string[];
  export const fas: readonly string[];
  export const fin: readonly string[];
  export const fra: readonly string[];
  export const ind: readonly string[];
  export const ita: readonly string[];
  export const jpn: readonly string[];
  export const kor: readonly string[];
  export const nld: readonly string[];
  export const nob: readonly string[];
  export const pol: readonly string[];
  export const por: readonly string[];
  export const rus: readonly string[];
  export const spa: readonly string[];
  export const swe: readonly string[];
  export const ukr: readonly string[];
  export const zho: readonly string[];
}
