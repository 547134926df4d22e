/**
 * An N-section lumped RLGC ladder of the line, to show how many sections a
 * lumped (SPICE-style) model needs before its step response matches the
 * distributed line.
 */
import { LineInputError } from '../errors';
import type { StepCircuit, StepOptions, StepResponse } from './circuit';
import { edge } from './edge';
import { finalLevels, settleTolerance } from './final-levels';
import { nominalReflections } from './lattice';
import { settleTimeOfSamples } from './settle';
import { stepResponse, timeAxis } from './step-response';
import { normalizeCircuit, normalizeOptions, type NormalizedCircuit } from './validate-circuit';

/** More sections than this cost more than a live screen allows and show nothing new. */
export const MAX_LADDER_SECTIONS = 2000;
/** The integration step is at most this fraction of the edge's σ (trapezoidal phase error ~ (ωh)²/12). */
const STEPS_PER_SIGMA = 4;

/**
 * Step response of the line replaced by `sections` symmetric Π sections
 * (C/2N – R/N, L/N – C/2N, G likewise), same source and load.
 * Method: modified nodal state equations of the ladder, ordered
 *   (v0, i1, v1, …, iN, vN) so the system is tridiagonal, integrated by the
 *   trapezoidal rule (A-stable, second order), solved by the Thomas algorithm.
 * Valid:  lumped totals R, L, G, C as line-transfer.ts gives them (for lossy
 *   lines the values at the reference frequency, so skin-effect and dielectric
 *   dispersion are not modelled); a Π ladder's own cut-off is ω = 2N/delay.
 */
export function ladderStepResponse(circuit: StepCircuit, sections: number, options?: StepOptions): StepResponse {
  requireSections(sections);
  const normalized = normalizeCircuit(circuit);
  const settings = normalizeOptions(options);
  // Shown over the window the distributed line needs, so the two compare sample by sample.
  const duration = settings.duration ?? stepResponse(circuit, options).time.at(-1)!;
  const { time, dt } = timeAxis(normalized.riseTime, duration, settings.points);
  const waves = integrateLadder(normalized, sections, time, dt);
  const final = finalLevels(normalized);
  const end = (voltage: number[], current: number[], level: number) => ({
    voltage,
    current,
    final: level,
    finalCurrent: final.current,
    settleTime: settleTimeOfSamples(time, voltage, level, settleTolerance(settings.band, level, normalized.amplitude)),
  });
  return {
    time,
    source: end(waves.sourceVoltage, waves.sourceCurrent, final.sourceVoltage),
    load: end(waves.loadVoltage, waves.loadCurrent, final.loadVoltage),
    arrivals: [],
    method: 'ladder',
    reflection: nominalReflections(normalized),
    roundTripsToSettle: null,
    warnings: [...normalized.line.warnings],
  };
}

export interface LadderError {
  sections: number;
  /** Largest |v_ladder − v_line| at the load over the window, as a fraction of the final value (of the amplitude when that is 0). */
  maxError: number;
  /** RMS of the same difference, same scale. */
  rmsError: number;
  /** The ladder's load settling time [s], beside `referenceSettleTime`. */
  settleTime: number;
  referenceSettleTime: number;
}

/**
 * The ladder's load-voltage error against the distributed solution
 * (stepResponse) for each section count, on the same time samples.
 * Valid:  as ladderStepResponse; for a lossless line the error falls towards
 *   0 as N grows once the section delay is well below the rise time.
 */
export function ladderError(circuit: StepCircuit, sectionCounts: number[], options?: StepOptions): LadderError[] {
  sectionCounts.forEach(requireSections);
  const reference = stepResponse(circuit, options);
  const duration = reference.time.at(-1)!;
  const scale = settleTolerance(1, reference.load.final, circuit.source.amplitude);
  return sectionCounts.map((sections) => {
    const ladder = ladderStepResponse(circuit, sections, { ...options, duration });
    let max = 0;
    let sumSquares = 0;
    ladder.load.voltage.forEach((v, i) => {
      const d = Math.abs(v - reference.load.voltage[i]);
      max = Math.max(max, d);
      sumSquares += d * d;
    });
    return {
      sections,
      maxError: scale > 0 ? max / scale : max,
      rmsError: (scale > 0 ? 1 / scale : 1) * Math.sqrt(sumSquares / ladder.load.voltage.length),
      settleTime: ladder.load.settleTime,
      referenceSettleTime: reference.load.settleTime,
    };
  });
}

function requireSections(sections: number): void {
  if (!Number.isInteger(sections) || sections < 1 || sections > MAX_LADDER_SECTIONS) {
    throw new LineInputError('sections', `must be a whole number from 1 to ${MAX_LADDER_SECTIONS}`);
  }
}

interface LadderWaves {
  sourceVoltage: number[];
  sourceCurrent: number[];
  loadVoltage: number[];
  loadCurrent: number[];
}

/** Trapezoidal integration of M·x′ = A·x + b(t); rows flagged `isFixed` are v = value(t) instead. */
function integrateLadder(circuit: NormalizedCircuit, n: number, time: number[], dt: number): LadderWaves {
  const { amplitude, sourceResistance: rs, sigma, load } = circuit;
  const { resistance, inductance, conductance, capacitance } = circuit.line.lumped;
  const hasBranch = load.seriesRc !== null && load.seriesRc.resistance > 0;
  const size = 2 * n + 1 + (hasBranch ? 1 : 0);
  const m = new Float64Array(size);
  const diag = new Float64Array(size);
  const lower = new Float64Array(size);
  const upper = new Float64Array(size);
  const isFixed = new Uint8Array(size);
  for (let k = 0; k <= n; k++) {
    const share = k === 0 || k === n ? 1 / (2 * n) : 1 / n;
    m[2 * k] = capacitance * share;
    diag[2 * k] = -conductance * share;
    if (k > 0) lower[2 * k] = 1;
    if (k < n) upper[2 * k] = -1;
  }
  for (let k = 1; k <= n; k++) {
    m[2 * k - 1] = inductance / n;
    diag[2 * k - 1] = -resistance / n;
    lower[2 * k - 1] = 1;
    upper[2 * k - 1] = -1;
  }
  const last = 2 * n;
  if (rs > 0) diag[0] -= 1 / rs;
  else isFixed[0] = 1;
  if (load.resistance === 0) isFixed[last] = 1;
  else diag[last] -= 1 / load.resistance;
  m[last] += load.capacitance + (load.seriesRc && !hasBranch ? load.seriesRc.capacitance : 0);
  if (hasBranch) {
    const g = 1 / load.seriesRc!.resistance;
    diag[last] -= g;
    upper[last] = g;
    lower[last + 1] = g;
    diag[last + 1] = -g;
    m[last + 1] = load.seriesRc!.capacitance;
  }
  const substeps = sigma > 0 ? Math.max(1, Math.ceil((dt * STEPS_PER_SIGMA) / sigma)) : 1;
  const h = dt / substeps;
  // LHS T = M − (h/2)·A (fixed rows: identity), factored once (Thomas algorithm).
  const tDiag = new Float64Array(size);
  const tLower = new Float64Array(size);
  const tUpper = new Float64Array(size);
  for (let i = 0; i < size; i++) {
    tDiag[i] = isFixed[i] ? 1 : m[i] - (h / 2) * diag[i];
    tLower[i] = isFixed[i] ? 0 : -(h / 2) * lower[i];
    tUpper[i] = isFixed[i] ? 0 : -(h / 2) * upper[i];
  }
  // RHS = (M + (h/2)·A)·x + (h/2)·(b(t) + b(t + h)), as three diagonals (zero on fixed rows).
  const rDiag = new Float64Array(size);
  const rLower = new Float64Array(size);
  const rUpper = new Float64Array(size);
  for (let i = 0; i < size; i++) {
    if (isFixed[i]) continue;
    rDiag[i] = m[i] + (h / 2) * diag[i];
    rLower[i] = (h / 2) * lower[i];
    rUpper[i] = (h / 2) * upper[i];
  }
  const factor = new Float64Array(size);
  const inversePivot = new Float64Array(size);
  inversePivot[0] = 1 / tDiag[0];
  for (let i = 1; i < size; i++) {
    factor[i] = tLower[i] * inversePivot[i - 1];
    inversePivot[i] = 1 / (tDiag[i] - factor[i] * tUpper[i - 1]);
  }
  const source = (t: number) => amplitude * edge(t, sigma);
  const x = new Float64Array(size);
  const rhs = new Float64Array(size);
  const halfC = capacitance / (2 * n);
  const halfG = conductance / (2 * n);
  const waves: LadderWaves = { sourceVoltage: [], sourceCurrent: [], loadVoltage: [], loadCurrent: [] };
  const record = (t: number) => {
    const v0 = x[0];
    waves.sourceVoltage.push(v0);
    waves.sourceCurrent.push(rs > 0 ? (source(t) - v0) / rs : x[1] + halfG * v0 + halfC * sourceSlope(t, amplitude, sigma));
    waves.loadVoltage.push(x[last]);
    // The load's current is what the last inductor brings minus what the line's own half-section keeps.
    const slope = isFixed[last]
      ? 0
      : (lower[last] * x[last - 1] + diag[last] * x[last] + (last + 1 < size ? upper[last] * x[last + 1] : 0)) / m[last];
    waves.loadCurrent.push(x[last - 1] - halfC * slope - halfG * x[last]);
  };
  let t = time[0];
  let vsNow = source(t);
  x[0] = isFixed[0] ? vsNow : 0;
  record(t);
  const end = size - 1;
  for (let sample = 1; sample < time.length; sample++) {
    for (let step = 0; step < substeps; step++) {
      const tNext = t + h;
      const vsNext = source(tNext);
      // Right-hand side and forward elimination in one pass (the hot loop: one read of each array).
      let previous = isFixed[0] ? vsNext : rDiag[0] * x[0] + rUpper[0] * x[1] + (h / 2) * ((vsNow + vsNext) / rs);
      rhs[0] = previous;
      let xBefore = x[0];
      let xHere = x[1];
      for (let i = 1; i < end; i++) {
        const xAfter = x[i + 1];
        previous = rLower[i] * xBefore + rDiag[i] * xHere + rUpper[i] * xAfter - factor[i] * previous;
        rhs[i] = previous;
        xBefore = xHere;
        xHere = xAfter;
      }
      let xNext = (rLower[end] * xBefore + rDiag[end] * xHere - factor[end] * previous) * inversePivot[end];
      x[end] = xNext;
      for (let i = end - 1; i >= 0; i--) {
        xNext = (rhs[i] - tUpper[i] * xNext) * inversePivot[i];
        x[i] = xNext;
      }
      t = tNext;
      vsNow = vsNext;
    }
    record(time[sample]);
  }
  return waves;
}

/** dVs/dt for a zero-resistance source: the edge's Gaussian pulse. */
function sourceSlope(t: number, amplitude: number, sigma: number): number {
  if (sigma === 0) return 0;
  return (amplitude * Math.exp(-(t * t) / (2 * sigma * sigma))) / (sigma * Math.sqrt(2 * Math.PI));
}
