/**
 * The DC (final) state of the circuit: capacitors open, the line a series
 * resistance (its DC resistance; zero for a lossless line).
 */
import type { NormalizedCircuit } from './validate-circuit';

export interface FinalLevels {
  /** Voltage at the source end of the line [V]. */
  sourceVoltage: number;
  /** Voltage across the load [V]. */
  loadVoltage: number;
  /** Current through the line into the load [A]. */
  current: number;
}

/**
 * Method: Ohm's law on the DC circuit, I = Vs/(Rs + R_line + RL), V_load = I·RL;
 *   for a lossless line V_load = Vs·RL/(Rs + RL).
 * Valid:  any resistive or capacitive load (series R–C branches carry no DC).
 */
export function finalLevels(circuit: NormalizedCircuit): FinalLevels {
  const { amplitude, sourceResistance, load, line } = circuit;
  const seriesResistance = sourceResistance + line.dcResistance;
  if (load.resistance === Infinity) return { sourceVoltage: amplitude, loadVoltage: amplitude, current: 0 };
  const current = amplitude / (seriesResistance + load.resistance);
  return {
    sourceVoltage: current * (line.dcResistance + load.resistance),
    loadVoltage: current * load.resistance,
    current,
  };
}

/**
 * Half-width of the settling band [V]: band·|final|, or band·|amplitude| when
 * the final value is 0 (a shorted load), where a relative band has no meaning.
 */
export function settleTolerance(band: number, final: number, amplitude: number): number {
  return band * (final !== 0 ? Math.abs(final) : Math.abs(amplitude));
}
