/**
 * The languages the engine reads (ISO 639-1), as data only: option checks and the settings manifest
 * need the codes without loading any stop-word list. languages.ts holds one entry per code, in this
 * order (a unit test keeps them equal).
 */
export const LANGUAGE_CODES = ['en', 'de', 'fr', 'es', 'it', 'pt', 'nl', 'sv', 'no', 'da', 'fi', 'pl', 'id', 'ru', 'uk', 'fa', 'ar', 'ja', 'zh', 'ko'] as const;

export type LanguageCode = (typeof LANGUAGE_CODES)[number];
