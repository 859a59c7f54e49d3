/**
 * Development tool: tries blend weights and selection settings on the TRAIN half only and prints
 * ROUGE for each, so the defaults are chosen without looking at the test half.
 *
 *   node dist/bench.cjs tune [--corpus PATH] [--limit N] [--search]
 *
 * The trained-model component is cross-fitted: documents whose RFC number is 0 mod 4 are scored
 * by a model trained on those that are 2 mod 4 and the other way round, so it is not judged on the
 * documents it learned from. Every configuration is scored through the engine's own selection stage
 * (`finishSummary`: fitness, balance, MMR and the stand-alone check), so it tunes what ships.
 */
import {
  BLEND_WEIGHTS,
  candidateSentences,
  finishSummary,
  greedyOracle,
  prepareDocument,
  resolveOptions,
  rougeNTokens,
  tokenizeText,
  tuning,
  type AnalyzedDocument,
  type PreparedDocument,
  type SummaryOptions,
} from '../src/core/index';
import { corpusDirectory, loadCorpus, type CorpusDocument } from './corpus';

const { RANKERS, headingPriorScores, labelSentences, modelFromLabelled, normalize, rankBayes, sentenceFeatures, titleComponent } = tuning;

const COMPONENTS = ['centroid', 'lexrank', 'textrank', 'position', 'luhn', 'edmundson', 'title', 'bayes'] as const;
type Component = (typeof COMPONENTS)[number];

interface Prepared {
  readonly doc: CorpusDocument;
  readonly prepared: PreparedDocument;
  readonly analyzed: AnalyzedDocument;
  readonly wordCounts: number[];
  readonly sentenceTokens: (readonly string[])[];
  readonly referenceTokens: readonly (readonly string[])[];
  readonly components: Record<Component, Float64Array>;
  readonly prior: Float64Array;
  leadR1: number;
  oracleR1: number;
}

export interface Config {
  readonly label: string;
  readonly weights: Partial<Record<Component, number>>;
  /** Scores are multiplied by prior^priorPower (0 = heading prior off). */
  readonly priorPower?: number;
  /** Weight of the heading prior as an additive, min-max scaled component. */
  readonly priorWeight?: number;
  readonly balance?: boolean;
  readonly mmrLambda?: number;
  readonly minPerSection?: number;
}

function rouge12(picked: readonly number[], p: Prepared): { r1: number; r2: number } {
  const candidate = picked.map((i) => p.sentenceTokens[i]!);
  return { r1: rougeNTokens(candidate, p.referenceTokens, 1).f1, r2: rougeNTokens(candidate, p.referenceTokens, 2).f1 };
}

function select(p: Prepared, scores: Float64Array, options: SummaryOptions): number[] {
  return finishSummary(p.prepared, { scores }, options).sentences.map((s) => s.sentence);
}

export function evaluate(prepared: readonly Prepared[], config: Config): { r1: number; r2: number; beats: number; gap: number } {
  let r1 = 0;
  let r2 = 0;
  let beats = 0;
  let lead = 0;
  let oracle = 0;
  for (const p of prepared) {
    const n = p.analyzed.doc.sentences.length;
    const scores = new Float64Array(n);
    for (const [component, weight] of Object.entries(config.weights) as [Component, number][]) {
      if (!weight) continue;
      const values = p.components[component];
      for (let i = 0; i < n; i++) scores[i]! += weight * values[i]!;
    }
    if (config.priorWeight) {
      const scaled = normalize(p.prior, 'minmax');
      for (let i = 0; i < n; i++) scores[i]! += config.priorWeight * scaled[i]!;
    }
    if (config.priorPower) for (let i = 0; i < n; i++) scores[i] = scores[i]! * Math.pow(p.prior[i]!, config.priorPower);
    const options = resolveOptions({
      budget: { unit: 'words', value: p.doc.referenceWords },
      balance: config.balance ?? true,
      mmrLambda: config.mmrLambda ?? 0.7,
      minPerSection: config.minPerSection ?? 1,
    });
    const scored = rouge12(select(p, scores, options), p);
    r1 += scored.r1;
    r2 += scored.r2;
    if (scored.r1 > p.leadR1) beats++;
    lead += p.leadR1;
    oracle += p.oracleR1;
  }
  const count = prepared.length;
  return { r1: r1 / count, r2: r2 / count, beats: beats / count, gap: (r1 - lead) / (oracle - lead) };
}

function prepare(doc: CorpusDocument): Prepared {
  const preparation = prepareDocument(doc.bodyText, { format: 'markdown' });
  if (!preparation.ok) throw new Error(`${doc.file}: ${preparation.refused.refused}`);
  const { prepared: engineDocument } = preparation;
  const { analyzed } = engineDocument;
  const wordCounts = analyzed.words.map((w) => w.length);
  const rougeOptions = { stem: true };
  const sentenceTokens = analyzed.doc.sentences.map((s) => tokenizeText([s.text], rougeOptions).flat());
  const referenceTokens = tokenizeText(doc.referenceSentences, rougeOptions);
  const scaled = (scores: Float64Array) => normalize(scores, 'minmax');
  const components = {
    centroid: scaled(RANKERS.centroid(analyzed).scores),
    lexrank: scaled(RANKERS.lexrank(analyzed).scores),
    textrank: scaled(RANKERS.textrank(analyzed).scores),
    position: scaled(RANKERS.position(analyzed).scores),
    luhn: scaled(RANKERS.luhn(analyzed).scores),
    edmundson: scaled(RANKERS.edmundson(analyzed).scores),
    title: scaled(titleComponent(analyzed)),
    bayes: new Float64Array(analyzed.doc.sentences.length),
  };
  const candidates = candidateSentences(engineDocument);
  const prepared: Prepared = {
    doc, prepared: engineDocument, analyzed, wordCounts, sentenceTokens, referenceTokens, components,
    prior: headingPriorScores(analyzed.doc), leadR1: 0, oracleR1: 0,
  };
  const lead: number[] = [];
  let words = 0;
  for (const i of candidates) {
    if (words + wordCounts[i]! > doc.referenceWords) continue;
    lead.push(i);
    words += wordCounts[i]!;
  }
  prepared.leadR1 = rouge12(lead, prepared).r1;
  const oracle = greedyOracle({ sentences: sentenceTokens, wordCounts, candidates, reference: referenceTokens.flat(), wordLimit: doc.referenceWords });
  prepared.oracleR1 = rouge12(oracle, prepared).r1;
  return prepared;
}

/** Cross-fitted Bayes scores (see the file header). */
function addBayes(prepared: readonly Prepared[], oracleLabels: boolean): void {
  const labelled = prepared.map((p) => {
    const features = sentenceFeatures(p.analyzed);
    if (!oracleLabels) return { features, labels: labelSentences(p.analyzed, p.doc.referenceSentences) };
    // Experiment: the greedy oracle's picks as positives instead of Kupiec-style best matches.
    const labels = new Uint8Array(p.analyzed.doc.sentences.length);
    const picked = greedyOracle({ sentences: p.sentenceTokens, wordCounts: p.wordCounts, reference: p.referenceTokens.flat(), wordLimit: p.doc.referenceWords });
    for (const i of picked) labels[i] = 1;
    return { features, labels };
  });
  const fold = (p: Prepared) => (p.doc.number % 4 === 0 ? 0 : 1);
  for (const side of [0, 1]) {
    const model = modelFromLabelled(labelled.filter((_, k) => fold(prepared[k]!) !== side));
    prepared.forEach((p, k) => {
      if (fold(p) === side) p.components.bayes.set(normalize(rankBayes(p.analyzed, model, labelled[k]!.features).scores, 'minmax'));
    });
  }
}

/** The blend as shipped (src/core/rank/blend.ts), the starting point of every search. */
const CURRENT: Partial<Record<Component, number>> = { ...BLEND_WEIGHTS };

const EXPERIMENTS: readonly Config[] = [
  { label: 'current blend', weights: CURRENT },
  { label: 'current blend, no balance', weights: CURRENT, balance: false },
  { label: 'current blend, prior^1', weights: CURRENT, priorPower: 1 },
  { label: 'current blend, prior^2', weights: CURRENT, priorPower: 2 },
  { label: 'current blend, prior^2, no balance', weights: CURRENT, priorPower: 2, balance: false },
  { label: 'current blend + prior 0.3', weights: CURRENT, priorWeight: 0.3 },
  { label: 'bayes alone', weights: { bayes: 1 } },
  { label: 'bayes alone, no balance', weights: { bayes: 1 }, balance: false },
  { label: 'textrank alone', weights: { textrank: 1 } },
  { label: 'textrank, no balance', weights: { textrank: 1 }, balance: false },
  { label: 'current + bayes 0.5', weights: { ...CURRENT, bayes: 0.5 } },
  { label: 'current + bayes 0.5, prior^2', weights: { ...CURRENT, bayes: 0.5 }, priorPower: 2 },
  { label: 'current, mmr 0.9', weights: CURRENT, mmrLambda: 0.9 },
  { label: 'bayes + lexrank 0.3 + centroid 0.1, no balance', weights: { bayes: 1, lexrank: 0.3, centroid: 0.1 }, balance: false },
  { label: 'current, minPerSection 0', weights: CURRENT, minPerSection: 0 },
];

function format(config: Config, result: ReturnType<typeof evaluate>): string {
  return `${result.r1.toFixed(4)}  ${result.r2.toFixed(4)}  ${(100 * result.beats).toFixed(1).padStart(5)}%  ${(100 * result.gap).toFixed(1).padStart(5)}%  ${config.label}`;
}

/** Coordinate search over the blend weights, starting from the best experiment. */
type Dimension = Component | 'priorPower' | 'priorWeight' | 'mmrLambda';

function search(prepared: readonly Prepared[], start: Config, dimensions: readonly Dimension[]): Config {
  let best = start;
  let bestValue = evaluate(prepared, best);
  const objective = (r: ReturnType<typeof evaluate>) => r.r1 + r.r2;
  for (let round = 0; round < 3; round++) {
    let improved = false;
    for (const component of dimensions) {
      for (const step of [-0.2, -0.1, 0.1, 0.2]) {
        let candidate: Config;
        if (component === 'priorPower' || component === 'priorWeight') {
          const value = Math.max(0, (best[component] ?? 0) + step * 2.5);
          candidate = { ...best, [component]: value };
        } else if (component === 'mmrLambda') {
          const value = Math.min(1, Math.max(0, (best.mmrLambda ?? 0.7) + step / 2));
          candidate = { ...best, mmrLambda: value };
        } else {
          const value = Math.max(0, (best.weights[component] ?? 0) + step);
          candidate = { ...best, weights: { ...best.weights, [component]: Number(value.toFixed(2)) } };
        }
        const result = evaluate(prepared, candidate);
        if (objective(result) > objective(bestValue) + 1e-4) {
          best = { ...candidate, label: `search: ${JSON.stringify({ ...candidate, label: undefined })}` };
          bestValue = result;
          improved = true;
          console.log(format(best, result));
        }
      }
    }
    if (!improved) break;
  }
  return best;
}

export async function run(argv: readonly string[] = process.argv.slice(3)): Promise<number> {
  const limitAt = argv.indexOf('--limit');
  const limit = limitAt >= 0 ? Number(argv[limitAt + 1]) : Infinity;
  const corpus = await loadCorpus(corpusDirectory(argv), 'train');
  const documents = corpus.documents.slice(0, limit);
  const started = performance.now();
  const prepared = documents.map((doc, k) => {
    if ((k + 1) % 25 === 0) process.stderr.write(`\rpreparing ${k + 1}/${documents.length}`);
    return prepare(doc);
  });
  addBayes(prepared, argv.includes('--oracle-labels'));
  process.stderr.write(`\nprepared ${prepared.length} train documents in ${((performance.now() - started) / 1000).toFixed(0)} s\n`);
  const lead = prepared.reduce((s, p) => s + p.leadR1, 0) / prepared.length;
  const oracle = prepared.reduce((s, p) => s + p.oracleR1, 0) / prepared.length;
  console.log(`lead R-1 ${lead.toFixed(4)}, oracle R-1 ${oracle.toFixed(4)}`);
  console.log('R-1 F1  R-2 F1  beats lead  gap  config');
  let best: { config: Config; value: number } | null = null;
  for (const config of EXPERIMENTS) {
    const result = evaluate(prepared, config);
    console.log(format(config, result));
    if (!best || result.r1 + result.r2 > best.value) best = { config, value: result.r1 + result.r2 };
  }
  const plan = argv[argv.indexOf('--search') + 1];
  const single: Dimension[] = ['centroid', 'lexrank', 'textrank', 'position', 'luhn', 'edmundson', 'title'];
  if (argv.includes('--search')) {
    // A: what the blend can do today (its weights only); B: plus the heading prior; C: everything, no balance.
    if (plan === 'A' || plan === undefined) console.log('best A:', JSON.stringify(search(prepared, { label: 'A', weights: CURRENT }, single)));
    if (plan === 'B') console.log('best B:', JSON.stringify(search(prepared, { label: 'B', weights: CURRENT, priorPower: 1 }, [...single, 'priorPower', 'priorWeight', 'mmrLambda'])));
    if (plan === 'C') console.log('best C:', JSON.stringify(search(prepared, { label: 'C', weights: { bayes: 1 }, balance: false }, [...single, 'bayes', 'priorPower', 'priorWeight', 'mmrLambda'])));
  }
  void best;
  return 0;
}
