import { expect } from 'chai';
import { stepResponse, type StepCircuit } from '../../../projects/lines/src/public-api';
import { edge, edgeSigma } from '../../../projects/lines/src/transient/edge';
import { expectClose } from '../expect-close';

/** Lattice levels are sums of a few products: exact to round-off. */
const EXACT = 1e-12;
const Z0 = 50;
const DELAY = 1e-9;

function circuit(sourceResistance: number, load: StepCircuit['load'], riseTime = 0, amplitude = 1): StepCircuit {
  return { source: { amplitude, resistance: sourceResistance, riseTime }, line: { z0: Z0, delay: DELAY }, load };
}

const loadArrivals = (c: StepCircuit) => stepResponse(c).arrivals.filter((a) => a.end === 'load');
const sampleAt = (times: number[], values: number[], t: number) => values[times.findIndex((x) => x >= t)];

describe('transient lattice (stepResponse on a lossless line with resistive ends)', () => {
  it('chooses the lattice method and reports both reflection coefficients (R − Z0)/(R + Z0)', () => {
    const r = stepResponse(circuit(25, { resistance: 100 }));
    expect(r.method).to.equal('lattice');
    expectClose(r.reflection.source, -25 / 75, EXACT);
    expectClose(r.reflection.load!, 50 / 150, EXACT);
  });

  it('with a matched source, the load sees one clean step after one delay and nothing after (Johnson & Graham 1993, series termination)', () => {
    const riseTime = 50e-12;
    const c = circuit(Z0, 'open', riseTime, 2);
    const r = stepResponse(c, { duration: 10 * DELAY });
    const arrivals = loadArrivals(c);
    expect(arrivals).to.have.length(1);
    expectClose(arrivals[0].time, DELAY, EXACT);
    expectClose(arrivals[0].voltage, 2, EXACT);
    // Exact waveform: the incident 1 V doubled at the open end, shaped by the source's edge.
    const sigma = edgeSigma(riseTime);
    r.time.forEach((t, i) => expect(Math.abs(r.load.voltage[i] - 2 * edge(t - DELAY, sigma))).to.be.below(EXACT));
  });

  it('an open load doubles the incident step Vs·Z0/(Rs + Z0) (ΓL = +1)', () => {
    const [first] = loadArrivals(circuit(100, 'open'));
    expectClose(first.voltage, 2 * (Z0 / (100 + Z0)), EXACT);
  });

  it('a short reflects the step inverted: the source end falls by the incident step at 2·delay, the load current doubles (ΓL = −1)', () => {
    const r = stepResponse(circuit(Z0, 'short'));
    const sourceArrival = r.arrivals.find((a) => a.end === 'source')!;
    expectClose(sourceArrival.time, 2 * DELAY, EXACT);
    expectClose(sourceArrival.voltage, 0, EXACT);
    expect(Math.max(...r.load.voltage.map(Math.abs))).to.equal(0);
    expectClose(sampleAt(r.time, r.load.current, 1.5 * DELAY), (2 * 0.5) / Z0, EXACT);
  });

  for (const [rs, rl] of [
    [10, 1000],
    [75, 20],
    [0, 33],
    [200, 50],
  ]) {
    it(`the final value is Vs·RL/(Rs + RL) (Ohm's law at DC) — Rs = ${rs} Ω, RL = ${rl} Ω`, () => {
      const r = stepResponse(circuit(rs, { resistance: rl }, 20e-12, 3.3), { duration: 400 * DELAY });
      expectClose(r.load.final, (3.3 * rl) / (rs + rl), EXACT);
      expectClose(r.source.final, (3.3 * rl) / (rs + rl), EXACT);
      expectClose(r.load.finalCurrent, 3.3 / (rs + rl), EXACT);
      expectClose(r.load.voltage.at(-1)!, r.load.final, 1e-9);
    });
  }

  it('arrival levels equal the geometric series V0(1 + ΓL)·Σ(ΓLΓS)^k at the load and V0 + V0(1 + ΓS)ΓL·Σ(ΓLΓS)^k at the source (closed forms, REFERENCES: Time domain)', () => {
    const rs = 15;
    const rl = 400;
    const gs = (rs - Z0) / (rs + Z0);
    const gl = (rl - Z0) / (rl + Z0);
    const v0 = Z0 / (rs + Z0);
    const rho = gs * gl;
    const r = stepResponse(circuit(rs, { resistance: rl }));
    const load = r.arrivals.filter((a) => a.end === 'load');
    const source = r.arrivals.filter((a) => a.end === 'source');
    load.slice(0, 20).forEach((a, n) => {
      expectClose(a.time, (2 * n + 1) * DELAY, EXACT);
      expectClose(a.voltage, (v0 * (1 + gl) * (1 - rho ** (n + 1))) / (1 - rho), EXACT);
    });
    source.slice(0, 20).forEach((a, n) => {
      expectClose(a.time, 2 * (n + 1) * DELAY, EXACT);
      expectClose(a.voltage, v0 + (v0 * (1 + gs) * gl * (1 - rho ** (n + 1))) / (1 - rho), EXACT);
    });
  });

  it('settles after the round trip the closed form predicts, at that arrival’s time for an ideal step', () => {
    const rs = 5;
    const rl = 1e4;
    const band = 0.02;
    const gs = (rs - Z0) / (rs + Z0);
    const gl = (rl - Z0) / (rl + Z0);
    const rho = gs * gl;
    const v0 = Z0 / (rs + Z0);
    const final = rl / (rs + rl);
    // Level after arrival n deviates by V0(1 + ΓL)ρ^(n+1)/(1 − ρ) from the final value.
    let n = 0;
    while (Math.abs((v0 * (1 + gl) * rho ** (n + 1)) / (1 - rho)) > band * final) n++;
    const r = stepResponse(circuit(rs, { resistance: rl }), { band });
    expect(r.roundTripsToSettle).to.equal(n);
    expectClose(r.load.settleTime, (2 * n + 1) * DELAY, EXACT);
  });

  it('a finite edge settles later than the ideal step by less than one rise time (the band is entered on the edge)', () => {
    const ideal = stepResponse(circuit(25, { resistance: 100 }));
    const finite = stepResponse(circuit(25, { resistance: 100 }, 100e-12));
    expect(finite.load.settleTime).to.be.within(ideal.load.settleTime - 100e-12, ideal.load.settleTime + 100e-12);
  });

  it('obeys Kirchhoff at the source on every sample: v_source + Rs·i_source = Vs·E(t)', () => {
    const riseTime = 80e-12;
    const r = stepResponse(circuit(30, { resistance: 300 }, riseTime, 1.8));
    const sigma = edgeSigma(riseTime);
    r.time.forEach((t, i) => {
      expect(Math.abs(r.source.voltage[i] + 30 * r.source.current[i] - 1.8 * edge(t, sigma))).to.be.below(1e-12);
    });
  });

  it('never settles when |ΓS·ΓL| = 1 (zero-resistance source into an open line) and says so', () => {
    const r = stepResponse(circuit(0, 'open', 10e-12));
    expect(r.load.settleTime).to.equal(Infinity);
    expect(r.warnings.join(' ')).to.match(/never settles/);
  });

  it('reproduces the lattice-diagram example Vg = 12 V, Rg = 4·Z0, RL = 2·Z0 (Ulaby, Fundamentals of Applied Electromagnetics, transients section — recalled from memory, not checked against the text): 3.2 V, 3.68 V, 3.84 V, 3.936 V → 4 V', () => {
    // Cross-check by the closed form: V1+ = 12·Z0/(5·Z0) = 2.4 V, ΓL = 1/3, Γg = 3/5.
    const c = circuit(4 * Z0, { resistance: 2 * Z0 }, 0, 12);
    const r = stepResponse(c);
    const expected = [3.2, 3.68, 3.84, 3.936];
    expected.forEach((level, i) => expectClose(r.arrivals[i].voltage, level, EXACT));
    expect(r.arrivals.slice(0, 4).map((a) => a.end)).to.deep.equal(['load', 'source', 'load', 'source']);
    expectClose(r.load.final, 4, EXACT);
    expectClose(2.4 * (4 / 3) + 2.4 * (4 / 3) * (1 / 5), 3.84, EXACT);
  });
});
