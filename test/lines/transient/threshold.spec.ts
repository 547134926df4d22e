import { expect } from 'chai';
import { stepResponse, thresholdCrossing, type StepCircuit } from '../../../projects/lines/src/public-api';
import { expectClose } from '../expect-close';

const DELAY = 1e-9;
/** Rs = 5 Ω into an open 50 Ω line: load levels 1.818, 0.331, 1.547 … V (ΓS = −9/11, ΓL = 1; closed form V0(1 + ΓL)Σ(ΓLΓS)^k). */
const ringing: StepCircuit = { source: { amplitude: 1, resistance: 5, riseTime: 0 }, line: { z0: 50, delay: DELAY }, load: 'open' };

describe('transient threshold crossings', () => {
  const response = stepResponse(ringing, { points: 20_001, duration: 40 * DELAY });

  it('the load first crosses 0.7 V at the first arrival, one delay after switch-on', () => {
    const crossing = thresholdCrossing(response, { end: 'load', threshold: 0.7 });
    expect(crossing.direction).to.equal('rising');
    const dt = response.time[1] - response.time[0];
    expect(Math.abs(crossing.firstCrossing! - DELAY)).to.be.at.most(dt);
  });

  it('it stays above 0.7 V only after the ring-back dips end: later than the first crossing, at an arrival time (2k + 1)·delay', () => {
    const crossing = thresholdCrossing(response, { end: 'load', threshold: 0.7 });
    const lastDip = response.arrivals.filter((a) => a.end === 'load' && a.voltage < 0.7).at(-1)!;
    const dt = response.time[1] - response.time[0];
    expectClose(crossing.staysPastFrom!, lastDip.time + 2 * DELAY, dt / (lastDip.time + 2 * DELAY));
    expect(crossing.staysPastFrom!).to.be.above(crossing.firstCrossing!);
  });

  it('a threshold never reached gives null for both times', () => {
    const crossing = thresholdCrossing(response, { end: 'load', threshold: 5, direction: 'rising' });
    expect(crossing.firstCrossing).to.equal(null);
    expect(crossing.staysPastFrom).to.equal(null);
  });

  it('works on currents too: the source current falls below half its initial value at the first return', () => {
    const initial = 1 / 55;
    const crossing = thresholdCrossing(response, { end: 'source', quantity: 'current', threshold: initial / 2, direction: 'falling' });
    const dt = response.time[1] - response.time[0];
    expect(Math.abs(crossing.firstCrossing! - 2 * DELAY)).to.be.at.most(dt);
  });
});
