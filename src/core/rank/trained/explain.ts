/**
 * What a trained model's numbers say about one sentence. Both trained models score a sentence by a
 * sum of per-feature log-odds, so a feature's weight for the sentence's value is its share of the
 * score; but a value nearly every sentence has ("not a placeholder answer") adds the same to all of
 * them and explains nothing about why this one was picked. Each share is therefore given relative
 * to the document's average sentence: w(x_i) − mean_j w(x_j). For a model that adds up its
 * features this is each feature's Shapley value with the document as background (Lundberg & Lee
 * 2017, "A unified approach to interpreting model predictions", linear models; from memory), and
 * the shares of a sentence add up to its score minus the document's mean score.
 */

/** Each feature's contributions, centred on their mean over the document's sentences (in place). */
export function relativeToAverage(contributions: Record<string, Float64Array>): Record<string, Float64Array> {
  for (const values of Object.values(contributions)) {
    if (values.length === 0) continue;
    let sum = 0;
    for (let i = 0; i < values.length; i++) sum += values[i]!;
    const mean = sum / values.length;
    for (let i = 0; i < values.length; i++) values[i]! -= mean;
  }
  return contributions;
}
