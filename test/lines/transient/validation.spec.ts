import { expect } from 'chai';
import { LineInputError, stepResponse, type StepCircuit, type StepOptions } from '../../../projects/lines/src/public-api';

const good: StepCircuit = {
  source: { amplitude: 1, resistance: 25, riseTime: 100e-12 },
  line: { z0: 50, delay: 1e-9 },
  load: { resistance: 100 },
};

function expectFieldError(circuit: unknown, options: StepOptions | undefined, field: string, rule?: RegExp): void {
  let caught: unknown;
  try {
    stepResponse(circuit as StepCircuit, options);
  } catch (error) {
    caught = error;
  }
  expect(caught, `expected a LineInputError for ${field}`).to.be.instanceOf(LineInputError);
  expect((caught as LineInputError).field).to.equal(field);
  if (rule) expect((caught as LineInputError).rule).to.match(rule);
}

describe('transient input checks', () => {
  it('a negative or zero delay names line.delay', () => {
    expectFieldError({ ...good, line: { z0: 50, delay: -1e-9 } }, undefined, 'line.delay');
    expectFieldError({ ...good, line: { z0: 50, delay: 0 } }, undefined, 'line.delay');
  });

  it('a zero rise time is an ideal step on the lattice path', () => {
    const r = stepResponse({ ...good, source: { ...good.source, riseTime: 0 } });
    expect(r.method).to.equal('lattice');
  });

  it('a zero rise time with a reactive load (no cap on bandwidth) names source.riseTime', () => {
    expectFieldError(
      { ...good, source: { ...good.source, riseTime: 0 }, load: { capacitance: 1e-12 } },
      undefined,
      'source.riseTime',
      /unlimited bandwidth/,
    );
  });

  it('absurd point counts name options.points (16 … 65 536 whole numbers)', () => {
    for (const points of [1e9, 65_537, 8, 100.5, Number.NaN]) expectFieldError(good, { points }, 'options.points');
  });

  it('names each impossible field by its path', () => {
    const cases: [unknown, StepOptions | undefined, string][] = [
      [{ ...good, source: { ...good.source, amplitude: Number.NaN } }, undefined, 'source.amplitude'],
      [{ ...good, source: { ...good.source, resistance: -1 } }, undefined, 'source.resistance'],
      [{ ...good, source: { ...good.source, riseTime: -1e-12 } }, undefined, 'source.riseTime'],
      [{ ...good, line: { z0: 0, delay: 1e-9 } }, undefined, 'line.z0'],
      [{ ...good, line: { z0: 50, delay: 1e-9, tanDelta: 0.02 } }, undefined, 'line.referenceFrequency'],
      [{ ...good, line: { spec: { kind: 'coax', d: 1e-3, D: 3e-3, er: 2.25 }, length: -2 } }, undefined, 'line.length'],
      [{ ...good, load: { resistance: -5 } }, undefined, 'load.resistance'],
      [{ ...good, load: { capacitance: -1e-12 } }, undefined, 'load.capacitance'],
      [{ ...good, load: 'matched' }, undefined, 'load'],
      [good, { duration: -1 }, 'options.duration'],
      [good, { band: 1.5 }, 'options.band'],
      [{ ...good, load: { capacitance: 1e-12 } }, { method: 'lattice' }, 'options.method'],
    ];
    for (const [circuit, options, field] of cases) expectFieldError(circuit, options, field);
  });

  it('a calculator spec error is reported under line.spec', () => {
    let caught: unknown;
    try {
      stepResponse({ ...good, line: { spec: { kind: 'coax', d: 3e-3, D: 1e-3, er: 2.25 }, length: 1 } });
    } catch (error) {
      caught = error;
    }
    expect(caught).to.be.instanceOf(LineInputError);
    expect((caught as LineInputError).field).to.match(/^line\.spec\./);
  });

  it('a short driven through zero resistance has no finite final current and says so', () => {
    expectFieldError({ ...good, source: { ...good.source, resistance: 0 }, load: 'short' }, undefined, 'load', /no finite final current/);
  });
});
