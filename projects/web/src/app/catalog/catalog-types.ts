/**
 * The catalog's shapes as the API answers them (openapi/openapi.yaml:
 * CatalogEntry, Material, Conductor, LineType). Every quantity is SI.
 */
import type { LineKind, LineResult, LineSpec } from '@linewright/lines';

export const CATALOG_STATES = ['draft', 'proposed', 'approved', 'retired'] as const;
export type CatalogState = (typeof CATALOG_STATES)[number];

export interface CatalogEntry {
  id: number;
  name: string;
  state: CatalogState;
  version: number;
  createdBy: number | null;
  updatedBy: number | null;
  createdAt: string;
  updatedAt: string;
}

export interface DkDfPoint {
  frequency: number;
  dk: number;
  df: number;
}

export interface Material extends CatalogEntry {
  description: string | null;
  dk: number;
  df: number;
  referenceFrequency: number;
  dkDfTable: DkDfPoint[] | null;
  dielectricStrength: number | null;
  notes: string | null;
  isTypical?: boolean;
}

export interface Conductor extends CatalogEntry {
  description: string | null;
  conductivity: number;
  roughness: number;
  foilThicknesses: number[];
  notes: string | null;
}

export interface LineTarget {
  quantity: 'z0' | 'zDiff';
  value: number;
  tolerancePercent: number;
}

export interface LineTypeComputed {
  spec: LineSpec;
  result: LineResult;
  note: string;
  target: LineTarget & { actual: number; deviationPercent: number; isMet: boolean };
}

export interface LineType extends CatalogEntry {
  description: string | null;
  kind: LineKind;
  geometry: Record<string, number | boolean>;
  materialId: number;
  conductorId: number | null;
  target: LineTarget;
  lengthDefault: number | null;
  tags: string[];
  ownerId: number | null;
  /** Present on single-entry answers only. */
  computed?: LineTypeComputed;
}

/** What a create or update sends: the entry's own fields, quantities in SI or as unit strings. */
export type MaterialInput = Pick<Material, 'name' | 'dk'> & Partial<Pick<Material, 'description' | 'df' | 'dielectricStrength' | 'notes'>> & { referenceFrequency?: number | string };
export type ConductorInput = Pick<Conductor, 'name' | 'conductivity'> & { foilThicknesses: (number | string)[] } & Partial<Pick<Conductor, 'description' | 'roughness' | 'notes'>>;
export type LineTypeInput = Pick<LineType, 'name' | 'kind' | 'geometry' | 'materialId' | 'target'> &
  Partial<Pick<LineType, 'description' | 'conductorId' | 'lengthDefault' | 'tags'>>;

export interface Page<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}

/** A list request: `sort` is a key with `-` first for descending; extra filters are per catalog. */
export interface ListQuery {
  page: number;
  pageSize: number;
  sort?: string;
  q?: string;
  state?: CatalogState;
  filters?: Record<string, string | number>;
}

/** An entry with the version it was read at, for If-Match on the next write. */
export interface Versioned<T> {
  item: T;
  etag: string;
}
