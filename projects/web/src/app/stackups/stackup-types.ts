/**
 * Stackups as the API answers them (openapi/openapi.yaml: Stackup,
 * ImpedanceTable, StackupShare, StackupUpload). Every quantity is SI.
 */
import type { ImpedanceTableRow, StackupLayer } from '@linewright/lines';
import type { CatalogEntry } from '../catalog/catalog-types';

export interface StoredCopperLayer {
  type: 'copper';
  name: string;
  thickness: number;
  role: 'signal' | 'plane' | 'mixed';
  conductorId: number | null;
}

export interface StoredDielectricLayer {
  type: 'dielectric';
  name: string;
  thickness: number;
  kind: 'core' | 'prepreg' | 'coating';
  materialId: number | null;
  relativePermittivity: number | null;
  lossTangent: number | null;
}

export type StoredLayer = StoredCopperLayer | StoredDielectricLayer;

export interface Placement {
  id: string;
  label: string;
  lineTypeId: number | null;
  layerIndex: number;
  structure: 'single' | 'pair';
  targetImpedance: number;
  tolerancePercent: number;
  width: number;
  gap: number | null;
}

export interface Stackup extends CatalogEntry {
  description: string | null;
  layers: StoredLayer[];
  placements: Placement[];
  /** Dk and Df resolved from the materials; single-entry answers only (lists leave it out). */
  resolvedLayers?: StackupLayer[];
  ownerId: number | null;
}

export interface StackupInput {
  name: string;
  description?: string | null;
  layers?: StoredLayer[];
  template?: 2 | 4 | 6 | 8;
  copyOf?: number;
  placements?: Partial<Placement>[];
}

export interface TableRow extends ImpedanceTableRow {
  placementId: string;
  lineTypeId: number | null;
}

export interface ImpedanceTableAnswer {
  stackup: { id: number; name: string; version: number; state: string };
  layers: StackupLayer[];
  rows: TableRow[];
  spreads: { width: number; dielectricThickness: number; relativePermittivity: number };
  note: string;
}

export interface StackupShare {
  id: number;
  email: string;
  stackupVersion: number;
  expiresAt: string;
  revokedAt: string | null;
  createdAt: string;
  link?: string;
}

export interface ReplyGeometry {
  width: number;
  gap: number | null;
  heightAbove: number | null;
  heightBelow: number | null;
  impedance: number;
}

export interface ReplyRow {
  row: number;
  label: string;
  layerName: string;
  structure: 'single' | 'pair';
  targetImpedance: number;
  tolerance: number;
  ours: ReplyGeometry;
  theirs: ReplyGeometry;
  differences: { width: number; gap: number | null; heightAbove: number | null; heightBelow: number | null; impedance: number; impedancePercent: number };
  linewrightAtTheirGeometry: number;
  isTheirsWithinTolerance: boolean;
  isOursAtTheirGeometryWithinTolerance: boolean;
  isOutOfTolerance: boolean;
}

export interface ReplyReport {
  rows: ReplyRow[];
  missing: string[];
  outOfTolerance: number;
  note: string;
}

export interface CouponLine {
  label: string;
  targetImpedance: number;
  tolerance: number;
  computedImpedance: number;
  bandLow: number;
  bandHigh: number;
  measured: { mean: number; min: number; max: number; samples: number; outside: number };
  isPass: boolean;
  trace: { x: number[]; impedance: number[] };
}

export interface CouponReport {
  axis: 'time' | 'distance';
  window: { from: number; to: number };
  lines: CouponLine[];
  passed: number;
  failed: number;
  note: string;
}

export interface StackupUpload<R> {
  id: number;
  stackupVersion: number;
  kind: 'fabricator-reply' | 'coupon';
  fileName: string | null;
  report: R;
  createdAt: string;
}

export interface SharedStackup {
  share: { email: string; expiresAt: string; sharedVersion: number; isChangedSinceShared: boolean };
  stackup: Stackup;
  table: ImpedanceTableAnswer;
}
