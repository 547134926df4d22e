/**
 * stepResponse(): what each end of a line sees after the source switches on.
 * Picks the exact lattice solution for a lossless line between resistive ends
 * and the frequency-domain solution otherwise.
 */
import { LineInputError } from '../errors';
import type { EndResponse, StepCircuit, StepOptions, StepResponse } from './circuit';
import { EDGE_HALF_WIDTH_SIGMAS, riseTimeOfSigma } from './edge';
import { finalLevels, settleTolerance } from './final-levels';
import { distributedPropagation, frequencyDomainWaveforms, type Propagation } from './frequency-domain';
import { arrivalsOf, bounce, nominalReflections, reflectionCoefficient, sampleEnd, voltageAt, type EndSteps } from './lattice';
import { settleTimeOfFunction, settleTimeOfSamples } from './settle';
import {
  isResistiveLoad,
  normalizeCircuit,
  normalizeOptions,
  type NormalizedCircuit,
  type NormalizedOptions,
} from './validate-circuit';

/** The time axis starts this many rise times before the edge's 50 % point, where the edge is below 1e−14. */
export const EDGE_LEAD_RISE_TIMES = 3;
/** Most round trips the lattice follows (each costs a few numbers per end). */
const MAX_ROUND_TRIPS = 20_000;
/** A default duration never exceeds this many round trips. */
const MAX_DEFAULT_ROUND_TRIPS = 5_000;
/** Round trips shown when the waves never die out (|ΓS·ΓL| = 1). */
const RINGING_ROUND_TRIPS = 20;
/** The frequency-domain edge is at least this many samples wide (σ ≥ 2.6·dt keeps its spectrum ≤ 1e−14 at Nyquist). */
const SIGMA_PER_SAMPLE = 2.6;
/** A default frequency-domain duration is doubled at most this often while the response has not settled. */
const MAX_DURATION_DOUBLINGS = 3;

/**
 * Step response of source → line → load at both ends.
 * Method: lattice (bounce) solution, exact, for a lossless line with resistive
 *   ends (lattice.ts); otherwise the frequency-domain two-port solution with a
 *   numerical inverse Laplace transform (frequency-domain.ts). The source's
 *   edge is erf-shaped with its 50 % point at t = 0 (edge.ts).
 * Valid:  linear, time-invariant source, line and load. A frequency-domain
 *   edge narrower than the samples resolve is widened, with a warning.
 */
export function stepResponse(circuit: StepCircuit, options?: StepOptions): StepResponse {
  const normalized = normalizeCircuit(circuit);
  const settings = normalizeOptions(options);
  const isLatticeCase = normalized.line.isLossless && isResistiveLoad(normalized.load);
  const method = settings.method ?? (isLatticeCase ? 'lattice' : 'frequency-domain');
  if (method === 'lattice') {
    if (!isLatticeCase) {
      throw new LineInputError('options.method', 'the lattice solution needs a lossless line and a resistive load');
    }
    return latticeResponse(normalized, settings);
  }
  if (settings.duration !== undefined) return frequencyResponse(normalized, settings, settings.duration);
  let duration = estimatedDuration(normalized, settings.band);
  let response = frequencyResponse(normalized, settings, duration);
  if (isLossFree(normalized)) {
    response.warnings.push(
      'Nothing in the circuit dissipates (lossless line, zero-resistance source, no load resistance): it rings for ever.',
    );
    return response;
  }
  for (let i = 0; i < MAX_DURATION_DOUBLINGS && !hasSettled(response); i++) {
    duration *= 2;
    response = frequencyResponse(normalized, settings, duration);
  }
  return response;
}

/** True when no element dissipates energy, so waiting longer never settles the response. */
function isLossFree({ line, sourceResistance, load }: NormalizedCircuit): boolean {
  const hasLoadResistance = load.resistance !== Infinity || (load.seriesRc !== null && load.seriesRc.resistance > 0);
  return line.isLossless && sourceResistance === 0 && !hasLoadResistance;
}

const hasSettled = (response: StepResponse) =>
  Number.isFinite(response.source.settleTime) && Number.isFinite(response.load.settleTime);

/** Uniform samples from a few rise times before the edge's 50 % point to `duration`. */
export function timeAxis(riseTime: number, duration: number, points: number): { time: number[]; t0: number; dt: number } {
  const t0 = -EDGE_LEAD_RISE_TIMES * riseTime;
  const dt = (duration - t0) / (points - 1);
  return { time: Array.from({ length: points }, (_, i) => t0 + i * dt), t0, dt };
}

function latticeResponse(circuit: NormalizedCircuit, settings: NormalizedOptions): StepResponse {
  const { amplitude, sourceResistance, line, load, sigma, riseTime } = circuit;
  const halfWidth = EDGE_HALF_WIDTH_SIGMAS * sigma;
  const gs = reflectionCoefficient(sourceResistance, line.z0);
  const gl = reflectionCoefficient(load.resistance, line.z0);
  const isRinging = Math.abs(gs * gl) >= 1;
  // Decaying waves are followed until they vanish, so settling is exact even past the duration.
  const followUntil = isRinging
    ? (settings.duration ?? (2 * RINGING_ROUND_TRIPS + 1) * line.delay) + halfWidth
    : Infinity;
  const lattice = bounce(amplitude, sourceResistance, line.z0, line.delay, load.resistance, followUntil, MAX_ROUND_TRIPS);
  const final = finalLevels(circuit);
  const t0 = -EDGE_LEAD_RISE_TIMES * riseTime;
  const settle = (steps: EndSteps, level: number) =>
    latticeSettleTime(steps, level, settleTolerance(settings.band, level, amplitude), sigma, t0);
  const sourceSettle = settle(lattice.source, final.sourceVoltage);
  const loadSettle = settle(lattice.load, final.loadVoltage);
  const settledBy = Math.max(sourceSettle.time, loadSettle.time);
  const duration =
    settings.duration ??
    Math.min(
      Number.isFinite(settledBy) ? 1.2 * settledBy + 2 * line.delay + riseTime : Infinity,
      (2 * (isRinging ? RINGING_ROUND_TRIPS : MAX_DEFAULT_ROUND_TRIPS) + 1) * line.delay,
    );
  const warnings = [...line.warnings];
  const lastFollowed = Math.max(lattice.source.times.at(-1) ?? 0, lattice.load.times.at(-1) ?? 0);
  if (!lattice.isComplete && (lastFollowed < duration || !Number.isFinite(settledBy))) {
    warnings.push(`Only the first ${MAX_ROUND_TRIPS} round trips were followed; later steps are missing.`);
  }
  if (isRinging) warnings.push('|ΓS·ΓL| = 1: the reflections never die out, so the line never settles.');
  const { time } = timeAxis(riseTime, duration, settings.points);
  const end = (steps: EndSteps, level: number, settleTime: number): EndResponse => {
    const { voltage, current } = sampleEnd(time, steps, sigma);
    return { voltage, current, final: level, finalCurrent: final.current, settleTime };
  };
  return {
    time,
    source: end(lattice.source, final.sourceVoltage, sourceSettle.time),
    load: end(lattice.load, final.loadVoltage, loadSettle.time),
    arrivals: arrivalsOf(lattice).filter((arrival) => arrival.time <= duration),
    method: 'lattice',
    reflection: { source: gs, load: gl },
    roundTripsToSettle: loadSettle.stepsBefore,
    warnings,
  };
}

/**
 * Exact settling of one end of the lattice. The levels after each step
 * approach the final value geometrically, so the end is in band for good
 * after the first step whose level and all later ones are in band; with a
 * finite edge the crossing itself is found on the exact waveform. `stepsBefore`
 * is that step's index (at the load, the number of round trips after the first
 * arrival).
 */
function latticeSettleTime(steps: EndSteps, final: number, tolerance: number, sigma: number, t0: number) {
  const isOutside = (v: number) => Math.abs(v - final) > tolerance;
  if (steps.levels.length === 0) return isOutside(0) ? { time: Infinity, stepsBefore: Infinity } : { time: 0, stepsBefore: 0 };
  let lastOutside = steps.levels.length - 1;
  while (lastOutside >= 0 && !isOutside(steps.levels[lastOutside])) lastOutside--;
  if (lastOutside === steps.levels.length - 1) return { time: Infinity, stepsBefore: Infinity };
  if (lastOutside < 0 && !isOutside(0)) return { time: 0, stepsBefore: 0 };
  const next = lastOutside + 1;
  const stepTime = steps.times[next];
  if (sigma === 0) return { time: stepTime, stepsBefore: next };
  const value = (t: number) => voltageAt(t, steps, sigma);
  const endTime = stepTime + EDGE_HALF_WIDTH_SIGMAS * sigma;
  return { time: settleTimeOfFunction(value, final, tolerance, t0, endTime, sigma / 4), stepsBefore: next };
}

/**
 * The frequency-domain solution on `settings.points` samples to `duration`,
 * for the distributed line or (from ladder.ts) any other two-port.
 */
export function frequencyResponse(
  circuit: NormalizedCircuit,
  settings: NormalizedOptions,
  duration: number,
  propagation: Propagation = distributedPropagation(circuit.line),
  method: 'frequency-domain' | 'ladder' = 'frequency-domain',
): StepResponse {
  if (circuit.riseTime === 0) {
    throw new LineInputError(
      'source.riseTime',
      `must be greater than zero for the ${method} solution (a lossy line, a reactive load or a ladder): an ideal step has unlimited bandwidth`,
    );
  }
  const { time, t0, dt } = timeAxis(circuit.riseTime, duration, settings.points);
  const warnings = [...circuit.line.warnings];
  let sigma = circuit.sigma;
  if (sigma < SIGMA_PER_SAMPLE * dt) {
    sigma = SIGMA_PER_SAMPLE * dt;
    warnings.push(
      `The source edge was widened to a 10–90 % rise time of ${riseTimeOfSigma(sigma).toPrecision(3)} s so that ` +
        `${settings.points} samples over ${duration.toPrecision(3)} s resolve it; raise options.points or shorten options.duration.`,
    );
  }
  const waves = frequencyDomainWaveforms(circuit, propagation, sigma, t0, dt, settings.points);
  const final = finalLevels(circuit);
  const end = (voltage: number[], current: number[], level: number): EndResponse => {
    const settleTime = settleTimeOfSamples(time, voltage, level, settleTolerance(settings.band, level, circuit.amplitude));
    return { voltage, current, final: level, finalCurrent: final.current, settleTime };
  };
  const source = end(waves.source.voltage, waves.source.current, final.sourceVoltage);
  const load = end(waves.load.voltage, waves.load.current, final.loadVoltage);
  if (!Number.isFinite(source.settleTime) || !Number.isFinite(load.settleTime)) {
    warnings.push(`The response has not settled within ${duration.toPrecision(3)} s; settleTime is Infinity.`);
  }
  return {
    time,
    source,
    load,
    arrivals: [],
    method,
    reflection: nominalReflections(circuit),
    roundTripsToSettle: null,
    warnings,
  };
}

/**
 * A first guess at the time to settle: the round trips a lattice with the
 * resistive parts would need, plus ln(1/band) + 1 time constants of any load
 * capacitance charging through the larger of Z0 and the source side.
 */
function estimatedDuration(circuit: NormalizedCircuit, band: number): number {
  const { line, load, sourceResistance, riseTime } = circuit;
  const rho = Math.abs(reflectionCoefficient(sourceResistance, line.z0) * reflectionCoefficient(load.resistance, line.z0));
  const roundTrips =
    rho === 0 ? 1 : rho >= 1 ? RINGING_ROUND_TRIPS : Math.ceil(Math.log((band * (1 - rho)) / 2) / Math.log(rho)) + 1;
  const driveResistance = Math.max(line.z0, sourceResistance + line.dcResistance);
  const parallel = (a: number, b: number) => (b === Infinity ? a : (a * b) / (a + b));
  const charging =
    load.capacitance * parallel(driveResistance, load.resistance) +
    (load.seriesRc ? load.seriesRc.capacitance * (load.seriesRc.resistance + parallel(driveResistance, load.resistance)) : 0);
  const trips = Math.min(Math.max(roundTrips, line.isLossless ? 2 : 3), MAX_DEFAULT_ROUND_TRIPS);
  // ln(1/band) time constants bring an exponential within the band; one more for the line's own steps.
  return (2 * trips + 1) * line.delay + (Math.log(1 / band) + 1) * charging + 4 * riseTime;
}
