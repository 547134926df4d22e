/** Stackups: the layer model, templates, line geometry from the stack, width solving and the impedance table. */
export { type CopperLayer, type CopperRole, type DielectricKind, type DielectricLayer, type Stackup, type StackupLayer, copperIndices, isReference, stackupThickness, validateStackup } from './stackup';
export { STACKUP_TEMPLATE_LAYER_COUNTS, type StackupTemplateLayerCount, stackupTemplate } from './stackup-templates';
export { type LineDimensions, type LineStructure, type LineUse, type StackupLineGeometry, lineGeometryFor } from './line-geometry-for';
export { type SolvedLineDimension, solveLineDimension } from './solve-line-dimension';
export {
  COMMON_FABRICATION_SPREADS,
  COMMON_IMPEDANCE_TOLERANCE,
  type FabricationSpreads,
  type ImpedanceSensitivity,
  type ImpedanceTable,
  type ImpedanceTableOptions,
  type ImpedanceTableRow,
  type LinePlacement,
  impedanceTable,
} from './impedance-table';
export { fieldSolveStackupLine, stackupCrossSection } from './stackup-cross-section';
