/**
 * The consistency detectors, run in one place for each claim against its support. Each is precise
 * by design (see detector.ts): it reports only conflicting evidence that nothing close agrees with.
 */
import { checkComparatives } from './comparatives';
import type { Detector, DetectorInput, RawFinding } from './detector';
import { checkIdentifiers } from './identifiers';
import { checkModality } from './modality';
import { checkNegation } from './negation';
import { checkNumbers } from './numbers';

export const DETECTORS: readonly Detector[] = [checkNumbers, checkNegation, checkModality, checkComparatives, checkIdentifiers];

export function runDetectors(input: DetectorInput): RawFinding[] {
  return DETECTORS.flatMap((detect) => detect(input));
}

export type { DetectorInput, RawFinding } from './detector';
