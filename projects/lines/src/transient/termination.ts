/**
 * Termination advisor: for the given driver, line and load, the four classic
 * ways of matching the line and what each does to settling, level and power.
 * Schemes as described by H. W. Johnson and M. Graham, High-Speed Digital
 * Design, 1993, ch. 6 (terminations).
 */
import { LineInputError } from '../errors';
import { requireFinite } from '../validation';
import type { StepCircuit, StepOptions, StepResponse, TransientLoad } from './circuit';
import { settleTolerance } from './final-levels';
import { settleTimeOfSamples } from './settle';
import { stepResponse } from './step-response';
import { normalizeCircuit, normalizeOptions } from './validate-circuit';

/**
 * RC termination time constant in round trips (2·delay). Common practice, no
 * source: RC must be long against the round trip so the capacitor looks like
 * a short while reflections would arrive; 3 round trips is a usual compromise
 * against the slower final charging (and larger C) that a longer one costs.
 */
export const RC_ROUND_TRIPS = 3;

export type TerminationScheme = 'none' | 'series' | 'parallel' | 'thevenin' | 'rc';

export interface TerminationOptions extends StepOptions {
  /** Thevenin pull-up supply [V]; default the source amplitude. */
  supplyVoltage?: number;
  /** Thevenin bias (open-circuit) level [V]; default half the supply. */
  biasVoltage?: number;
}

export interface TerminationAdvice {
  scheme: TerminationScheme;
  isApplicable: boolean;
  /** Why a scheme does not apply (e.g. the driver already exceeds Z0 for series). */
  reason?: string;
  /** Part values [Ω, F, V]: whichever the scheme uses. */
  components: {
    seriesResistance?: number;
    resistance?: number;
    capacitance?: number;
    pullUpResistance?: number;
    pullDownResistance?: number;
    supplyVoltage?: number;
    biasVoltage?: number;
  };
  /** Load settling time with the termination fitted [s] (Infinity if it never settles). */
  settleTime: number;
  /** Load voltage with the source high (its final DC level) [V]. */
  finalLevel: number;
  /** Load voltage with the source at 0 V [V] (non-zero only for Thevenin). */
  lowLevel: number;
  /**
   * DC power in the termination's resistors [W] with the source high, with it
   * low, and their mean (a 50 % duty square wave, transients ignored). The RC
   * termination dissipates no DC power; toggling at f it takes about C·ΔV²·f.
   */
  powerHigh: number;
  powerLow: number;
  averagePower: number;
  response: StepResponse | null;
}

/**
 * Method: each termination is fitted to the nominal Z0 and the circuit is
 *   solved again with stepResponse(): series Rt = Z0 − Rs at the driver;
 *   parallel Rt = Z0 at the load; Thevenin R1 = Z0·Vcc/Vb to the supply and
 *   R2 = Z0·Vcc/(Vcc − Vb) to ground (R1 ∥ R2 = Z0, open-circuit level Vb),
 *   solved as the parallel case plus its DC bias by superposition; RC with
 *   R = Z0 and C = 3 round trips/Z0 (RC_ROUND_TRIPS).
 * Valid:  as stepResponse; the series scheme needs Rs < Z0.
 */
export function adviseTermination(circuit: StepCircuit, options: TerminationOptions = {}): TerminationAdvice[] {
  const normalized = normalizeCircuit(circuit);
  const { band } = normalizeOptions(options);
  const { z0, delay, dcResistance } = normalized.line;
  const { amplitude, sourceResistance: rs } = normalized;
  const stepOptions: StepOptions = { duration: options.duration, band, points: options.points };
  const base = loadFields(circuit.load);
  const rl = normalized.load.resistance;
  const solve = (c: StepCircuit) => stepResponse(c, stepOptions);
  const summary = (response: StepResponse) => ({
    settleTime: response.load.settleTime,
    finalLevel: response.load.final,
    lowLevel: 0,
    response,
  });
  const power = (high: number) => ({ powerHigh: high, powerLow: 0, averagePower: high / 2 });

  const none: TerminationAdvice = { scheme: 'none', isApplicable: true, components: {}, ...summary(solve(circuit)), ...power(0) };

  let series: TerminationAdvice;
  if (rs < z0) {
    const seriesResistance = z0 - rs;
    const response = solve({ ...circuit, source: { ...circuit.source, resistance: z0 } });
    series = {
      scheme: 'series',
      isApplicable: true,
      components: { seriesResistance },
      ...summary(response),
      ...power(response.load.finalCurrent ** 2 * seriesResistance),
    };
  } else {
    series = notApplicable('series', `the driver's ${rs} Ω already equals or exceeds Z0 = ${z0.toPrecision(4)} Ω`);
  }

  const parallelLoad = { ...base, resistance: parallel(rl, z0) };
  const parallelResponse = solve({ ...circuit, load: parallelLoad });
  const parallelAdvice: TerminationAdvice = {
    scheme: 'parallel',
    isApplicable: true,
    components: { resistance: z0 },
    ...summary(parallelResponse),
    ...power(parallelResponse.load.final ** 2 / z0),
  };

  const thevenin = theveninAdvice(options, amplitude, z0, rl, rs, dcResistance, band, parallelResponse);

  const capacitance = (RC_ROUND_TRIPS * 2 * delay) / z0;
  const rcResponse = solve({ ...circuit, load: { ...base, seriesRc: { resistance: z0, capacitance } } });
  const rc: TerminationAdvice = {
    scheme: 'rc',
    isApplicable: true,
    components: { resistance: z0, capacitance },
    ...summary(rcResponse),
    ...power(0),
  };

  return [none, series, parallelAdvice, thevenin, rc];
}

/** Thevenin: the parallel case's dynamics on top of the DC bias the divider sets with the source low. */
function theveninAdvice(
  options: TerminationOptions,
  amplitude: number,
  z0: number,
  rl: number,
  rs: number,
  dcResistance: number,
  band: number,
  parallelResponse: StepResponse,
): TerminationAdvice {
  const supply = options.supplyVoltage ?? amplitude;
  requireFinite('options.supplyVoltage', supply);
  if (supply <= 0) return notApplicable('thevenin', 'needs a positive supply voltage (options.supplyVoltage)');
  const bias = options.biasVoltage ?? supply / 2;
  requireFinite('options.biasVoltage', bias);
  if (!(bias > 0 && bias < supply)) {
    throw new LineInputError('options.biasVoltage', 'must lie between 0 and the supply voltage');
  }
  const pullUp = (z0 * supply) / bias;
  const pullDown = (z0 * supply) / (supply - bias);
  // With the source low the divider (Vb behind Z0) drives RL ∥ (Rs + R_line) through the line.
  const rest = parallel(rl, rs + dcResistance);
  const low = rest === Infinity ? bias : (bias * rest) / (z0 + rest);
  const sourceLow = rest === Infinity ? bias : (low * rs) / (rs + dcResistance);
  const shifted = parallelResponse.load.voltage.map((v) => v + low);
  const final = parallelResponse.load.final + low;
  const divider = (v: number) => (supply - v) ** 2 / pullUp + v ** 2 / pullDown;
  const settleTime = settleTimeOfSamples(parallelResponse.time, shifted, final, settleTolerance(band, final, amplitude));
  const powerHigh = divider(final);
  const powerLow = divider(low);
  return {
    scheme: 'thevenin',
    isApplicable: true,
    components: { pullUpResistance: pullUp, pullDownResistance: pullDown, supplyVoltage: supply, biasVoltage: bias },
    settleTime,
    finalLevel: final,
    lowLevel: low,
    powerHigh,
    powerLow,
    averagePower: (powerHigh + powerLow) / 2,
    response: {
      ...parallelResponse,
      source: {
        ...parallelResponse.source,
        voltage: parallelResponse.source.voltage.map((v) => v + sourceLow),
        final: parallelResponse.source.final + sourceLow,
      },
      load: { ...parallelResponse.load, voltage: shifted, final, settleTime },
      arrivals: parallelResponse.arrivals.map((a) => ({ ...a, voltage: a.voltage + (a.end === 'load' ? low : sourceLow) })),
    },
  };
}

function notApplicable(scheme: TerminationScheme, reason: string): TerminationAdvice {
  return {
    scheme,
    isApplicable: false,
    reason,
    components: {},
    settleTime: Infinity,
    finalLevel: 0,
    lowLevel: 0,
    powerHigh: 0,
    powerLow: 0,
    averagePower: 0,
    response: null,
  };
}

/** The load as an object so a termination can be added to it. */
function loadFields(load: TransientLoad): Exclude<TransientLoad, string> {
  if (load === 'open') return {};
  if (load === 'short') return { resistance: 0 };
  return load;
}

/** a ∥ b with Infinity as an open. */
function parallel(a: number, b: number): number {
  if (a === Infinity) return b;
  if (b === Infinity) return a;
  return (a * b) / (a + b);
}
