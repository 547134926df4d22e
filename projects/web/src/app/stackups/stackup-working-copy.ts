/**
 * The editor's working copy of a stackup: stored layers resolved against the
 * catalog materials (as the server does: the layer's own Dk/Df, else its
 * material's) and the impedance table computed live with the shared library.
 */
import { impedanceTable, LineInputError, type ImpedanceTable, type Stackup as LibraryStackup, type StackupLayer } from '@linewright/lines';
import type { Material } from '../catalog/catalog-types';
import type { Placement, StoredLayer } from './stackup-types';

export type Computed<T> = { value: T; error?: undefined } | { value?: undefined; error: string };

export function resolveLayers(layers: readonly StoredLayer[], materials: readonly Material[]): Computed<StackupLayer[]> {
  const byId = new Map(materials.map((material) => [material.id, material]));
  const resolved: StackupLayer[] = [];
  for (const [index, layer] of layers.entries()) {
    if (layer.type === 'copper') {
      resolved.push({ type: 'copper', name: layer.name, thickness: layer.thickness, role: layer.role });
      continue;
    }
    const material = layer.materialId === null ? undefined : byId.get(layer.materialId);
    const relativePermittivity = layer.relativePermittivity ?? material?.dk;
    if (relativePermittivity === undefined) return { error: `Layer ${index} (${layer.name}) needs a material or its own Dk.` };
    resolved.push({
      type: 'dielectric',
      name: layer.name,
      thickness: layer.thickness,
      kind: layer.kind,
      relativePermittivity,
      lossTangent: layer.lossTangent ?? material?.df ?? 0,
      ...(material ? { material: material.name } : {}),
    });
  }
  return { value: resolved };
}

/** The library's table for the working copy, or the library's words for what is impossible. */
export function liveTable(layers: readonly StackupLayer[], placements: readonly Placement[]): Computed<ImpedanceTable & { rows: (ImpedanceTable['rows'][number] & { placementId: string })[] }> {
  const stackup: LibraryStackup = { layers: [...layers] };
  try {
    const table = impedanceTable(
      stackup,
      placements.map((placement) => ({
        label: placement.label,
        layerIndex: placement.layerIndex,
        structure: placement.structure,
        targetImpedance: placement.targetImpedance,
        tolerance: placement.tolerancePercent / 100,
        width: placement.width,
        ...(placement.gap !== null ? { gap: placement.gap } : {}),
      })),
    );
    return { value: { ...table, rows: table.rows.map((row, index) => ({ ...row, placementId: placements[index].id })) } };
  } catch (error) {
    // Impossible input while editing (a placement on a layer that became a plane, a zero thickness) is shown, not thrown.
    if (error instanceof LineInputError) return { error: `${error.field}: ${error.rule}` };
    throw error;
  }
}

/** Placements after a layer was inserted at or removed from `index`: those below move; those on a removed layer go. */
export function shiftPlacements(placements: readonly Placement[], change: { inserted?: number; removed?: number }): Placement[] {
  if (change.inserted !== undefined) return placements.map((placement) => (placement.layerIndex >= change.inserted! ? { ...placement, layerIndex: placement.layerIndex + 1 } : placement));
  if (change.removed !== undefined) {
    return placements
      .filter((placement) => placement.layerIndex !== change.removed)
      .map((placement) => (placement.layerIndex > change.removed! ? { ...placement, layerIndex: placement.layerIndex - 1 } : placement));
  }
  return [...placements];
}
