/**
 * Every kind of bad input answers 4xx problem+json naming the problem, and the
 * database is unchanged afterwards (row counts before and after).
 */
import { expect } from 'chai';
import request from 'supertest';
import { authAs, uniqueName } from './sign-in';
import { testApp } from './test-app';

const api = () => request(testApp().app);
const TABLES = ['materials', 'conductors', 'line_types', 'audit_log', 'users', 'api_tokens', 'invitations'];

async function counts(): Promise<Record<string, number>> {
  const entries = await Promise.all(TABLES.map(async (table) => [table, Number((await testApp().db(table).count({ n: '*' }))[0].n)] as const));
  return Object.fromEntries(entries);
}

interface BadCase {
  name: string;
  send: (auth: string) => request.Test;
  status: number;
  field?: string;
}

const microstrip = { kind: 'microstrip', w: 0.3e-3, h: 0.17e-3, t: 34.8e-6, er: 4.2 };
const post = (path: string, body: unknown) => (auth: string) => api().post(`/api/v1${path}`).set('Authorization', auth).send(body as object);

const CASES: BadCase[] = [
  { name: 'a material without dk', send: post('/materials', { name: 'No Dk' }), status: 400, field: 'dk' },
  { name: 'a material with an extra field', send: post('/materials', { name: 'Extra', dk: 4, colour: 'green' }), status: 400, field: 'colour' },
  { name: 'a material with dk as text', send: post('/materials', { name: 'Typed', dk: 'four' }), status: 400, field: 'dk' },
  { name: 'a material with a huge dk', send: post('/materials', { name: 'Huge', dk: 1e308 }), status: 400, field: 'dk' },
  { name: 'a material with a frequency that does not parse', send: post('/materials', { name: 'Freq', dk: 4, referenceFrequency: '5 parsecs' }), status: 400, field: 'referenceFrequency' },
  { name: 'a material with a length where a frequency belongs', send: post('/materials', { name: 'Freq', dk: 4, referenceFrequency: '5 mil' }), status: 400, field: 'referenceFrequency' },
  { name: 'a material with a blank name', send: post('/materials', { name: '   ', dk: 4 }), status: 400, field: 'name' },
  { name: 'a Dk/Df table with falling frequencies', send: post('/materials', { name: 'Table', dk: 4, dkDfTable: [{ frequency: '2 GHz', dk: 4, df: 0.01 }, { frequency: '1 GHz', dk: 4.1, df: 0.01 }] }), status: 400, field: 'dkDfTable[1].frequency' },
  { name: 'a conductor with no foils', send: post('/conductors', { name: 'Bare', conductivity: 5.8e7, foilThicknesses: [] }), status: 400, field: 'foilThicknesses' },
  { name: 'a conductor with a negative roughness', send: post('/conductors', { name: 'Rough', conductivity: 5.8e7, roughness: -1e-6, foilThicknesses: ['1 oz'] }), status: 400, field: 'roughness' },
  { name: 'a line type on a material that does not exist', send: post('/line-types', { name: 'Orphan', kind: 'microstrip', geometry: { w: 3e-4, h: 1.7e-4, t: 3.5e-5 }, materialId: 999999, target: { quantity: 'z0', value: 50, tolerancePercent: 10 } }), status: 400, field: 'materialId' },
  { name: 'a line type with a geometry field of another kind', send: post('/line-types', { name: 'Mixed', kind: 'microstrip', geometry: { w: 3e-4, h: 1.7e-4, t: 3.5e-5, D: 1e-3 }, materialId: 1, target: { quantity: 'z0', value: 50, tolerancePercent: 10 } }), status: 400, field: 'geometry.D' },
  { name: 'a calculate spec with a string that is not a number', send: post('/calculate', { spec: { ...microstrip, w: 'NaN' } }), status: 400, field: 'spec.w' },
  { name: 'a calculate spec with a huge width', send: post('/calculate', { spec: { ...microstrip, w: 1e308 } }), status: 400 },
  { name: 'a sweep over the point limit', send: post('/sweep', { spec: microstrip, field: 'w', from: 1e-4, to: 5e-4, points: 10_001 }), status: 400, field: 'points' },
  { name: 'a sweep of a field the kind does not have', send: post('/sweep', { spec: microstrip, field: 'D', from: 1e-4, to: 5e-4, points: 3 }), status: 400, field: 'field' },
  { name: 'a compare of one line', send: post('/compare', { specs: [microstrip] }), status: 400, field: 'specs' },
  { name: 'a solve for an unreachable target', send: post('/solve', { spec: microstrip, unknown: 'w', target: { quantity: 'z0', value: 5000 } }), status: 400, field: 'unknown' },
  { name: 'a token with an unknown scope', send: post('/tokens', { name: 'x', scope: 'everything' }), status: 400, field: 'scope' },
  { name: 'an invitation to an invalid address', send: post('/invitations', { email: 'not-an-address', role: 'viewer' }), status: 400, field: 'email' },
  { name: 'a list with an unknown query parameter', send: (auth) => api().get('/api/v1/materials').query({ colour: 'red' }).set('Authorization', auth), status: 400, field: 'colour' },
  { name: 'a list with a page size over the limit', send: (auth) => api().get('/api/v1/materials').query({ pageSize: 100000 }).set('Authorization', auth), status: 400, field: 'pageSize' },
  { name: 'a path id that is not a number', send: (auth) => api().get('/api/v1/materials/abc').set('Authorization', auth), status: 400, field: 'id' },
  { name: 'a malformed If-Match', send: (auth) => api().patch('/api/v1/materials/1').set('Authorization', auth).set('If-Match', 'yesterday').send({ dk: 4 }), status: 400, field: 'If-Match' },
  { name: 'malformed JSON', send: (auth) => api().post('/api/v1/materials').set('Authorization', auth).set('content-type', 'application/json').send('{"name":'), status: 400 },
  { name: 'a body over the size limit', send: post('/materials', { name: 'Big', dk: 4, notes: 'x'.repeat(300 * 1024) }), status: 413 },
];

describe('bad input leaves the database unchanged', () => {
  for (const badCase of CASES) {
    it(`${badCase.name} answers ${badCase.status}${badCase.field ? ` naming ${badCase.field}` : ''}`, async () => {
      const auth = await authAs('admin');
      const before = await counts();
      const response = await badCase.send(auth);
      expect(response.status, JSON.stringify(response.body)).to.equal(badCase.status);
      expect(response.headers['content-type']).to.match(/application\/problem\+json/);
      expect(JSON.stringify(response.body)).to.not.match(/at .*\.ts:\d+/);
      if (badCase.field) expect(response.body.errors.map((error: { field: string }) => error.field)).to.include(badCase.field);
      expect(await counts()).to.deep.equal(before);
    });
  }

  it('stores an SQL-looking name as plain text and finds it again', async () => {
    const name = uniqueName("Robert'); DROP TABLE materials; --");
    const auth = await authAs('engineer');
    await api().post('/api/v1/materials').set('Authorization', auth).send({ name, dk: 4 }).expect(201);
    const found = await api().get('/api/v1/materials').query({ q: "'); DROP TABLE" }).set('Authorization', auth).expect(200);
    expect(found.body.items.map((item: { name: string }) => item.name)).to.include(name);
    expect(await testApp().db.schema.hasTable('materials')).to.equal(true);
  });
});
