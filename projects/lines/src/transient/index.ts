export type * from './circuit';
export { stepResponse } from './step-response';
export { thresholdCrossing, type ThresholdQuestion } from './threshold';
export type { ThresholdCrossing } from './settle';
export { reflectionCoefficient } from './lattice';
export { DEFAULT_BAND, DEFAULT_POINTS, MAX_POINTS, MIN_POINTS } from './validate-circuit';
export { ladderError, ladderStepResponse, MAX_LADDER_SECTIONS, type LadderError } from './ladder';
export {
  adviseTermination,
  RC_ROUND_TRIPS,
  type TerminationAdvice,
  type TerminationOptions,
  type TerminationScheme,
} from './termination';
