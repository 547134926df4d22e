/** The quasi-static 2D field solver: cross-sections, the solver, and the LineSpec converter. */
export type { CircleShape, CrossSection, DielectricRegion, GroundPlanes, RectangleShape, SectionConductor, Shape, TrapezoidShape } from './cross-section';
export { crossSectionFromSpec, type CrossSectionOptions } from './cross-section-from-spec';
export {
  FIELD_DEFAULT_MAX_CELLS,
  FIELD_DEFAULT_MAX_MILLIS,
  FIELD_DEFAULT_TOLERANCE,
  FieldSolveCancelledError,
  fieldSolve,
  type FieldSolveLevel,
  type FieldSolveOptions,
  type FieldSolveProgress,
  type FieldSolveResult,
} from './field-solve';
export { fieldSolveLine, type FieldLineResult, type FieldSolveLineOptions } from './field-solve-line';
export type { LineParameters } from './line-parameters';
export type { PotentialMap } from './potential-map';
