import type { LineSpec } from '@linewright/lines';
import { circuitFromInputs, INITIAL_UNITS, type CircuitInputs } from './circuit-inputs';

const typed: CircuitInputs = {
  amplitude: 3.3,
  sourceResistance: 10,
  riseTime: 100,
  lineSource: 'direct',
  z0: 50,
  delay: 1,
  isLossy: false,
  dcResistance: 0,
  skinResistance: 2,
  tanDelta: 0.02,
  referenceFrequency: 1,
  length: 0.5,
  loadKind: 'open',
  loadResistance: 50,
  loadCapacitance: 5,
};

describe('circuitFromInputs', () => {
  it('turns the shown units into SI: 100 ps, 1 ns, an open load', () => {
    const { circuit } = circuitFromInputs(typed, INITIAL_UNITS, undefined);
    expect(circuit).toEqual({ source: { amplitude: 3.3, resistance: 10, riseTime: 100e-12 }, line: { z0: 50, delay: 1e-9 }, load: 'open' });
  });

  it('follows a changed unit: a 25 µs delay and a 2 nF capacitor', () => {
    const units = { ...INITIAL_UNITS, delay: 'us', loadCapacitance: 'nF' };
    const { circuit } = circuitFromInputs({ ...typed, delay: 25, loadKind: 'resistor-capacitor', loadCapacitance: 2 }, units, undefined);
    const line = circuit!.line as { z0: number; delay: number };
    expect(line.z0).toBe(50);
    expect(line.delay).toBeCloseTo(25e-6, 18);
    const load = circuit!.load as { resistance: number; capacitance: number };
    expect(load.resistance).toBe(50);
    expect(load.capacitance).toBeCloseTo(2e-9, 20);
  });

  it('adds the explicit loss fields only when the line is lossy, with the reference frequency in Hz', () => {
    const { circuit } = circuitFromInputs({ ...typed, isLossy: true }, INITIAL_UNITS, undefined);
    expect(circuit!.line).toEqual({ z0: 50, delay: 1e-9, dcResistance: 0, skinResistance: 2, tanDelta: 0.02, referenceFrequency: 1e9 });
    expect(circuitFromInputs({ ...typed, isLossy: true, skinResistance: 0, tanDelta: 0, referenceFrequency: null }, INITIAL_UNITS, undefined).circuit!.line).toEqual({
      z0: 50,
      delay: 1e-9,
      dcResistance: 0,
      skinResistance: 0,
      tanDelta: 0,
    });
  });

  it('uses the calculator’s spec with the length in metres, and says so when there is none', () => {
    const spec: LineSpec = { kind: 'microstrip', w: 3e-4, h: 1.7e-4, t: 3.48e-5, er: 4.3 };
    const units = { ...INITIAL_UNITS, length: 'km' };
    expect(circuitFromInputs({ ...typed, lineSource: 'calculator' }, units, spec).circuit!.line).toEqual({ spec, length: 500 });
    expect(circuitFromInputs({ ...typed, lineSource: 'calculator' }, units, undefined).problem).toContain('Calculate screen');
  });

  it('names the first missing value instead of building a circuit', () => {
    expect(circuitFromInputs({ ...typed, riseTime: null }, INITIAL_UNITS, undefined).problem).toBe('Enter the rise time.');
    expect(circuitFromInputs({ ...typed, loadKind: 'resistor', loadResistance: null }, INITIAL_UNITS, undefined).problem).toBe(
      'Enter the load resistance.',
    );
  });

  it('maps short and capacitor loads to the library’s shapes', () => {
    expect(circuitFromInputs({ ...typed, loadKind: 'short' }, INITIAL_UNITS, undefined).circuit!.load).toBe('short');
    const load = circuitFromInputs({ ...typed, loadKind: 'capacitor' }, INITIAL_UNITS, undefined).circuit!.load as { capacitance: number };
    expect(load.capacitance).toBeCloseTo(5e-12, 24);
  });
});
