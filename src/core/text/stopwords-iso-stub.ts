/**
 * Stand-in for the `stopwords-iso` package in bundles (build alias `stopwords-iso` → this file).
 *
 * natural's German stemmer module loads that 300 KB table of every language's stop words at start
 * but only reads it in `tokenizeAndStem`, which the engine never calls (it has its own stop words).
 */
export default {};
