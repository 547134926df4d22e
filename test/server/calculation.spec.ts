/** The API's solve, sweep, tolerance and compare give the shared library's numbers for the same input. */
import { expect } from 'chai';
import request from 'supertest';
import { calculate, solve, sweep, tolerance, type MicrostripSpec } from '@linewright/lines';
import { testApp } from './test-app';

const api = () => request(testApp().app);
const microstrip: MicrostripSpec = { kind: 'microstrip', w: 0.3e-3, h: 0.17e-3, t: 34.8e-6, er: 4.2 };

describe('POST /api/v1/solve', () => {
  it('finds the width for 50 Ω equal to the library, from unit strings', async () => {
    const response = await api().post('/api/v1/solve').send({ spec: { ...microstrip, w: '0.3 mm' }, unknown: 'w', target: { quantity: 'z0', value: 50 } }).expect(200);
    const expected = solve(microstrip, 'w', { quantity: 'z0', value: 50 });
    expect(response.body.value).to.equal(expected.value);
    expect(response.body.result.z0).to.equal(expected.result.z0);
  });
});

describe('POST /api/v1/sweep', () => {
  it('gives the library series for a width sweep given in mm', async () => {
    const response = await api().post('/api/v1/sweep').send({ spec: microstrip, field: 'w', from: '0.1 mm', to: '0.5 mm', points: 5 }).expect(200);
    const expected = sweep(microstrip, 'w', 0.1e-3, 0.5e-3, 5);
    expect(response.body.series.z0).to.deep.equal(expected.series.z0);
    expect(response.body.x.length).to.equal(5);
  });
});

describe('POST /api/v1/tolerance', () => {
  it('gives the library statistics for the same spreads and random state', async () => {
    const body = { spec: microstrip, spreads: { w: { plusMinus: '1 mil' }, er: { plusMinusRelative: 0.05 } }, samples: 500, randomState: 7 };
    const response = await api().post('/api/v1/tolerance').send(body).expect(200);
    const expected = tolerance(microstrip, { w: { plusMinus: 25.4e-6 }, er: { plusMinusRelative: 0.05 } }, 500, { randomState: 7 });
    expect(response.body.impedance.mean).to.be.closeTo(expected.impedance.mean, 1e-9);
    expect(response.body.impedance.std).to.be.closeTo(expected.impedance.std, 1e-9);
  });

  it('names a spread on an input the kind does not have', async () => {
    const response = await api().post('/api/v1/tolerance').send({ spec: microstrip, spreads: { D: { plusMinusRelative: 0.1 } }, samples: 10 }).expect(400);
    expect(response.body.errors[0].field).to.equal('spreads.D');
  });
});

describe('POST /api/v1/compare', () => {
  it("lists each line's result and the differences from the first", async () => {
    const narrow = { ...microstrip, w: 0.25e-3 };
    const response = await api().post('/api/v1/compare').send({ specs: [microstrip, narrow] }).expect(200);
    const [first, second] = [calculate(microstrip), calculate(narrow)];
    expect(response.body.lines[1].result.z0).to.equal(second.z0);
    expect(response.body.differences.z0.fromFirst[1]).to.be.closeTo(second.z0 - first.z0, 1e-12);
    expect(response.body.differences.z0.percentFromFirst[1]).to.be.closeTo(((second.z0 - first.z0) / first.z0) * 100, 1e-9);
  });

  it('names the bad field of the second spec by its index', async () => {
    const response = await api().post('/api/v1/compare').send({ specs: [microstrip, { ...microstrip, w: '-1 mm' }] }).expect(400);
    expect(response.body.errors[0].field).to.equal('specs[1].w');
  });
});
