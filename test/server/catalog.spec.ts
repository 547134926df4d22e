import { expect } from 'chai';
import request from 'supertest';
import { calculate, type LineSpec } from '@linewright/lines';
import { AuditLog } from '../../server/catalog/audit-log';
import { authAs, uniqueName } from './sign-in';
import { testApp } from './test-app';

const api = () => request(testApp().app);
const ONE_OUNCE = 34.8e-6;

async function createMaterial(overrides: object = {}) {
  const response = await api().post('/api/v1/materials').set('Authorization', await authAs('engineer')).send({ name: uniqueName('Core'), dk: 4.1, df: 0.015, referenceFrequency: '1 GHz', ...overrides }).expect(201);
  return response.body;
}

async function moveTo(path: string, id: number, version: number, state: string, role: 'engineer' | 'admin') {
  return api().post(`/api/v1/${path}/${id}/state`).set('Authorization', await authAs(role)).set('If-Match', `"${version}"`).send({ state });
}

describe('materials catalog', () => {
  it('creates a draft with unit strings converted to SI and an ETag of version 1', async () => {
    const response = await api().post('/api/v1/materials').set('Authorization', await authAs('engineer')).send({ name: uniqueName('Prepreg'), dk: 3.9, referenceFrequency: '10 GHz', dielectricStrength: '30 kV/mm' }).expect(201);
    expect(response.headers['etag']).to.equal('"1"');
    expect(response.body).to.include({ state: 'draft', version: 1, referenceFrequency: 1e10, dielectricStrength: 3e7, df: 0 });
  });

  it('two concurrent edits of one material: one wins, the other gets 409 and nothing is lost', async () => {
    const material = await createMaterial();
    const auth = await authAs('engineer');
    const edit = (body: object) => api().patch(`/api/v1/materials/${material.id}`).set('Authorization', auth).set('If-Match', '"1"').send(body);
    const [first, second] = await Promise.all([edit({ dk: 4.0 }), edit({ notes: 'from the second editor' })]);
    expect([first.status, second.status].sort()).to.deep.equal([200, 409]);
    const winner = first.status === 200 ? first : second;
    const stored = await api().get(`/api/v1/materials/${material.id}`).set('Authorization', auth).expect(200);
    expect(stored.body.version).to.equal(2);
    expect(stored.headers['etag']).to.equal('"2"');
    expect(stored.body.dk).to.equal(winner.body.dk);
    expect(stored.body.notes).to.equal(winner.body.notes);
    // The loser re-reads and applies its change on top: both edits survive.
    const retried = await api().patch(`/api/v1/materials/${material.id}`).set('Authorization', auth).set('If-Match', stored.headers['etag']).send(first.status === 409 ? { dk: 4.0 } : { notes: 'from the second editor' }).expect(200);
    expect(retried.body).to.include({ dk: 4.0, notes: 'from the second editor', version: 3 });
  });

  it('an update without If-Match answers 428 and changes nothing', async () => {
    const material = await createMaterial();
    await api().patch(`/api/v1/materials/${material.id}`).set('Authorization', await authAs('engineer')).send({ dk: 5 }).expect(428);
    const stored = await api().get(`/api/v1/materials/${material.id}`).set('Authorization', await authAs('viewer')).expect(200);
    expect(stored.body.dk).to.equal(4.1);
  });

  it('moves draft → proposed (engineer) → approved (admin) → retired (admin); engineers cannot approve', async () => {
    const material = await createMaterial();
    const proposed = await moveTo('materials', material.id, 1, 'proposed', 'engineer');
    expect(proposed.status).to.equal(200);
    const refused = await moveTo('materials', material.id, 2, 'approved', 'engineer');
    expect(refused.status).to.equal(403);
    const approved = await moveTo('materials', material.id, 2, 'approved', 'admin');
    expect(approved.body.state).to.equal('approved');
    const retired = await moveTo('materials', material.id, 3, 'retired', 'admin');
    expect(retired.body.state).to.equal('retired');
  });

  it('refuses a move the life cycle does not have and editing a non-draft, with 409', async () => {
    const material = await createMaterial();
    expect((await moveTo('materials', material.id, 1, 'approved', 'admin')).status).to.equal(409);
    await moveTo('materials', material.id, 1, 'proposed', 'engineer');
    await api().patch(`/api/v1/materials/${material.id}`).set('Authorization', await authAs('admin')).set('If-Match', '"2"').send({ dk: 5 }).expect(409);
  });

  it('writes an audit row with before and after for every change', async () => {
    const material = await createMaterial();
    await api().patch(`/api/v1/materials/${material.id}`).set('Authorization', await authAs('engineer')).set('If-Match', '"1"').send({ dk: 4.4 }).expect(200);
    await moveTo('materials', material.id, 2, 'proposed', 'engineer');
    const entries = await new AuditLog(testApp().db).forEntity('material', material.id);
    expect(entries.map((entry) => entry.action)).to.deep.equal(['create', 'update', 'state:proposed']);
    expect((entries[1].before as { dk: number }).dk).to.equal(4.1);
    expect((entries[1].after as { dk: number }).dk).to.equal(4.4);
  });

  it('lists with a filter, a sort and pages', async () => {
    const stem = uniqueName('Sortable');
    const auth = await authAs('engineer');
    for (const dk of [3.1, 3.3, 3.2]) await api().post('/api/v1/materials').set('Authorization', auth).send({ name: `${stem} ${dk}`, dk }).expect(201);
    const page = await api().get('/api/v1/materials').query({ q: stem, sort: '-dk', pageSize: 2, page: 1 }).set('Authorization', auth).expect(200);
    expect(page.body.total).to.equal(3);
    expect(page.body.items.map((item: { dk: number }) => item.dk)).to.deep.equal([3.3, 3.2]);
    const second = await api().get('/api/v1/materials').query({ q: stem, sort: '-dk', pageSize: 2, page: 2 }).set('Authorization', auth).expect(200);
    expect(second.body.items.map((item: { dk: number }) => item.dk)).to.deep.equal([3.1]);
    const approved = await api().get('/api/v1/materials').query({ state: 'approved' }).set('Authorization', auth).expect(200);
    expect(approved.body.items.every((item: { state: string }) => item.state === 'approved')).to.equal(true);
  });

  it('treats % and _ in a search as text, not wildcards', async () => {
    const response = await api().get('/api/v1/materials').query({ q: '%' }).set('Authorization', await authAs('viewer')).expect(200);
    expect(response.body.total).to.equal(0);
  });

  it('an engineer deletes an own draft; a material in use is refused with a message to retire it', async () => {
    const own = await createMaterial();
    await api().delete(`/api/v1/materials/${own.id}`).set('Authorization', await authAs('engineer')).set('If-Match', '"1"').expect(204);
    const used = await createMaterial();
    await api().post('/api/v1/line-types').set('Authorization', await authAs('engineer')).send({ name: uniqueName('Uses it'), kind: 'microstrip', geometry: { w: '0.3 mm', h: '0.17 mm', t: '1 oz' }, materialId: used.id, target: { quantity: 'z0', value: 50, tolerancePercent: 10 } }).expect(201);
    const refused = await api().delete(`/api/v1/materials/${used.id}`).set('Authorization', await authAs('admin')).set('If-Match', '"1"').expect(409);
    expect(refused.body.detail).to.match(/used by 1 line type; retire it instead/);
  });

  it('a duplicate name answers 409 naming the field', async () => {
    const material = await createMaterial();
    const response = await api().post('/api/v1/materials').set('Authorization', await authAs('engineer')).send({ name: material.name, dk: 4 }).expect(409);
    expect(response.body.errors[0].field).to.equal('name');
  });
});

describe('conductors catalog', () => {
  it('stores foil thicknesses and roughness from unit strings in SI', async () => {
    const response = await api().post('/api/v1/conductors').set('Authorization', await authAs('engineer')).send({ name: uniqueName('Foil'), conductivity: 5.8e7, roughness: '0.5 um', foilThicknesses: ['1 oz', '18 um'] }).expect(201);
    expect(response.body.roughness).to.be.closeTo(0.5e-6, 1e-15);
    expect(response.body.foilThicknesses[0]).to.be.closeTo(ONE_OUNCE, 1e-7);
    expect(response.body.foilThicknesses[1]).to.be.closeTo(18e-6, 1e-15);
  });
});

describe('line types catalog', () => {
  it("GET includes the library's result for the geometry with its material and conductor, and the target check", async () => {
    const auth = await authAs('viewer');
    const list = await api().get('/api/v1/line-types').query({ state: 'approved', kind: 'microstrip' }).set('Authorization', auth).expect(200);
    const seeded = list.body.items[0];
    const response = await api().get(`/api/v1/line-types/${seeded.id}`).set('Authorization', auth).expect(200);
    const material = (await api().get(`/api/v1/materials/${seeded.materialId}`).set('Authorization', auth).expect(200)).body;
    const conductor = (await api().get(`/api/v1/conductors/${seeded.conductorId}`).set('Authorization', auth).expect(200)).body;
    const spec = { kind: 'microstrip', ...seeded.geometry, er: material.dk, tanDelta: material.df, frequency: material.referenceFrequency, conductivity: conductor.conductivity, roughness: conductor.roughness, length: seeded.lengthDefault } as LineSpec;
    const expected = calculate(spec);
    expect(response.body.computed.result.z0).to.equal(expected.z0);
    expect(response.body.computed.result.lossDb).to.equal(expected.lossDb);
    expect(response.body.computed.note).to.match(/estimate/i);
    expect(response.body.computed.target).to.include({ quantity: 'z0', isMet: true });
  });

  it('finds line types by tag', async () => {
    const response = await api().get('/api/v1/line-types').query({ tag: 'differential' }).set('Authorization', await authAs('viewer')).expect(200);
    expect(response.body.items.length).to.be.greaterThan(0);
    expect(response.body.items.every((item: { tags: string[] }) => item.tags.includes('differential'))).to.equal(true);
  });

  it('cannot be approved while its material is only a draft', async () => {
    const material = await createMaterial();
    const created = await api().post('/api/v1/line-types').set('Authorization', await authAs('engineer')).send({ name: uniqueName('Pending'), kind: 'stripline', geometry: { w: '0.2 mm', b: '0.5 mm', t: '0.5 oz' }, materialId: material.id, target: { quantity: 'z0', value: 50, tolerancePercent: 10 } }).expect(201);
    expect(created.body.ownerId).to.be.a('number');
    await moveTo('line-types', created.body.id, 1, 'proposed', 'engineer');
    const refused = await moveTo('line-types', created.body.id, 2, 'approved', 'admin');
    expect(refused.status).to.equal(409);
    expect(refused.body.detail).to.match(/material .* is draft/);
  });

  it('names geometry problems by their request path', async () => {
    const material = await createMaterial();
    const response = await api().post('/api/v1/line-types').set('Authorization', await authAs('engineer')).send({ name: uniqueName('Broken'), kind: 'microstrip', geometry: { w: '-1 mm', h: '0.17 mm', t: '1 oz', er: 4 }, materialId: material.id, target: { quantity: 'z0', value: 50, tolerancePercent: 10 } }).expect(400);
    expect(response.body.errors.map((error: { field: string }) => error.field)).to.include('geometry.er');
    const negative = await api().post('/api/v1/line-types').set('Authorization', await authAs('engineer')).send({ name: uniqueName('Broken'), kind: 'microstrip', geometry: { w: '-1 mm', h: '0.17 mm', t: '1 oz' }, materialId: material.id, target: { quantity: 'z0', value: 50, tolerancePercent: 10 } }).expect(400);
    expect(negative.body.errors[0].field).to.equal('geometry.w');
    const wrongTarget = await api().post('/api/v1/line-types').set('Authorization', await authAs('engineer')).send({ name: uniqueName('Broken'), kind: 'microstrip', geometry: { w: '0.3 mm', h: '0.17 mm', t: '1 oz' }, materialId: material.id, target: { quantity: 'zDiff', value: 100, tolerancePercent: 10 } }).expect(400);
    expect(wrongTarget.body.errors[0].field).to.equal('target.quantity');
  });
});
