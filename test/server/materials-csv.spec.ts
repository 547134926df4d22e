import { expect } from 'chai';
import request from 'supertest';
import { parse } from 'csv-parse/sync';
import { authAs, uniqueName } from './sign-in';
import { testApp } from './test-app';

const api = () => request(testApp().app);
const materialCount = async () => Number((await testApp().db('materials').count({ n: '*' }))[0].n);
const upload = async (csv: string | Buffer, role: 'engineer' | 'viewer' = 'engineer') =>
  api().post('/api/v1/materials/import').set('Authorization', await authAs(role)).attach('file', Buffer.from(csv), { filename: 'materials.csv', contentType: 'text/csv' });

describe('materials CSV import and export', () => {
  it('imports every row as a draft, with unit strings in quantity columns', async () => {
    const stem = uniqueName('Imported');
    const response = await upload(`name,dk,df,referenceFrequency,notes\n${stem} A,4.1,0.015,1 GHz,first\n${stem} B,3.6,0.004,10000000000,\n`);
    expect(response.status, JSON.stringify(response.body)).to.equal(201);
    expect(response.body.created).to.equal(2);
    expect(response.body.items[0]).to.include({ state: 'draft', referenceFrequency: 1e9, notes: 'first' });
  });

  it('reports every bad row by row and column and imports nothing', async () => {
    const before = await materialCount();
    const stem = uniqueName('Mixed');
    const response = await upload(`name,dk,df,referenceFrequency\n${stem} ok,4.1,0.01,1 GHz\n${stem} bad dk,four,0.01,1 GHz\n${stem} ok 2,4.0,0.01,1 GHz\n${stem} bad f,4.0,0.01,5 parsecs\n${stem} ok,4.2,0.01,\n`);
    expect(response.status).to.equal(400);
    const fields = response.body.errors.map((error: { field: string }) => error.field);
    expect(fields).to.include.members(['rows[2].dk', 'rows[4].referenceFrequency', 'rows[5].name']);
    expect(await materialCount()).to.equal(before);
  });

  it('refuses malformed CSV, an unknown column and a missing file with 400, and an oversized file with 413', async () => {
    const before = await materialCount();
    const malformed = await upload('name,dk\n"unclosed,4\n');
    expect(malformed.status).to.equal(400);
    expect(malformed.body.errors[0].field).to.equal('file');
    const unknownColumn = await upload(`name,dk,colour\n${uniqueName('C')},4,red\n`);
    expect(unknownColumn.body.errors[0].field).to.equal('rows[1].colour');
    const missing = await api().post('/api/v1/materials/import').set('Authorization', await authAs('engineer')).field('note', 'no file');
    expect(missing.status).to.equal(400);
    const oversized = await upload(Buffer.alloc(1024 * 1024 + 10, 'a'));
    expect(oversized.status).to.equal(413);
    expect(await materialCount()).to.equal(before);
  });

  it('a viewer may not import', async () => {
    expect((await upload('name,dk\nX,4\n', 'viewer')).status).to.equal(403);
  });

  it('exports CSV with the import columns, which imports again after renaming', async () => {
    const response = await api().get('/api/v1/materials/export').query({ state: 'approved' }).set('Authorization', await authAs('viewer')).expect(200);
    expect(response.headers['content-type']).to.match(/text\/csv/);
    const rows = parse(response.text, { columns: true }) as Record<string, string>[];
    expect(Object.keys(rows[0])).to.deep.equal(['name', 'description', 'dk', 'df', 'referenceFrequency', 'dielectricStrength', 'notes']);
    const stem = uniqueName('Copy');
    const renamed = response.text.split('\n').map((line, index) => (index > 0 && line ? `${stem} ${index}${line.slice(line.indexOf(',', line.startsWith('"') ? line.indexOf('"', 1) : 0))}` : line)).join('\n');
    const imported = await upload(renamed);
    expect(imported.status, JSON.stringify(imported.body)).to.equal(201);
    expect(imported.body.created).to.equal(rows.length);
  });
});
