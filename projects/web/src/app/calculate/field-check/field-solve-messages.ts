import type { CrossSectionOptions, FieldLineResult, LineSpec } from '@linewright/lines';

/** What the page asks the field-solver worker to do. */
export interface FieldSolveRequest {
  id: number;
  spec: LineSpec;
  section: CrossSectionOptions;
  tolerance: number;
  maxMillis: number;
}

/** What the worker answers: progress while refining, then one result or one error. */
export type FieldSolveMessage =
  | { id: number; type: 'progress'; fraction: number; cells: number }
  | { id: number; type: 'result'; result: FieldLineResult; millis: number }
  | { id: number; type: 'error'; message: string };
