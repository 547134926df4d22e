/**
 * The impedance table of a stored stackup: its placements as library
 * placements, computed by the shared library's impedanceTable (so every
 * figure equals calculate() of the derived line).
 */
import { impedanceTable, type ImpedanceTable, type ImpedanceTableRow, type LinePlacement, type StackupLayer } from '@linewright/lines';
import type { StackupRecord, StoredPlacement } from './stackups-repository';
import type { ResolvedStackup } from './stackups-service';

export interface StackupTableRow extends ImpedanceTableRow {
  placementId: string;
  lineTypeId: number | null;
}

export interface StackupTable extends Omit<ImpedanceTable, 'rows'> {
  stackup: { id: number; name: string; version: number; state: string };
  layers: StackupLayer[];
  rows: StackupTableRow[];
}

export function libraryPlacement(placement: StoredPlacement): LinePlacement {
  return {
    label: placement.label,
    layerIndex: placement.layerIndex,
    structure: placement.structure,
    targetImpedance: placement.targetImpedance,
    tolerance: placement.tolerancePercent / 100,
    width: placement.width,
    ...(placement.gap !== null ? { gap: placement.gap } : {}),
  };
}

export function stackupTable(record: StackupRecord, resolved: ResolvedStackup): StackupTable {
  const table = impedanceTable(resolved.stackup, record.placements.map(libraryPlacement));
  return {
    stackup: { id: record.id, name: record.name, version: record.version, state: record.state },
    layers: resolved.stackup.layers,
    ...table,
    rows: table.rows.map((row, index) => ({ ...row, placementId: record.placements[index].id, lineTypeId: record.placements[index].lineTypeId })),
  };
}
