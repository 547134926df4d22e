/** Stackups in the catalog: sources, placements, derivation and the table equal to the library. */
import { expect } from 'chai';
import { calculate, impedanceTable, lineGeometryFor, solveLineDimension, stackupTemplate } from '@linewright/lines';
import { authAs, uniqueName } from '../sign-in';
import { api, BOTTOM, createStackup, PLACEMENTS, TOP } from './stackup-fixtures';

const mm = 1e-3;

describe('stackups catalog', () => {
  it('creates a draft from the 4-layer template with its placements converted to SI', async () => {
    const stackup = await createStackup();
    expect(stackup).to.include({ state: 'draft', version: 1 });
    expect(stackup.layers).to.have.length(stackupTemplate(4).layers.length);
    expect(stackup.placements[0]).to.include({ label: 'Radio 50 ohm', layerIndex: TOP, width: 0.35 * mm, gap: null });
    expect(stackup.placements[1]).to.include({ structure: 'pair', width: 0.2 * mm, gap: 0.2 * mm });
    expect(stackup.placements[0].id).to.match(/^p[0-9a-f]{8}$/);
  });

  it('creates from layers with a catalog material, Dk and Df resolved from it', async () => {
    const auth = await authAs('engineer');
    const materials = await api().get('/api/v1/materials?q=FR-4').set('Authorization', auth).expect(200);
    const fr4 = materials.body.items[0];
    const layers = [
      { type: 'copper', name: 'Top', thickness: '1 oz', role: 'signal' },
      { type: 'dielectric', name: 'Core', thickness: '1.5 mm', kind: 'core', materialId: fr4.id },
      { type: 'copper', name: 'Bottom', thickness: '1 oz', role: 'mixed' },
    ];
    const response = await api().post('/api/v1/stackups').set('Authorization', auth).send({ name: uniqueName('Two layer'), layers }).expect(201);
    expect(response.body.resolvedLayers[1]).to.include({ relativePermittivity: fr4.dk, lossTangent: fr4.df, material: fr4.name });
  });

  it('copies a stackup with its layers and placements', async () => {
    const original = await createStackup();
    const copy = await api().post('/api/v1/stackups').set('Authorization', await authAs('engineer')).send({ name: uniqueName('Copy'), copyOf: original.id }).expect(201);
    expect(copy.body.layers).to.deep.equal(original.layers);
    expect(copy.body.placements).to.deep.equal(original.placements);
  });

  it('refuses two sources, a placement on a plane and a coating inside the board, naming the field', async () => {
    const auth = await authAs('engineer');
    const both = await api().post('/api/v1/stackups').set('Authorization', auth).send({ name: uniqueName('Both'), template: 4, copyOf: 1 }).expect(400);
    expect(both.body.errors[0].field).to.equal('copyOf');
    const onPlane = await api().post('/api/v1/stackups').set('Authorization', auth).send({ name: uniqueName('Plane'), template: 4, placements: [{ ...PLACEMENTS[0], layerIndex: 3 }] }).expect(400);
    expect(onPlane.body.errors[0].field).to.equal('placements[0].layerIndex');
    const template = stackupTemplate(4).layers.map((layer) => (layer.type === 'copper' ? { type: 'copper', name: layer.name, thickness: layer.thickness, role: layer.role } : { type: 'dielectric', name: layer.name, thickness: layer.thickness, kind: layer.kind, relativePermittivity: layer.relativePermittivity, lossTangent: layer.lossTangent }));
    (template[4] as { kind: string }).kind = 'coating';
    const coated = await api().post('/api/v1/stackups').set('Authorization', auth).send({ name: uniqueName('Coated'), layers: template }).expect(400);
    expect(coated.body.errors[0].field).to.equal('layers[4].kind');
  });

  it('adds, solves and removes placements with If-Match, each a new version', async () => {
    const stackup = await createStackup({ placements: [] });
    const auth = await authAs('engineer');
    const added = await api().post(`/api/v1/stackups/${stackup.id}/placements`).set('Authorization', auth).set('If-Match', '"1"').send({ label: 'Clock', layerIndex: TOP, structure: 'single', targetImpedance: 50, width: '0.2 mm' }).expect(201);
    expect(added.headers['etag']).to.equal('"2"');
    const placementId = added.body.placements[0].id;
    const solved = await api().post(`/api/v1/stackups/${stackup.id}/placements/${placementId}/solve`).set('Authorization', auth).set('If-Match', '"2"').send({ unknown: 'width' }).expect(200);
    const expected = solveLineDimension(stackupTemplate(4), TOP, 'single', 50, { width: 0.2 * mm });
    expect(solved.body.placements[0].width).to.equal(expected.value);
    await api().post(`/api/v1/stackups/${stackup.id}/placements/${placementId}/solve`).set('Authorization', auth).set('If-Match', '"2"').send({}).expect(409);
    const removed = await api().delete(`/api/v1/stackups/${stackup.id}/placements/${placementId}`).set('Authorization', auth).set('If-Match', '"3"').expect(200);
    expect(removed.body.placements).to.deep.equal([]);
    expect(removed.body.version).to.equal(4);
  });

  it('a viewer reads but cannot add a placement', async () => {
    const stackup = await createStackup();
    await api().get(`/api/v1/stackups/${stackup.id}`).set('Authorization', await authAs('viewer')).expect(200);
    await api().post(`/api/v1/stackups/${stackup.id}/placements`).set('Authorization', await authAs('viewer')).set('If-Match', '"1"').send(PLACEMENTS[0]).expect(403);
  });
});

describe('GET /stackups/{id}/table', () => {
  it('derives an embedded microstrip on L1 and a coupled microstrip on L4 from the stack', async () => {
    const stackup = await createStackup();
    const table = await api().get(`/api/v1/stackups/${stackup.id}/table`).set('Authorization', await authAs('viewer')).expect(200);
    const [radio, usb] = table.body.rows;
    // By hand from the template: L1 sits on 0.2 mm of prepreg (Dk 4.2) over L2, under 20 µm of mask (Dk 3.5).
    expect(radio.spec).to.include({ kind: 'embedded-microstrip', h: 0.2 * mm, er: 4.2, cover: 0.02 * mm, erCover: 3.5 });
    expect(radio.referenceLayers).to.deep.equal(['L2 GND']);
    expect(usb.spec).to.include({ kind: 'coupled-microstrip', s: 0.2 * mm, er: 4.2 });
    expect(usb.referenceLayers).to.deep.equal(['L3 GND']);
  });

  it('every row equals the library: impedanceTable for the same stack, and calculate() of the derived spec', async () => {
    const stackup = await createStackup();
    const table = await api().get(`/api/v1/stackups/${stackup.id}/table`).set('Authorization', await authAs('viewer')).expect(200);
    const placements = [
      { label: 'Radio 50 ohm', layerIndex: TOP, structure: 'single' as const, targetImpedance: 50, tolerance: 0.1, width: 0.35 * mm },
      { label: 'USB 90 ohm pair', layerIndex: BOTTOM, structure: 'pair' as const, targetImpedance: 90, tolerance: 0.1, width: 0.2 * mm, gap: 0.2 * mm },
    ];
    const expected = impedanceTable(stackupTemplate(4), placements);
    table.body.rows.forEach((row: { impedance: number; delayPerMeter: number; spreadLow: number; spreadHigh: number }, index: number) => {
      const result = calculate(lineGeometryFor(stackupTemplate(4), placements[index].layerIndex, placements[index].structure, placements[index]).spec);
      expect(row.impedance).to.equal(index === 0 ? result.z0 : result.zDiff);
      expect(row.delayPerMeter).to.equal(result.delayPerMeter);
      expect(row.spreadLow).to.equal(expected.rows[index].spreadLow);
      expect(row.spreadHigh).to.equal(expected.rows[index].spreadHigh);
    });
    expect(table.body.note).to.match(/estimates/);
  });
});
