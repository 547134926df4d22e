/** POST /step-response and /field-solve give the shared library's numbers, and name bad fields. */
import { expect } from 'chai';
import request from 'supertest';
import { fieldSolveLine, stepResponse, type MicrostripSpec } from '@linewright/lines';
import { testApp } from './test-app';

const api = () => request(testApp().app);

describe('POST /api/v1/step-response', () => {
  const circuit = { source: { amplitude: 3.3, resistance: 25, riseTime: 2e-10 }, line: { z0: 50, delay: 1e-9 }, load: 'open' as const };

  it('answers the library’s lattice waveforms for a series-driven open line', async () => {
    const response = await api().post('/api/v1/step-response').send({ ...circuit, options: { points: 512 } }).expect(200);
    const expected = stepResponse(circuit, { points: 512 });
    expect(response.body.method).to.equal('lattice');
    expect(response.body.load.voltage).to.deep.equal(expected.load.voltage);
    expect(response.body.load.settleTime).to.equal(expected.load.settleTime);
    expect(response.body.load.hasSettled).to.equal(true);
    // Exact closed form (Johnson and Graham 1993, lattice diagrams): incident step Vs·Z0/(Rs+Z0) = 3.3·50/75 = 2.2 V,
    // doubled at the open end (ΓL = 1): the first load arrival is 4.4 V.
    const firstAtLoad = response.body.arrivals.find((arrival: { end: string }) => arrival.end === 'load');
    expect(firstAtLoad.voltage).to.be.closeTo(4.4, 1e-12);
  });

  it('maps a response that never settles to settleTime null', async () => {
    // Zero source resistance into an open lossless line: |ΓS·ΓL| = 1, it rings for ever.
    const ringing = { ...circuit, source: { ...circuit.source, resistance: 0 } };
    const response = await api().post('/api/v1/step-response').send({ ...ringing, options: { points: 256 } }).expect(200);
    expect(stepResponse(ringing, { points: 256 }).load.settleTime).to.equal(Infinity);
    expect(response.body.load.settleTime).to.equal(null);
    expect(response.body.load.hasSettled).to.equal(false);
    expect(response.body.roundTripsToSettle).to.equal(null);
  });

  it('caps the number of samples and names the field', async () => {
    const response = await api().post('/api/v1/step-response').send({ ...circuit, options: { points: 100000 } }).expect(400);
    expect(response.type).to.equal('application/problem+json');
    expect(response.body.errors[0].field).to.equal('options.points');
  });

  it('names a spec field the library refuses inside the line', async () => {
    const line = { spec: { kind: 'microstrip', w: '-0.3 mm', h: '0.17 mm', t: '1 oz', er: 4.2 }, length: 0.1 };
    const response = await api().post('/api/v1/step-response').send({ ...circuit, line }).expect(400);
    expect(response.body.errors[0].field).to.equal('line.spec.w');
  });
});

describe('POST /api/v1/field-solve', () => {
  const microstrip: MicrostripSpec = { kind: 'microstrip', w: 0.3e-3, h: 0.17e-3, t: 34.8e-6, er: 4.2 };

  it('answers what fieldSolveLine gives in-process for the same spec and options', async () => {
    const response = await api().post('/api/v1/field-solve').send({ spec: microstrip, tolerance: 0.01 }).expect(200);
    const expected = await fieldSolveLine(microstrip, { tolerance: 0.01 });
    expect(response.body.z0).to.equal(expected.z0);
    expect(response.body.erEff).to.equal(expected.erEff);
    expect(response.body.estimatedError).to.equal(expected.estimatedError);
    expect(response.body).to.not.have.property('solution');
  });

  it('refuses a time cap above 10 s and names it', async () => {
    const response = await api().post('/api/v1/field-solve').send({ spec: microstrip, maxMillis: 60000 }).expect(400);
    expect(response.body.errors[0].field).to.equal('maxMillis');
  });

  it('names an impossible spec field by its request path, from inside the worker', async () => {
    const response = await api().post('/api/v1/field-solve').send({ spec: { ...microstrip, t: 1e-3 }, section: { etchAngle: 0.1 } }).expect(400);
    expect(response.type).to.equal('application/problem+json');
    expect(response.body.errors[0].field).to.equal('section.etchAngle');
  });
});
