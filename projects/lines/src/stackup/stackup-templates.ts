/**
 * Starting stackups of 2, 4, 6 and 8 layers near 1.6 mm overall. Every figure
 * here is common practice, no source: FR-4 class glass-epoxy with Dk ≈ 4.4 for
 * cores and ≈ 4.2 for the more resin-rich prepregs (Df ≈ 0.02), 1 oz copper
 * (1.37 mil, see COPPER_OUNCE_THICKNESS), and liquid photoimageable solder mask
 * about 20 µm thick with Dk ≈ 3.5. They are a start for the conversation with
 * the fabricator, not its result.
 */
import { LineInputError } from '../errors';
import { COPPER_OUNCE_THICKNESS } from '../units/length-units';
import type { CopperLayer, CopperRole, DielectricKind, DielectricLayer, Stackup } from './stackup';

const MILLIMETRE = 1e-3;
/** Solder mask thickness over the laminate (common practice, no source). */
const MASK_THICKNESS = 20e-6;

const MATERIALS: Record<DielectricKind, { relativePermittivity: number; lossTangent: number; material: string }> = {
  core: { relativePermittivity: 4.4, lossTangent: 0.02, material: 'FR-4 core' },
  prepreg: { relativePermittivity: 4.2, lossTangent: 0.02, material: 'FR-4 prepreg' },
  coating: { relativePermittivity: 3.5, lossTangent: 0.025, material: 'Solder mask' },
};

export const STACKUP_TEMPLATE_LAYER_COUNTS = [2, 4, 6, 8] as const;
export type StackupTemplateLayerCount = (typeof STACKUP_TEMPLATE_LAYER_COUNTS)[number];

/** Copper roles top to bottom, and the dielectric between each pair (kind, thickness in mm). */
const TEMPLATES: Record<StackupTemplateLayerCount, { roles: CopperRole[]; between: [DielectricKind, number][] }> = {
  2: { roles: ['signal', 'mixed'], between: [['core', 1.5]] },
  4: {
    roles: ['signal', 'plane', 'plane', 'signal'],
    between: [['prepreg', 0.2], ['core', 1.0], ['prepreg', 0.2]],
  },
  6: {
    roles: ['signal', 'plane', 'signal', 'signal', 'plane', 'signal'],
    between: [['prepreg', 0.1], ['core', 0.3], ['prepreg', 0.5], ['core', 0.3], ['prepreg', 0.1]],
  },
  8: {
    roles: ['signal', 'plane', 'signal', 'plane', 'plane', 'signal', 'plane', 'signal'],
    between: [['prepreg', 0.1], ['core', 0.2], ['prepreg', 0.2], ['core', 0.2], ['prepreg', 0.2], ['core', 0.2], ['prepreg', 0.1]],
  },
};

/** A fresh copy of the template with `layerCount` copper layers, solder mask on both sides. */
export function stackupTemplate(layerCount: number): Stackup {
  const template = TEMPLATES[layerCount as StackupTemplateLayerCount];
  if (!template) throw new LineInputError('layerCount', `must be one of ${STACKUP_TEMPLATE_LAYER_COUNTS.join(', ')}`);
  const last = template.roles.length - 1;
  const layers: Stackup['layers'] = [dielectric('Top mask', 'coating', MASK_THICKNESS)];
  template.roles.forEach((role, index) => {
    layers.push(copper(index, last, role));
    const between = template.between[index];
    if (between) layers.push(dielectric(`${between[0] === 'core' ? 'Core' : 'Prepreg'} ${index + 1}–${index + 2}`, between[0], between[1] * MILLIMETRE));
  });
  layers.push(dielectric('Bottom mask', 'coating', MASK_THICKNESS));
  return { layers };
}

function copper(index: number, last: number, role: CopperRole): CopperLayer {
  const place = index === 0 ? ' Top' : index === last ? ' Bottom' : '';
  const use = role === 'plane' ? ' GND' : '';
  return { type: 'copper', name: `L${index + 1}${place}${use}`, thickness: COPPER_OUNCE_THICKNESS, role };
}

function dielectric(name: string, kind: DielectricKind, thickness: number): DielectricLayer {
  return { type: 'dielectric', name, thickness, kind, ...MATERIALS[kind] };
}
