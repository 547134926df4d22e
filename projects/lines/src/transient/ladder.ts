/**
 * An N-section lumped ladder of the line, to show how many sections a lumped
 * (SPICE-style) model needs before its step response matches the distributed
 * line.
 */
import { LineInputError } from '../errors';
import type { StepCircuit, StepOptions, StepResponse } from './circuit';
import { add, complex, divide, log, multiply, scale, sqrt, type Complex } from './complex';
import { settleTolerance } from './final-levels';
import type { Propagation } from './frequency-domain';
import type { LineTransfer } from './line-transfer';
import { frequencyResponse, stepResponse } from './step-response';
import { normalizeCircuit, normalizeOptions } from './validate-circuit';

/** More sections than this show nothing new on any screen. */
export const MAX_LADDER_SECTIONS = 10_000;

/**
 * The cascade of N identical symmetric Π sections (shunt y/2N, series z/N,
 * shunt y/2N, with z(s), y(s) the whole line's series impedance and shunt
 * admittance) as one two-port.
 * Method: image-parameter theory of periodic structures — N identical
 *   symmetric reciprocal sections have ABCD = [cosh Nθ, Zi·sinh Nθ;
 *   sinh Nθ/Zi, cosh Nθ] with cosh θ = A = 1 + Z·Y/2, so θ = 2·asinh(√(Z·Y/4))
 *   and Zi = B/sinh θ = Z/sinh θ (Z = z/N, Y = y/N; D. M. Pozar, Microwave
 *   Engineering, ch. 8, periodic structures and image parameters). Exact for
 *   the lumped network, so the response has no time-stepping error and the
 *   difference from the line is the lumping alone.
 * Valid:  any N ≥ 1; as N → ∞, Nθ → √(zy) and Zi → √(z/y), the distributed line.
 */
export function ladderPropagation(line: LineTransfer, sections: number): Propagation {
  return (s) => {
    const { z, y } = line.impedances(s);
    const zSection = scale(z, 1 / sections);
    const quarter = scale(multiply(zSection, y), 1 / (4 * sections));
    const w = sqrt(quarter);
    const theta = scale(asinh(w), 2);
    // sinh θ = 2·sinh(θ/2)·cosh(θ/2) = 2w·√(1 + w²).
    const sinhTheta = scale(multiply(w, sqrt(add(complex(1), multiply(w, w)))), 2);
    return { gammaLength: scale(theta, sections), zc: divide(zSection, sinhTheta) };
  };
}

/** asinh w = ln(w + √(w² + 1)), principal branch; Re w ≥ 0 here, so no cancellation. */
function asinh(w: Complex): Complex {
  return log(add(w, sqrt(add(multiply(w, w), complex(1)))));
}

/**
 * Step response with the line replaced by `sections` Π sections, same source
 * and load, solved like the distributed line in the frequency domain
 * (frequency-domain.ts) so the two differ only by the lumping.
 * Valid:  riseTime > 0; shown over the distributed line's window by default.
 */
export function ladderStepResponse(circuit: StepCircuit, sections: number, options?: StepOptions): StepResponse {
  requireSections(sections);
  const normalized = normalizeCircuit(circuit);
  const settings = normalizeOptions(options);
  // Shown over the window the distributed line needs, so the two compare sample by sample.
  const duration = settings.duration ?? stepResponse(circuit, options).time.at(-1)!;
  return frequencyResponse(normalized, settings, duration, ladderPropagation(normalized.line, sections), 'ladder');
}

export interface LadderError {
  sections: number;
  /** Largest |v_ladder − v_line| at the load over the window, as a fraction of the final value (of the amplitude when that is 0). */
  maxError: number;
  /** RMS of the same difference, same scale. */
  rmsError: number;
  /** The ladder's load settling time [s], beside `referenceSettleTime` of the line. */
  settleTime: number;
  referenceSettleTime: number;
}

/**
 * The ladder's load-voltage error against the distributed solution
 * (stepResponse) for each section count, on the same time samples.
 * Valid:  as ladderStepResponse; the error falls towards 0 as N grows once the
 *   section delay is well below the rise time (roughly as 1/N²).
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
      maxError: max / scale,
      rmsError: Math.sqrt(sumSquares / ladder.load.voltage.length) / scale,
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
