/**
 * The line as the time-domain solvers see it: nominal Z0 and delay for the
 * lattice, the whole line's series impedance z(s) and shunt admittance y(s)
 * at complex frequency s for the frequency-domain solution and the ladder.
 * Quantities are totals for the whole line, so per-metre
 * values never appear: γℓ = √(z·y) and Zc = √(z/y).
 */
import { calculate } from '../calculate';
import { LineInputError } from '../errors';
import type { LineSpec } from '../types';
import { requireNonNegative, requirePositive } from '../validation';
import type { DirectLine, LossyLine, SpecLine, TransientLine } from './circuit';
import { add, complex, divide, log, multiply, scale, sqrt, type Complex } from './complex';

/**
 * Band edges ω1 = 10⁴ and ω2 = 10¹² rad/s of the wideband dielectric model, the
 * same as dielectric/djordjevic-sarkar.ts uses at real frequencies; here the
 * model is needed at complex s, which that module does not offer.
 */
const DIELECTRIC_LOW_OMEGA = 1e4;
const DIELECTRIC_HIGH_OMEGA = 1e12;
/** Where the one-point fit is trusted, as in dielectric/djordjevic-sarkar.ts [Hz]. */
const DIELECTRIC_VALID_FREQUENCIES = { min: 1e4, max: 1e11 };
/** Knee frequency ≈ 0.35/riseTime: the 3 dB bandwidth of a one-pole system with that 10–90 % time, ln 9/(2π). */
const KNEE_FACTOR = Math.log(9) / (2 * Math.PI);

export interface LineTransfer {
  z0: number;
  delay: number;
  isLossless: boolean;
  /** Series resistance at DC [Ω], for the final (DC) levels. */
  dcResistance: number;
  /** Whole-line series impedance z and shunt admittance y at complex frequency s [1/s]. */
  impedances(s: Complex): { z: Complex; y: Complex };
  warnings: string[];
}

const isSpecLine = (line: TransientLine): line is SpecLine => 'spec' in line;

/** Checks `line` (field paths 'line.…') and builds its transfer description. */
export function lineTransfer(line: TransientLine, riseTime: number): LineTransfer {
  if (typeof line !== 'object' || line === null) throw new LineInputError('line', 'must be an object');
  return isSpecLine(line) ? specLineTransfer(line, riseTime) : directLineTransfer(line as LossyLine);
}

/**
 * A direct line, lossless or with the explicit loss fields.
 * Method: series impedance z(s) = sL + √(R_dc² + 2·R_skin²·s/ω_ref), which is
 *   R_dc at DC and R_skin·√(f/f_ref)·(1 + j) at high frequency: the skin-effect
 *   resistance plus the equal internal reactance of Wheeler's incremental-
 *   inductance rule (Wheeler, Proc. IRE 30, 1942), analytic for Re s > 0 and
 *   so causal. Shunt admittance y(s) = s·C(s) with the wideband Debye
 *   capacitance of A. R. Djordjevic, R. M. Biljić, V. D. Likar-Smiljanić,
 *   T. K. Sarkar, IEEE Trans. EMC 43(4), 2001, pp. 662–667:
 *   C(s) = C∞ + ΔC·ln((ω2 + s)/(ω1 + s))/ln(ω2/ω1), fitted so that at f_ref
 *   C = C_ref·(1 − j·tanδ), C_ref = delay/z0 and L = z0·delay.
 * Valid:  f_ref within 10 kHz … 100 GHz; TEM or quasi-TEM line; ends' own
 *   parasitics ignored.
 */
function directLineTransfer(line: LossyLine): LineTransfer {
  requirePositive('line.z0', line.z0);
  requirePositive('line.delay', line.delay);
  const dcResistance = line.dcResistance ?? 0;
  const skinResistance = line.skinResistance ?? 0;
  const tanDelta = line.tanDelta ?? 0;
  requireNonNegative('line.dcResistance', dcResistance);
  requireNonNegative('line.skinResistance', skinResistance);
  requireNonNegative('line.tanDelta', tanDelta);
  if (tanDelta >= 1) throw new LineInputError('line.tanDelta', 'must be less than 1');
  const hasFrequencyLoss = skinResistance > 0 || tanDelta > 0;
  const warnings: string[] = [];
  let referenceFrequency = 0;
  if (hasFrequencyLoss) {
    if (line.referenceFrequency === undefined) {
      throw new LineInputError('line.referenceFrequency', 'is required with skinResistance or tanDelta');
    }
    requirePositive('line.referenceFrequency', line.referenceFrequency);
    referenceFrequency = line.referenceFrequency;
    if (referenceFrequency < DIELECTRIC_VALID_FREQUENCIES.min || referenceFrequency > DIELECTRIC_VALID_FREQUENCIES.max) {
      warnings.push(
        `line.referenceFrequency = ${referenceFrequency} Hz is outside 10 kHz–100 GHz, the range of the ` +
          'wideband dielectric model (Djordjevic et al. 2001); the loss is less certain.',
      );
    }
  }
  const inductance = line.z0 * line.delay;
  const capacitance = line.delay / line.z0;
  const omegaRef = 2 * Math.PI * referenceFrequency;
  const dielectric = tanDelta > 0 ? wideBandCapacitance(capacitance, tanDelta, omegaRef) : () => complex(capacitance);
  const skinSquaredPerS = omegaRef > 0 ? (2 * skinResistance * skinResistance) / omegaRef : 0;
  return {
    z0: line.z0,
    delay: line.delay,
    isLossless: dcResistance === 0 && !hasFrequencyLoss,
    dcResistance,
    impedances: (s) => ({
      z: add(scale(s, inductance), sqrt(add(complex(dcResistance * dcResistance), scale(s, skinSquaredPerS)))),
      y: multiply(s, dielectric(s)),
    }),
    warnings,
  };
}

/** C(s) of the wideband Debye model (Djordjevic et al. 2001), matched to C_ref(1 − j tanδ) at ω_ref. */
function wideBandCapacitance(referenceCapacitance: number, tanDelta: number, omegaRef: number): (s: Complex) => Complex {
  const w1 = DIELECTRIC_LOW_OMEGA;
  const w2 = DIELECTRIC_HIGH_OMEGA;
  const span = Math.log(w2 / w1);
  const shape = (s: Complex): Complex => scale(log(divide(add(s, complex(w2)), add(s, complex(w1)))), 1 / span);
  const atReference = shape(complex(0, omegaRef));
  const deltaC = (-referenceCapacitance * tanDelta) / atReference.im;
  const cInfinity = referenceCapacitance - deltaC * atReference.re;
  return (s) => add(complex(cInfinity), scale(shape(s), deltaC));
}

/**
 * A line from the calculator. calculate() is called once, at the edge's knee
 * frequency f_k = ln 9/(2π·riseTime) ≈ 0.35/riseTime, and its R, G, L, C there
 * set the explicit lossy model above (√f skin scaling, wideband tanδ). One
 * call instead of one per FFT bin keeps a 4096-point response within a live
 * screen's budget, and the scaling laws make the model causal, which
 * tabulated real-frequency R(f), G(f) are not.
 * Valid:  as the kind's method; LineResult carries no DC resistance, so the
 *   final level ignores the conductors' DC resistance (use a LossyLine with
 *   dcResistance for long thin conductors).
 */
function specLineTransfer(line: SpecLine, riseTime: number): LineTransfer {
  requirePositive('line.length', line.length);
  requirePositive('source.riseTime', riseTime);
  const frequency = KNEE_FACTOR / riseTime;
  const result = calculateWithFieldPath({ ...line.spec, frequency, length: line.length });
  const z0 = Math.sqrt(result.lPerMeter / result.cPerMeter);
  const delay = Math.sqrt(result.lPerMeter * result.cPerMeter) * line.length;
  const tanDelta = (result.gPerMeter ?? 0) / (2 * Math.PI * frequency * result.cPerMeter);
  const transfer = directLineTransfer({
    z0,
    delay,
    skinResistance: (result.rPerMeter ?? 0) * line.length,
    tanDelta,
    referenceFrequency: frequency,
  } satisfies DirectLine & LossyLine);
  transfer.warnings.push(...result.warnings);
  return transfer;
}

/** calculate() names spec fields ('w'); here they sit under 'line.spec.' so an API can point at them. */
function calculateWithFieldPath(spec: LineSpec) {
  try {
    return calculate(spec);
  } catch (error) {
    // Re-thrown with the path from the circuit's root; anything else is not ours to translate.
    if (error instanceof LineInputError) throw new LineInputError(`line.spec.${error.field}`, error.rule);
    throw error;
  }
}
