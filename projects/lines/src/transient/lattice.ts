/**
 * The exact lattice (bounce-diagram) solution for a lossless line between
 * resistive ends: every wave is the source's edge, delayed by a multiple of
 * the one-way delay and scaled by the reflection coefficients it has met.
 */
import type { Arrival } from './circuit';
import { edge, EDGE_HALF_WIDTH_SIGMAS } from './edge';
import { isResistiveLoad, type NormalizedCircuit } from './validate-circuit';

/** Waves smaller than this fraction of the first one are dropped: they are below double precision of any level. */
const NEGLIGIBLE_WAVE = 1e-16;

/** The steps seen at one end, in time order. */
export interface EndSteps {
  /** 50 %-point times [s]. */
  times: number[];
  voltageSteps: number[];
  currentSteps: number[];
  /** Voltage after each step [V] (running sum of voltageSteps). */
  levels: number[];
}

export interface Lattice {
  reflectionSource: number;
  reflectionLoad: number;
  /** First wave launched into the line, Vs·Z0/(Rs + Z0) [V]. */
  incidentStep: number;
  source: EndSteps;
  load: EndSteps;
  /** True when the waves died out (or were followed) up to the requested time. */
  isComplete: boolean;
}

/** Reflection coefficient (R − Z0)/(R + Z0) of a resistance R at a line end; open (Infinity) is +1. */
export function reflectionCoefficient(resistance: number, z0: number): number {
  return resistance === Infinity ? 1 : (resistance - z0) / (resistance + z0);
}

/** ΓS and ΓL from the nominal Z0 (ΓL null for a reactive load), as every method reports them. */
export function nominalReflections(circuit: NormalizedCircuit): { source: number; load: number | null } {
  const { z0 } = circuit.line;
  return {
    source: reflectionCoefficient(circuit.sourceResistance, z0),
    load: isResistiveLoad(circuit.load) ? reflectionCoefficient(circuit.load.resistance, z0) : null,
  };
}

/**
 * Follows the waves back and forth until `endTime` or until they vanish.
 * Method: lattice (bounce) diagram — a wave f reaching the load adds
 *   f·(1 + ΓL) to its voltage and f·(1 − ΓL)/Z0 to its current and returns as
 *   ΓL·f; at the source the same with ΓS (H. W. Johnson and M. Graham,
 *   High-Speed Digital Design, 1993, ch. 4; Ulaby, Fundamentals of Applied
 *   Electromagnetics, transients section). The first wave is Vs·Z0/(Rs + Z0).
 * Valid:  lossless line, frequency-independent resistive ends; exact.
 *   At most `maxSteps` steps per end are followed (isComplete says whether
 *   that reached `endTime`).
 */
export function bounce(
  amplitude: number,
  sourceResistance: number,
  z0: number,
  delay: number,
  loadResistance: number,
  endTime: number,
  maxSteps: number,
): Lattice {
  const gs = reflectionCoefficient(sourceResistance, z0);
  const gl = reflectionCoefficient(loadResistance, z0);
  const incidentStep = (amplitude * z0) / (sourceResistance + z0);
  const source = emptySteps();
  const load = emptySteps();
  pushStep(source, 0, incidentStep, incidentStep / z0);
  let forward = incidentStep;
  let isComplete = false;
  for (let k = 0; k < maxSteps; k++) {
    const loadTime = (2 * k + 1) * delay;
    if (loadTime > endTime || Math.abs(forward) <= NEGLIGIBLE_WAVE * Math.abs(incidentStep)) {
      isComplete = true;
      break;
    }
    const backward = gl * forward;
    pushStep(load, loadTime, forward + backward, (forward - backward) / z0);
    const sourceTime = loadTime + delay;
    forward = gs * backward;
    if (sourceTime <= endTime && backward !== 0) {
      pushStep(source, sourceTime, backward + forward, (forward - backward) / z0);
    }
  }
  return { reflectionSource: gs, reflectionLoad: gl, incidentStep, source, load, isComplete };
}

function emptySteps(): EndSteps {
  return { times: [], voltageSteps: [], currentSteps: [], levels: [] };
}

function pushStep(steps: EndSteps, time: number, voltage: number, current: number): void {
  const before = steps.levels.length > 0 ? steps.levels[steps.levels.length - 1] : 0;
  steps.times.push(time);
  steps.voltageSteps.push(voltage);
  steps.currentSteps.push(current);
  steps.levels.push(before + voltage);
}

/** Both ends' steps merged in time order, as the contract's `arrivals`. */
export function arrivalsOf(lattice: Lattice): Arrival[] {
  const list: Arrival[] = [];
  const { source, load } = lattice;
  // The source's step at t = 0 is the switch-on, not an arrival; arrivals start with the first reflection.
  let i = 1;
  let j = 0;
  while (i < source.times.length || j < load.times.length) {
    if (j >= load.times.length || (i < source.times.length && source.times[i] < load.times[j])) {
      list.push({ time: source.times[i], end: 'source', voltage: source.levels[i++] });
    } else {
      list.push({ time: load.times[j], end: 'load', voltage: load.levels[j++] });
    }
  }
  return list;
}

/**
 * Voltage and current of one end at sorted sample times: Σ step_k·E(t − t_k)
 * with E the erf edge of width σ (edge.ts). Steps more than 8σ in the past
 * count fully, so each sample costs only the steps whose edges overlap it,
 * and each edge is evaluated once for both quantities.
 */
export function sampleEnd(times: number[], steps: EndSteps, sigma: number): { voltage: number[]; current: number[] } {
  const halfWidth = EDGE_HALF_WIDTH_SIGMAS * sigma;
  const { times: stepTimes, voltageSteps, currentSteps } = steps;
  const voltage = new Float64Array(times.length);
  const current = new Float64Array(times.length);
  let done = 0;
  let doneVoltage = 0;
  let doneCurrent = 0;
  for (let i = 0; i < times.length; i++) {
    const t = times[i];
    while (done < stepTimes.length && stepTimes[done] < t - halfWidth) {
      doneVoltage += voltageSteps[done];
      doneCurrent += currentSteps[done++];
    }
    let v = doneVoltage;
    let c = doneCurrent;
    for (let k = done; k < stepTimes.length && stepTimes[k] <= t + halfWidth; k++) {
      const weight = edge(t - stepTimes[k], sigma);
      v += voltageSteps[k] * weight;
      c += currentSteps[k] * weight;
    }
    voltage[i] = v;
    current[i] = c;
  }
  return { voltage: Array.from(voltage), current: Array.from(current) };
}

/** The voltage of one end at time t, for root refinement: the level before the edges around t plus their partial steps. */
export function voltageAt(t: number, steps: EndSteps, sigma: number): number {
  const halfWidth = EDGE_HALF_WIDTH_SIGMAS * sigma;
  const first = firstIndexAtOrAfter(steps.times, t - halfWidth);
  let value = first > 0 ? steps.levels[first - 1] : 0;
  for (let k = first; k < steps.times.length && steps.times[k] <= t + halfWidth; k++) {
    value += steps.voltageSteps[k] * edge(t - steps.times[k], sigma);
  }
  return value;
}

/** Binary search: the first index whose time is ≥ t. */
function firstIndexAtOrAfter(times: number[], t: number): number {
  let lo = 0;
  let hi = times.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (times[mid] < t) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}
