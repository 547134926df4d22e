/** The messages between the field-solve service and its worker thread. */
import type { CrossSectionOptions, FieldLineResult, FieldSolveLevel, LineSpec } from '@linewright/lines';

export interface FieldSolveJob {
  spec: LineSpec;
  section?: CrossSectionOptions;
  tolerance?: number;
  maxMillis: number;
  maxCells?: number;
}

export type FieldSolveAnswer = Omit<FieldLineResult, 'solution'> & { levels: FieldSolveLevel[]; symmetry: unknown };

export type FieldSolveMessage = { result: FieldSolveAnswer } | { inputError: { field: string; rule: string } } | { failure: string };
