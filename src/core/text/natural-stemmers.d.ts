/**
 * Typings for the single stemmer modules of `natural` that the engine imports one by one
 * (the package's own typings only describe its heavy index module).
 */
declare module 'natural/lib/natural/stemmers/*' {
  const stemmer: { stem(token: string): string };
  export default stemmer;
}
