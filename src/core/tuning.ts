/**
 * What the development tools (bench/tune.ts, bench/tune-repair.ts) need beyond the public
 * pipeline: the components of the blend and of the trained model, and the repair strategy's
 * knobs, so they can try variants. Reached as `tuning` from index.ts; not for the CLI or extension.
 */
export { RANKERS } from './rank/blend';
export { titleComponent } from './rank/edmundson';
export { headingPriorScores } from './rank/heading-prior';
export { sentenceFeatures } from './rank/trained/features';
export { labelSentences } from './rank/trained/labels';
export { modelFromLabelled } from './rank/trained/train-model';
export { rankBayes } from './rank/trained/model';
export { normalize, minMax } from './scale';
export { findStandAloneProblems, repairAutomatically } from './coherence/index';
export { REPAIR_STRATEGY, type RepairStrategy } from './coherence/repair';
export { sentenceFitness, summaryRelevance } from './select/fitness';
export { prepareSelection } from './select/selection-input';
export { selectSentences, type SelectionInput } from './select/select';
