import { expect } from 'chai';
import { adviseTermination, LineInputError, RC_ROUND_TRIPS, type StepCircuit, type TerminationAdvice } from '../../../projects/lines/src/public-api';
import { expectClose } from '../expect-close';

const EXACT = 1e-12;
const Z0 = 50;
const DELAY = 1e-9;
const AMPLITUDE = 3.3;
/** A strong driver (5 Ω) into an unterminated CMOS input: the textbook ringing case (Johnson & Graham 1993, ch. 6). */
const ringing: StepCircuit = {
  source: { amplitude: AMPLITUDE, resistance: 5, riseTime: 200e-12 },
  line: { z0: Z0, delay: DELAY },
  load: 'open',
};

const byScheme = (advice: TerminationAdvice[], scheme: TerminationAdvice['scheme']) => advice.find((a) => a.scheme === scheme)!;

describe('transient termination advisor', () => {
  const advice = adviseTermination(ringing);

  it('offers none, series, parallel, Thevenin and RC, in that order', () => {
    expect(advice.map((a) => a.scheme)).to.deep.equal(['none', 'series', 'parallel', 'thevenin', 'rc']);
  });

  it('series: Rt = Z0 − Rs, the load sees one clean step at one delay and ends at the full amplitude (no DC current into an open load)', () => {
    const series = byScheme(advice, 'series');
    expectClose(series.components.seriesResistance!, Z0 - 5, EXACT);
    expect(series.response!.roundTripsToSettle).to.equal(0);
    expect(series.settleTime).to.be.within(DELAY, DELAY + 200e-12);
    expectClose(series.finalLevel, AMPLITUDE, EXACT);
    expect(series.powerHigh).to.equal(0);
  });

  it('parallel: Rt = Z0 at the load, final Vs·Z0/(Rs + Z0) and DC power V²/Z0 with the source high (Ohm’s law)', () => {
    const parallel = byScheme(advice, 'parallel');
    const final = (AMPLITUDE * Z0) / (5 + Z0);
    expectClose(parallel.components.resistance!, Z0, EXACT);
    expectClose(parallel.finalLevel, final, EXACT);
    expectClose(parallel.powerHigh, final ** 2 / Z0, EXACT);
    expectClose(parallel.averagePower, final ** 2 / Z0 / 2, EXACT);
  });

  it('Thevenin: R1 ∥ R2 = Z0 and the divider’s open-circuit level is the bias, Vcc·R2/(R1 + R2) (voltage divider)', () => {
    const thevenin = byScheme(advice, 'thevenin');
    const { pullUpResistance: r1, pullDownResistance: r2, supplyVoltage, biasVoltage } = thevenin.components;
    expectClose((r1! * r2!) / (r1! + r2!), Z0, EXACT);
    expectClose((supplyVoltage! * r2!) / (r1! + r2!), biasVoltage!, EXACT);
    // Source low: the bias behind Z0 into Rs gives Vb·Rs/(Z0 + Rs); high adds the parallel case's level.
    expectClose(thevenin.lowLevel, (biasVoltage! * 5) / (Z0 + 5), EXACT);
    expectClose(thevenin.finalLevel, thevenin.lowLevel + (AMPLITUDE * Z0) / (5 + Z0), EXACT);
    const power = (v: number) => (supplyVoltage! - v) ** 2 / r1! + v ** 2 / r2!;
    expectClose(thevenin.powerHigh, power(thevenin.finalLevel), EXACT);
    expectClose(thevenin.powerLow, power(thevenin.lowLevel), EXACT);
  });

  it(`RC: R = Z0 and RC = ${RC_ROUND_TRIPS} round trips (common practice, no source); no DC power and the full final level`, () => {
    const rc = byScheme(advice, 'rc');
    expectClose(rc.components.resistance!, Z0, EXACT);
    expectClose(rc.components.resistance! * rc.components.capacitance!, RC_ROUND_TRIPS * 2 * DELAY, EXACT);
    expect(rc.averagePower).to.equal(0);
    expectClose(rc.finalLevel, AMPLITUDE, EXACT);
    expect(rc.response!.method).to.equal('frequency-domain');
  });

  it('every termination settles sooner than the unterminated ringing line', () => {
    const none = byScheme(advice, 'none').settleTime;
    for (const scheme of ['series', 'parallel', 'thevenin', 'rc'] as const) {
      expect(byScheme(advice, scheme).settleTime, scheme).to.be.below(none);
    }
  });

  it('marks series as not applicable when the driver already exceeds Z0', () => {
    const weak = adviseTermination({ ...ringing, source: { ...ringing.source, resistance: 80 } });
    const series = byScheme(weak, 'series');
    expect(series.isApplicable).to.equal(false);
    expect(series.reason).to.match(/exceeds Z0/);
  });

  it('refuses a Thevenin bias outside 0 … supply', () => {
    expect(() => adviseTermination(ringing, { supplyVoltage: 3.3, biasVoltage: 4 }))
      .to.throw(LineInputError)
      .with.property('field', 'options.biasVoltage');
  });
});
