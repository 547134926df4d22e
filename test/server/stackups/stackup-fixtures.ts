/** Stackups for the API suites: each test makes its own, from the 4-layer template, with two lines placed. */
import request from 'supertest';
import { authAs, uniqueName } from '../sign-in';
import { testApp } from '../test-app';

export const api = () => request(testApp().app);

/** The 4-layer template's layer indices: 1 = L1 Top, 7 = L4 Bottom. */
export const TOP = 1;
export const BOTTOM = 7;

export const PLACEMENTS = [
  { label: 'Radio 50 ohm', layerIndex: TOP, structure: 'single', targetImpedance: 50, tolerancePercent: 10, width: '0.35 mm' },
  { label: 'USB 90 ohm pair', layerIndex: BOTTOM, structure: 'pair', targetImpedance: 90, tolerancePercent: 10, width: '0.2 mm', gap: '0.2 mm' },
];

/** A draft stackup from the 4-layer template with PLACEMENTS; returns the created body. */
export async function createStackup(overrides: object = {}) {
  const response = await api()
    .post('/api/v1/stackups')
    .set('Authorization', await authAs('engineer'))
    .send({ name: uniqueName('Stack'), template: 4, placements: PLACEMENTS, ...overrides })
    .expect(201);
  return response.body;
}

/** Reads a binary answer (PDF) into a Buffer. */
export function binary(response: request.Test): request.Test {
  return response.buffer(true).parse((res, done) => {
    const chunks: Buffer[] = [];
    res.on('data', (chunk: Buffer) => chunks.push(chunk));
    res.on('end', () => done(null, Buffer.concat(chunks)));
  });
}
