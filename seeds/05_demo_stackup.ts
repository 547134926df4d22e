/**
 * Halden Ridge Instruments' field data-logger main board: a 6-layer stack
 * (invented demo data, typical FR-4 thicknesses — common practice, not a
 * fabricator's stack) with the demo line types placed and their widths
 * solved with the library for their targets. Re-runnable: matched by name.
 */
import type { Knex } from 'knex';
import { COPPER_OUNCE_THICKNESS, solveLineDimension, type Stackup } from '../projects/lines/src/public-api';

const NAME = 'Halden field logger main board, 6 layers';
const FR4 = 'Glass-epoxy, FR-4 class';
const MASK = 'Liquid solder mask';
const mm = 1e-3;

/** Top to bottom: SIG / GND / SIG / PWR / GND / SIG under solder mask. */
const LAYERS = [
  { type: 'dielectric', name: 'Top mask', thickness: 0.02 * mm, kind: 'coating', material: MASK },
  { type: 'copper', name: 'L1 Top', thickness: COPPER_OUNCE_THICKNESS, role: 'signal' },
  { type: 'dielectric', name: 'Prepreg 1–2', thickness: 0.1 * mm, kind: 'prepreg', material: FR4 },
  { type: 'copper', name: 'L2 GND', thickness: COPPER_OUNCE_THICKNESS, role: 'plane' },
  { type: 'dielectric', name: 'Core 2–3', thickness: 0.2 * mm, kind: 'core', material: FR4 },
  { type: 'copper', name: 'L3 Signal', thickness: COPPER_OUNCE_THICKNESS, role: 'signal' },
  { type: 'dielectric', name: 'Prepreg 3–4', thickness: 0.2 * mm, kind: 'prepreg', material: FR4 },
  { type: 'copper', name: 'L4 PWR', thickness: COPPER_OUNCE_THICKNESS, role: 'plane' },
  { type: 'dielectric', name: 'Core 4–5', thickness: 0.71 * mm, kind: 'core', material: FR4 },
  { type: 'copper', name: 'L5 GND', thickness: COPPER_OUNCE_THICKNESS, role: 'plane' },
  { type: 'dielectric', name: 'Prepreg 5–6', thickness: 0.1 * mm, kind: 'prepreg', material: FR4 },
  { type: 'copper', name: 'L6 Bottom', thickness: COPPER_OUNCE_THICKNESS, role: 'signal' },
  { type: 'dielectric', name: 'Bottom mask', thickness: 0.02 * mm, kind: 'coating', material: MASK },
] as const;

const PLACEMENTS = [
  { label: 'GNSS antenna feed', lineType: '50 Ω outer-layer microstrip', layerIndex: 1 },
  { label: 'Sensor bus clock', lineType: '50 Ω inner-layer stripline', layerIndex: 5 },
  { label: 'USB 2.0 data pair', layerIndex: 5, structure: 'pair', targetImpedance: 90, tolerancePercent: 10, gap: 0.15 * mm },
  { label: 'Ethernet pair', lineType: '100 Ω outer-layer pair', layerIndex: 11 },
] as const;

export async function seed(knex: Knex): Promise<void> {
  if (await knex('stackups').where({ name: NAME }).first()) return;
  const admin = await knex('users').where({ email: 'admin@halden.test' }).first('id');
  const materials = new Map<string, { id: number; dk: number; df: number }>();
  for (const name of [FR4, MASK]) {
    const material = await knex('materials').where({ name }).first('id', 'dk', 'df');
    if (!material) return;
    materials.set(name, material);
  }
  const stackup: Stackup = {
    layers: LAYERS.map((layer) =>
      layer.type === 'copper'
        ? { ...layer }
        : { type: 'dielectric', name: layer.name, thickness: layer.thickness, kind: layer.kind, relativePermittivity: materials.get(layer.material)!.dk, lossTangent: materials.get(layer.material)!.df },
    ),
  };
  const placements = [];
  for (const [index, entry] of PLACEMENTS.entries()) {
    const lineType = 'lineType' in entry ? await knex('line_types').where({ name: entry.lineType }).first() : undefined;
    const geometry = lineType ? (typeof lineType.geometry === 'string' ? JSON.parse(lineType.geometry) : lineType.geometry) : {};
    const structure = lineType ? (lineType.target_quantity === 'zDiff' ? 'pair' : 'single') : (entry as { structure: 'pair' }).structure;
    const targetImpedance = lineType ? lineType.target_value : (entry as { targetImpedance: number }).targetImpedance;
    const gap = structure === 'pair' ? (geometry.s ?? (entry as { gap: number }).gap) : undefined;
    const solved = solveLineDimension(stackup, entry.layerIndex, structure, targetImpedance, { gap });
    placements.push({
      id: `demo${index + 1}`,
      label: entry.label,
      lineTypeId: lineType?.id ?? null,
      layerIndex: entry.layerIndex,
      structure,
      targetImpedance,
      tolerancePercent: lineType ? lineType.target_tolerance_percent : (entry as { tolerancePercent: number }).tolerancePercent,
      // Rounded to 0.1 µm, as the table and the drawing show it.
      width: Math.round(solved.dimensions.width * 1e7) / 1e7,
      gap: gap ?? null,
    });
  }
  await knex('stackups').insert({
    name: NAME,
    description: 'Main board of the field data logger: GNSS and radio on L1, sensor bus and USB on L3, Ethernet on L6.',
    layers: JSON.stringify(
      LAYERS.map((layer) =>
        layer.type === 'copper'
          ? { type: 'copper', name: layer.name, thickness: layer.thickness, role: layer.role, conductorId: null }
          : { type: 'dielectric', name: layer.name, thickness: layer.thickness, kind: layer.kind, materialId: materials.get(layer.material)!.id, relativePermittivity: null, lossTangent: null },
      ),
    ),
    placements: JSON.stringify(placements),
    owner_id: admin?.id ?? null,
    state: 'draft',
    created_by: admin?.id ?? null,
    updated_by: admin?.id ?? null,
  });
}
