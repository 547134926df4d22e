import { expect } from 'chai';
import request from 'supertest';
import { calculate } from '@linewright/lines';
import { testApp } from './test-app';

describe('POST /api/v1/calculate', () => {
  const microstrip = { kind: 'microstrip', w: 0.3e-3, h: 0.17e-3, t: 34.8e-6, er: 4.2 } as const;

  it('returns the same numbers as the shared library for the same spec', async () => {
    const response = await request(testApp().app).post('/api/v1/calculate').send({ spec: microstrip }).expect(200);
    const expected = calculate(microstrip);
    expect(response.body.result.z0).to.equal(expected.z0);
    expect(response.body.result.erEff).to.equal(expected.erEff);
    expect(response.body.note).to.match(/estimate/i);
  });

  it('reads unit strings at the edge: "0.3 mm" and "1 oz" equal their SI values', async () => {
    const response = await request(testApp().app)
      .post('/api/v1/calculate')
      .send({ spec: { ...microstrip, w: '0.3 mm', h: '0.17 mm', t: '1 oz' } })
      .expect(200);
    expect(response.body.spec.w).to.be.closeTo(0.3e-3, 1e-15);
    expect(response.body.result.z0).to.be.closeTo(calculate({ ...microstrip, t: 1.37 * 25.4e-6 }).z0, 1e-9);
  });

  it('answers 400 problem+json naming a negative width', async () => {
    const response = await request(testApp().app).post('/api/v1/calculate').send({ spec: { ...microstrip, w: -1e-3 } }).expect(400);
    expect(response.headers['content-type']).to.match(/application\/problem\+json/);
    expect(response.body.errors[0].field).to.equal('spec.w');
  });

  it('answers 400 naming a missing field, an unknown field and a wrong type', async () => {
    const { w: _omitted, ...withoutWidth } = microstrip;
    const response = await request(testApp().app)
      .post('/api/v1/calculate')
      .send({ spec: { ...withoutWidth, colour: 'red', h: true } })
      .expect(400);
    const fields = response.body.errors.map((error: { field: string }) => error.field);
    expect(fields).to.include.members(['spec.w', 'spec.colour', 'spec.h']);
  });

  it('answers 400 naming a unit string that does not parse', async () => {
    const response = await request(testApp().app).post('/api/v1/calculate').send({ spec: { ...microstrip, w: '5 parsecs-ish' } }).expect(400);
    expect(response.body.errors[0].field).to.equal('spec.w');
  });

  it('answers 400 for an unknown kind and for malformed JSON', async () => {
    await request(testApp().app).post('/api/v1/calculate').send({ spec: { kind: 'waveguide-ish', er: 4 } }).expect(400);
    const malformed = await request(testApp().app).post('/api/v1/calculate').set('content-type', 'application/json').send('{"spec":').expect(400);
    expect(malformed.body.title).to.equal('Invalid request');
  });

  it('answers 413 for a body over the size limit', async () => {
    await request(testApp().app).post('/api/v1/calculate').send({ spec: microstrip, padding: 'x'.repeat(300 * 1024) }).expect(413);
  });
});

describe('POST /api/v1/calculate with the library\'s loss-model inputs', () => {
  it('accepts the Huray roughness inputs and a Dk/Df reference frequency, with the library\'s numbers', async () => {
    const spec = {
      kind: 'microstrip', w: 0.3e-3, h: 0.17e-3, t: 34.8e-6, er: 4.2, tanDelta: 0.02, frequency: 5e9,
      roughnessModel: 'huray', noduleRadius: 0.5e-6, noduleSurfaceRatio: 2, dielectricReferenceFrequency: 1e9,
    } as const;
    const response = await request(testApp().app).post('/api/v1/calculate').send({ spec }).expect(200);
    expect(response.body.result.lossDbPerMeter).to.equal(calculate(spec).lossDbPerMeter);
  });
});
