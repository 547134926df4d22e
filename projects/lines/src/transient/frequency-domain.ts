/**
 * The frequency-domain solution for any line and load: the two-port (ABCD)
 * solution of the telegrapher's equations between source and load
 * impedances, times the edge's spectrum, back to time by an inverse FFT of
 * the numerical Laplace transform.
 */
import { add, complex, divide, exp, multiply, scale, sqrt, subtract, type Complex } from './complex';
import { edgePulseSpectrum } from './edge';
import { inverseFft } from './fft';
import type { LineTransfer } from './line-transfer';
import type { NormalizedCircuit, NormalizedLoad } from './validate-circuit';

/** Aliasing from the FFT's period is damped to e^(−c·T) = 1e−8 of the response. */
const ALIASING_DAMPING = Math.log(1e8);

/** What the two-port solution needs of a line: γℓ and the characteristic impedance at complex frequency s. */
export type Propagation = (s: Complex) => { gammaLength: Complex; zc: Complex };

/** The distributed line: γℓ = √(z·y), Zc = z/γℓ (= √(z/y)) from the whole line's z(s) and y(s). */
export function distributedPropagation(line: LineTransfer): Propagation {
  return (s) => {
    const { z, y } = line.impedances(s);
    const gammaLength = sqrt(multiply(z, y));
    return { gammaLength, zc: divide(z, gammaLength) };
  };
}

export interface EndWaveforms {
  voltage: number[];
  current: number[];
}

/**
 * Waveforms at both ends at t_n = t0 + n·dt, n < count.
 * Method: numerical Laplace transform — the response f(t) = e^(ct)·IFFT[F(c + jω)]
 *   with damping c = ln(1e8)/T over an FFT period T ≥ 2·(count·dt), which
 *   makes the periodic copies of the (non-decaying) step response 1e−8 of it
 *   (L. M. Wedepohl and S. E. T. Mohamed, Proc. IEE 116(9), 1969; review by
 *   P. Moreno and A. Ramirez, IEEE Trans. Power Delivery 23(4), 2008). F is
 *   Vs·E(s)/s times the line's two-port transfer: with P = e^(−γℓ), γℓ = √(zy),
 *   Zc = z/γℓ and the load as ZL = zn/zd, the denominator
 *   D = ½(1+P²)(zn + Zs·zd) + ½(1−P²)(Zc·zd + Zs·zn/Zc) gives
 *   V2 = P·zn/D, I2 = P·zd/D, V1 = [½(1+P²)zn + ½(1−P²)Zc·zd]/D,
 *   I1 = [½(1−P²)zn/Zc + ½(1+P²)zd]/D — the ABCD matrix (cosh, Zc·sinh;
 *   sinh/Zc, cosh) of Pozar, Microwave Engineering, §4.4, multiplied through by
 *   P so that no term overflows on long lossy lines. The window against Gibbs
 *   ripple is the edge's own Gaussian spectrum, which the caller makes at most
 *   1e−14 at the Nyquist frequency by keeping σ ≥ 2.6·dt.
 * Valid:  any passive line and load; error ~1e−8 of the amplitude plus the
 *   line model's own.
 */
export function frequencyDomainWaveforms(
  circuit: NormalizedCircuit,
  propagation: Propagation,
  sigma: number,
  t0: number,
  dt: number,
  count: number,
): { source: EndWaveforms; load: EndWaveforms } {
  const n = nextPowerOfTwo(2 * count);
  const period = n * dt;
  const c = ALIASING_DAMPING / period;
  const spectra = Array.from({ length: 4 }, () => ({ re: new Float64Array(n), im: new Float64Array(n) }));
  const zs = complex(circuit.sourceResistance);
  for (let k = 0; k <= n / 2; k++) {
    const s = complex(c, (2 * Math.PI * k) / period);
    // Vs·E(s)/s, delayed by −t0 so that the FFT's time origin is the first sample.
    const drive = scale(divide(multiply(edgePulseSpectrum(s, sigma), exp(scale(s, t0))), s), circuit.amplitude);
    const ends = twoPort(circuit, propagation(s), s, zs);
    const quantities = [ends.v1, ends.i1, ends.v2, ends.i2];
    for (let q = 0; q < 4; q++) {
      const value = multiply(drive, quantities[q]);
      spectra[q].re[k] = value.re;
      spectra[q].im[k] = value.im;
      if (k > 0 && k < n / 2) {
        spectra[q].re[n - k] = value.re;
        spectra[q].im[n - k] = -value.im;
      }
    }
  }
  const [v1, i1, v2, i2] = spectra.map(({ re, im }) => {
    im[n / 2] = 0; // the Nyquist bin of a real signal is real
    inverseFft(re, im);
    const out = new Array<number>(count);
    for (let i = 0; i < count; i++) out[i] = (re[i] * Math.exp(c * i * dt)) / dt;
    return out;
  });
  return { source: { voltage: v1, current: i1 }, load: { voltage: v2, current: i2 } };
}

/** Voltages and currents at both ends per volt of source, at complex frequency s. */
function twoPort(circuit: NormalizedCircuit, line: { gammaLength: Complex; zc: Complex }, s: Complex, zs: Complex) {
  const { gammaLength, zc } = line;
  const p = exp(scale(gammaLength, -1));
  const p2 = multiply(p, p);
  const even = scale(add(complex(1), p2), 0.5);
  const odd = scale(subtract(complex(1), p2), 0.5);
  const { zn, zd } = loadPair(circuit.load, s);
  const d = add(
    multiply(even, add(zn, multiply(zs, zd))),
    multiply(odd, add(multiply(zc, zd), divide(multiply(zs, zn), zc))),
  );
  return {
    v1: divide(add(multiply(even, zn), multiply(odd, multiply(zc, zd))), d),
    i1: divide(add(multiply(odd, divide(zn, zc)), multiply(even, zd)), d),
    v2: divide(multiply(p, zn), d),
    i2: divide(multiply(p, zd), d),
  };
}

/** The load as ZL = zn/zd: (0, 1) for a short, else (1, YL(s)) with YL = 1/R + sC + sCr/(1 + sRrCr). */
function loadPair(load: NormalizedLoad, s: Complex): { zn: Complex; zd: Complex } {
  if (load.resistance === 0) return { zn: complex(0), zd: complex(1) };
  let admittance = add(complex(1 / load.resistance), scale(s, load.capacitance));
  if (load.seriesRc) {
    const { resistance, capacitance } = load.seriesRc;
    const sc = scale(s, capacitance);
    admittance = add(admittance, divide(sc, add(complex(1), scale(sc, resistance))));
  }
  return { zn: complex(1), zd: admittance };
}

function nextPowerOfTwo(value: number): number {
  let n = 2;
  while (n < value) n *= 2;
  return n;
}
