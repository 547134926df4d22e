/**
 * The controlled-impedance table a fabrication drawing carries: one row per
 * line placed on the stack, with its target, its geometry, what the formulas
 * give for it and how far the fabricator's tolerances can move it.
 */
import { calculate } from '../calculate';
import { ESTIMATE_NOTE } from '../estimate-note';
import { LineInputError } from '../errors';
import type { LineSpec } from '../types';
import { tolerance, type Spreads } from '../tolerance/tolerance';
import { requireFinite, requirePositive } from '../validation';
import { lineGeometryFor, type LineStructure, type LineUse } from './line-geometry-for';
import type { Stackup } from './stackup';

/** A line placed on a layer of the stack, with its impedance target. */
export interface LinePlacement {
  /** e.g. 'USB 90 Ω pair'. */
  label: string;
  layerIndex: number;
  structure: LineStructure;
  /** z0 for a single line, zDiff for a pair [Ω]. */
  targetImpedance: number;
  /** ± fraction of the target, e.g. 0.1. */
  tolerance: number;
  /** [m] */
  width: number;
  /** Edge-to-edge gap of a pair [m]. */
  gap?: number;
}

/** ± fractions the fabricator's process moves the inputs by. */
export interface FabricationSpreads {
  width: number;
  dielectricThickness: number;
  relativePermittivity: number;
}

/** Fabricators commonly hold controlled impedance to ±10 % (common practice, no source). */
export const COMMON_IMPEDANCE_TOLERANCE = 0.1;

/** Etched width ±10 %, pressed dielectric thickness ±10 %, Dk ±5 % (common practice, no source). */
export const COMMON_FABRICATION_SPREADS: Readonly<FabricationSpreads> = { width: 0.1, dielectricThickness: 0.1, relativePermittivity: 0.05 };

export interface ImpedanceSensitivity {
  /** The spec input: 'w', 'h', 'h1', 'h2', 'b', 'cover', 'er'. */
  field: string;
  /** Impedance change with that input at its + spread, to first order [Ω]. */
  impedanceSwing: number;
}

export interface ImpedanceTableRow {
  label: string;
  layerIndex: number;
  layerName: string;
  structure: LineStructure;
  kind: LineSpec['kind'];
  targetImpedance: number;
  tolerance: number;
  width: number;
  gap: number | null;
  referenceLayers: string[];
  /** Dielectric height from the strip to the reference above / below, or to the surface where there is none [m]. */
  heightAbove: number;
  heightBelow: number;
  /** z0, or zDiff for a pair [Ω]. */
  impedance: number;
  /** (impedance − target)/target. */
  deviation: number;
  isWithinTolerance: boolean;
  /** [s/m] */
  delayPerMeter: number;
  erEff: number;
  /** Worst-case impedance with every input at an end of its spread [Ω]. */
  spreadLow: number;
  spreadHigh: number;
  isSpreadWithinTolerance: boolean;
  sensitivities: ImpedanceSensitivity[];
  spec: LineSpec;
  warnings: string[];
}

export interface ImpedanceTable {
  rows: ImpedanceTableRow[];
  spreads: FabricationSpreads;
  note: string;
}

export interface ImpedanceTableOptions {
  spreads?: FabricationSpreads;
  use?: LineUse;
}

const THICKNESS_FIELDS = ['h', 'h1', 'h2', 'b', 'cover'];
/** The corners and sensitivities are exact evaluations; the samples only feed statistics the table does not show. */
const SPREAD_SAMPLES = 64;

/** One row per placement; each row's impedance and delay are calculate() of its spec. */
export function impedanceTable(stackup: Stackup, placements: readonly LinePlacement[], options: ImpedanceTableOptions = {}): ImpedanceTable {
  const spreads = options.spreads ?? COMMON_FABRICATION_SPREADS;
  for (const [name, value] of Object.entries(spreads)) {
    requireFinite(`spreads.${name}`, value);
    if (value < 0 || value >= 1) throw new LineInputError(`spreads.${name}`, 'must be a fraction from 0 to below 1');
  }
  const rows = placements.map((placement, index) => tableRow(stackup, placement, spreads, options.use ?? {}, index));
  return { rows, spreads: { ...spreads }, note: ESTIMATE_NOTE };
}

function tableRow(stackup: Stackup, placement: LinePlacement, spreads: FabricationSpreads, use: LineUse, index: number): ImpedanceTableRow {
  const prefix = `placements[${index}]`;
  requirePositive(`${prefix}.targetImpedance`, placement.targetImpedance);
  requireFinite(`${prefix}.tolerance`, placement.tolerance);
  if (placement.tolerance <= 0 || placement.tolerance >= 1) throw new LineInputError(`${prefix}.tolerance`, 'must be a fraction between 0 and 1');
  const geometry = lineGeometryFor(stackup, placement.layerIndex, placement.structure, placement, use);
  const result = calculate(geometry.spec);
  const isPair = placement.structure === 'pair';
  const impedance = isPair ? result.zDiff! : result.z0;
  const deviation = (impedance - placement.targetImpedance) / placement.targetImpedance;
  const spread = tolerance(geometry.spec, specSpreads(geometry.spec, spreads), SPREAD_SAMPLES);
  const [low, high] = [spread.corners.impedanceLow.value, spread.corners.impedanceHigh.value];
  const band = placement.targetImpedance * placement.tolerance;
  return {
    label: placement.label,
    layerIndex: placement.layerIndex,
    layerName: stackup.layers[placement.layerIndex].name,
    structure: placement.structure,
    kind: geometry.spec.kind,
    targetImpedance: placement.targetImpedance,
    tolerance: placement.tolerance,
    width: placement.width,
    gap: isPair ? placement.gap! : null,
    referenceLayers: geometry.referenceIndices.map((reference) => stackup.layers[reference].name),
    heightAbove: geometry.heightAbove,
    heightBelow: geometry.heightBelow,
    impedance,
    deviation,
    isWithinTolerance: Math.abs(deviation) <= placement.tolerance,
    delayPerMeter: result.delayPerMeter,
    erEff: result.erEff,
    spreadLow: low,
    spreadHigh: high,
    isSpreadWithinTolerance: low >= placement.targetImpedance - band && high <= placement.targetImpedance + band,
    sensitivities: spread.sensitivities.map((entry) => ({ field: entry.field, impedanceSwing: entry.impedanceSwing })),
    spec: geometry.spec,
    warnings: [...geometry.warnings, ...result.warnings],
  };
}

/** The fabrication spreads as tolerance() limits on the spec's own inputs. */
function specSpreads(spec: LineSpec, spreads: FabricationSpreads): Spreads {
  const fields = Object.keys(spec);
  const limits: Spreads = { w: { plusMinusRelative: spreads.width }, er: { plusMinusRelative: spreads.relativePermittivity } };
  for (const field of THICKNESS_FIELDS) if (fields.includes(field)) limits[field] = { plusMinusRelative: spreads.dielectricThickness };
  return limits;
}
