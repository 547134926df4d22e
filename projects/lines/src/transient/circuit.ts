/**
 * The public shapes of the time-domain part: a step source, a line, a load,
 * and what stepResponse() returns. Every quantity is SI (V, A, Ω, F, s, Hz).
 */
import type { LineSpec } from '../types';

/**
 * A voltage step behind a source resistance. The open-circuit voltage is an
 * erf-shaped edge (a step seen through a Gaussian filter) whose 50 % point is
 * at t = 0 and whose 10–90 % time is `riseTime`; see edge.ts.
 */
export interface StepSource {
  /** Open-circuit step height [V]. */
  amplitude: number;
  /** Source (driver) resistance [Ω], ≥ 0. */
  resistance: number;
  /** 10–90 % rise time [s]; 0 (an ideal step) only on the lattice path. */
  riseTime: number;
}

/** A lossless line given directly by its impedance and one-way delay. */
export interface DirectLine {
  /** Characteristic impedance [Ω]. */
  z0: number;
  /** One-way delay [s]. */
  delay: number;
}

/**
 * A lossy line given directly. `z0` and `delay` are the lossless values at
 * `referenceFrequency`; resistances are totals for the whole line (both
 * conductors). The conductor impedance follows √f from `skinResistance`
 * (with the equal internal reactance of Wheeler's rule) on top of
 * `dcResistance`; the dielectric follows the Djordjevic–Sarkar wideband model
 * through `tanDelta` at `referenceFrequency`. See line-model.ts.
 */
export interface LossyLine extends DirectLine {
  /** DC series resistance of the whole line [Ω]; default 0. */
  dcResistance?: number;
  /** Skin-effect series resistance of the whole line at `referenceFrequency` [Ω]; default 0. */
  skinResistance?: number;
  /** Dielectric loss tangent at `referenceFrequency`; default 0. */
  tanDelta?: number;
  /** Frequency at which `z0`, `skinResistance` and `tanDelta` hold [Hz]; required with either loss. */
  referenceFrequency?: number;
}

/** A line from the calculator: a cross-section spec and a physical length [m]. */
export interface SpecLine {
  spec: LineSpec;
  length: number;
}

export type TransientLine = DirectLine | LossyLine | SpecLine;

/** A series R–C branch to ground at the load (an AC termination). */
export interface SeriesRc {
  resistance: number;
  capacitance: number;
}

/**
 * The load at the far end: R ∥ C (either may be absent; both absent = open),
 * optionally with a series R–C branch in parallel, or an ideal open or short.
 */
export type TransientLoad =
  | { resistance?: number; capacitance?: number; seriesRc?: SeriesRc }
  | 'open'
  | 'short';

export interface StepCircuit {
  source: StepSource;
  line: TransientLine;
  load: TransientLoad;
}

export type TransientMethod = 'lattice' | 'frequency-domain';

export interface StepOptions {
  /** Last time computed [s]; default: enough round trips to settle (bounded). */
  duration?: number;
  /** Settling band as a fraction of the final value; default 0.02. */
  band?: number;
  /** Number of time samples, 16 … 65 536; default 4096. */
  points?: number;
  /** Force a method; by default the lattice for lossless lines with resistive ends. */
  method?: TransientMethod;
}

/** Waveforms and summary at one end of the line. */
export interface EndResponse {
  /** Voltage across the end [V], one per `time` sample. */
  voltage: number[];
  /** Current [A] into the line at the source end, into the load at the load end. */
  current: number[];
  /** DC (final) voltage [V]. */
  final: number;
  /** DC (final) current [A]. */
  finalCurrent: number;
  /**
   * Time after which the voltage stays within band·|final| of the final value
   * (band·|amplitude| when the final value is 0) [s]: 0 if it never leaves the
   * band, Infinity if it has not settled (lattice: never; frequency domain:
   * not within the computed window, with a warning).
   */
  settleTime: number;
}

/** One step of the lattice (bounce) solution: when it arrives and the level after it. */
export interface Arrival {
  /** Time of the step's 50 % point [s]. */
  time: number;
  end: 'source' | 'load';
  /** The end's voltage after the step [V]. */
  voltage: number;
}

export interface StepResponse {
  /** Sample times [s]; start before 0 so the whole edge shows. */
  time: number[];
  source: EndResponse;
  load: EndResponse;
  /** Lattice arrivals in time order; empty for the frequency-domain method. */
  arrivals: Arrival[];
  method: TransientMethod | 'ladder';
  /** Reflection coefficients for resistive ends (null for a reactive load). */
  reflection: { source: number; load: number | null };
  /**
   * Round trips (2·delay) after the first arrival at the load until the load
   * settles: 0 for a clean single step, Infinity if it never settles. Lattice
   * only; null otherwise.
   */
  roundTripsToSettle: number | null;
  warnings: string[];
}
