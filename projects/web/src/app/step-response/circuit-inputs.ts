/**
 * The screen's inputs, as typed, turned into the library's StepCircuit.
 * Numbers arrive in the shown units; everything leaving here is SI.
 */
import type { LineSpec, StepCircuit, TransientLine, TransientLoad } from '@linewright/lines';
import { CABLE_LENGTH_UNITS, CAPACITANCE_UNITS, FREQUENCY_UNITS, TIME_UNITS, factorOf } from './circuit-units';

export type LineSource = 'direct' | 'calculator' | 'saved';
export type LoadKind = 'resistor' | 'open' | 'short' | 'capacitor' | 'resistor-capacitor';

export const LOAD_KINDS: readonly { id: LoadKind; label: string }[] = [
  { id: 'resistor', label: 'Resistor' },
  { id: 'open', label: 'Open end' },
  { id: 'short', label: 'Short' },
  { id: 'capacitor', label: 'Capacitor to ground' },
  { id: 'resistor-capacitor', label: 'Resistor ∥ capacitor' },
];

/** Whether the load kind uses the resistance or the capacitance field. */
export const usesLoadResistance = (kind: LoadKind) => kind === 'resistor' || kind === 'resistor-capacitor';
export const usesLoadCapacitance = (kind: LoadKind) => kind === 'capacitor' || kind === 'resistor-capacitor';

/** The form's raw value: numbers in the units of `CircuitUnits`, null when empty. */
export interface CircuitInputs {
  amplitude: number | null;
  sourceResistance: number | null;
  riseTime: number | null;
  lineSource: LineSource;
  z0: number | null;
  delay: number | null;
  isLossy: boolean;
  dcResistance: number | null;
  skinResistance: number | null;
  tanDelta: number | null;
  referenceFrequency: number | null;
  length: number | null;
  loadKind: LoadKind;
  loadResistance: number | null;
  loadCapacitance: number | null;
}

/** The unit chosen for each field that has a choice. */
export interface CircuitUnits {
  riseTime: string;
  delay: string;
  referenceFrequency: string;
  length: string;
  loadCapacitance: string;
}

export const INITIAL_UNITS: CircuitUnits = { riseTime: 'ps', delay: 'ns', referenceFrequency: 'GHz', length: 'm', loadCapacitance: 'pF' };

export type CircuitOutcome = { circuit: StepCircuit; problem?: undefined } | { circuit?: undefined; problem: string };

/**
 * The circuit, or the first thing missing in words. Range rules (positive
 * delay, rise time needed off the lattice path…) are the library's: it
 * throws LineInputError, which the page shows as it is.
 * `spec` is the line's cross-section when the line comes from the calculator
 * or a saved line type.
 */
export function circuitFromInputs(inputs: CircuitInputs, units: CircuitUnits, spec: LineSpec | undefined): CircuitOutcome {
  const missing = (what: string): CircuitOutcome => ({ problem: `Enter the ${what}.` });
  if (inputs.amplitude === null) return missing('source amplitude');
  if (inputs.sourceResistance === null) return missing('source resistance');
  if (inputs.riseTime === null) return missing('rise time');
  const line = lineFromInputs(inputs, units, spec);
  if (typeof line === 'string') return { problem: line };
  const load = loadFromInputs(inputs, units);
  if ('problem' in load) return load;
  return {
    circuit: {
      source: { amplitude: inputs.amplitude, resistance: inputs.sourceResistance, riseTime: inputs.riseTime * factorOf(TIME_UNITS, units.riseTime) },
      line,
      load: load.load,
    },
  };
}

function lineFromInputs(inputs: CircuitInputs, units: CircuitUnits, spec: LineSpec | undefined): TransientLine | string {
  if (inputs.lineSource !== 'direct') {
    if (!spec) {
      return inputs.lineSource === 'calculator'
        ? 'The calculator has no complete line yet: describe one on the Calculate screen, or enter Z0 and delay here.'
        : 'Choose a saved line type.';
    }
    if (inputs.length === null) return 'Enter the line length.';
    return { spec, length: inputs.length * factorOf(CABLE_LENGTH_UNITS, units.length) };
  }
  if (inputs.z0 === null) return 'Enter the characteristic impedance Z0.';
  if (inputs.delay === null) return 'Enter the one-way delay.';
  const direct = { z0: inputs.z0, delay: inputs.delay * factorOf(TIME_UNITS, units.delay) };
  if (!inputs.isLossy) return direct;
  const hasFrequencyLoss = (inputs.skinResistance ?? 0) > 0 || (inputs.tanDelta ?? 0) > 0;
  if (hasFrequencyLoss && inputs.referenceFrequency === null) return 'Enter the frequency at which the skin resistance and tan δ hold.';
  return {
    ...direct,
    dcResistance: inputs.dcResistance ?? 0,
    skinResistance: inputs.skinResistance ?? 0,
    tanDelta: inputs.tanDelta ?? 0,
    ...(hasFrequencyLoss ? { referenceFrequency: inputs.referenceFrequency! * factorOf(FREQUENCY_UNITS, units.referenceFrequency) } : {}),
  };
}

/** The load, or what is missing (the load itself may be the string 'open' or 'short'). */
function loadFromInputs(inputs: CircuitInputs, units: CircuitUnits): { load: TransientLoad } | { problem: string } {
  const capacitance = inputs.loadCapacitance === null ? null : inputs.loadCapacitance * factorOf(CAPACITANCE_UNITS, units.loadCapacitance);
  const resistance = inputs.loadResistance;
  const needsResistance = usesLoadResistance(inputs.loadKind);
  const needsCapacitance = usesLoadCapacitance(inputs.loadKind);
  if (needsResistance && resistance === null) return { problem: 'Enter the load resistance.' };
  if (needsCapacitance && capacitance === null) return { problem: 'Enter the load capacitance.' };
  if (inputs.loadKind === 'open' || inputs.loadKind === 'short') return { load: inputs.loadKind };
  return {
    load: {
      ...(needsResistance ? { resistance: resistance! } : {}),
      ...(needsCapacitance ? { capacitance: capacitance! } : {}),
    },
  };
}

