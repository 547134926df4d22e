/** The table as CSV (RFC 4180, reads back as a reply with no differences) and as a one-page PDF with the expected rows. */
import { expect } from 'chai';
import { parse } from 'csv-parse/sync';
import { PDFParse } from 'pdf-parse';
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { authAs } from '../sign-in';
import { api, binary, createStackup } from './stackup-fixtures';

describe('impedance table exports', () => {
  it('CSV: a header row, CRLF records, one row per line in mm, ohm and ps/mm, equal to the JSON table', async () => {
    const stackup = await createStackup();
    const auth = await authAs('viewer');
    const table = (await api().get(`/api/v1/stackups/${stackup.id}/table`).set('Authorization', auth).expect(200)).body;
    const csv = await api().get(`/api/v1/stackups/${stackup.id}/table.csv`).set('Authorization', auth).expect(200);
    expect(csv.type).to.equal('text/csv');
    expect(csv.headers['content-disposition']).to.match(/attachment; filename="?.*-v1-impedance\.csv"?/);
    expect(csv.text).to.match(/^label,layer,structure,kind,target_ohm,tolerance_percent,width_mm,gap_mm,height_above_mm,height_below_mm,reference_layers,impedance_ohm,delay_ps_per_mm\r\n/);
    const rows = parse(csv.text, { columns: true }) as Record<string, string>[];
    expect(rows).to.have.length(2);
    expect(rows[0]).to.include({ label: 'Radio 50 ohm', layer: 'L1 Top', structure: 'single', width_mm: '0.35', gap_mm: '', reference_layers: 'L2 GND' });
    expect(Number(rows[1].gap_mm)).to.equal(0.2);
    expect(Number(rows[0].impedance_ohm)).to.be.closeTo(table.rows[0].impedance, 0.005);
    // s/m → ps/mm: ×1e12 / 1e3.
    expect(Number(rows[1].delay_ps_per_mm)).to.be.closeTo(table.rows[1].delayPerMeter * 1e9, 0.0005);
  });

  it('CSV round trip: the exported table uploaded as the fabricator reply shows no difference beyond rounding', async () => {
    const stackup = await createStackup();
    const auth = await authAs('engineer');
    const csv = await api().get(`/api/v1/stackups/${stackup.id}/table.csv`).set('Authorization', auth).expect(200);
    const reply = await api().post(`/api/v1/stackups/${stackup.id}/fabricator-replies`).set('Authorization', auth).attach('file', Buffer.from(csv.text), { filename: 'reply.csv', contentType: 'text/csv' }).expect(201);
    const { rows, missing } = reply.body.report;
    expect(missing).to.deep.equal([]);
    expect(rows).to.have.length(2);
    for (const row of rows) {
      expect(Math.abs(row.differences.width)).to.be.below(0.5e-7);
      expect(Math.abs(row.differences.impedance)).to.be.at.most(0.005);
      expect(row.linewrightAtTheirGeometry).to.be.closeTo(row.ours.impedance, 1e-6 * row.ours.impedance);
    }
  });

  it('PDF: one page whose text holds the title, every line with its figures and the estimate caution', async () => {
    const stackup = await createStackup();
    const auth = await authAs('viewer');
    const table = (await api().get(`/api/v1/stackups/${stackup.id}/table`).set('Authorization', auth).expect(200)).body;
    const pdf = await binary(api().get(`/api/v1/stackups/${stackup.id}/table.pdf`).set('Authorization', auth)).expect(200);
    expect(pdf.type).to.equal('application/pdf');
    const bytes = pdf.body as Buffer;
    expect(bytes.length).to.be.above(2000);
    expect(bytes.subarray(0, 5).toString()).to.equal('%PDF-');
    if (process.env['TEST_OUTPUT_DIR']) writeFileSync(join(process.env['TEST_OUTPUT_DIR'], 'stackup-table.pdf'), bytes);
    const parsed = await new PDFParse({ data: bytes }).getText();
    expect(parsed.total).to.equal(1);
    const text = parsed.text.replace(/\s+/g, ' ');
    expect(text).to.include(`Controlled-impedance table: ${stackup.name}`);
    for (const row of table.rows) {
      expect(text).to.include(row.label);
      expect(text).to.include(row.impedance.toFixed(2));
      expect(text).to.include((row.width / 1e-3).toFixed(4));
    }
    expect(text).to.include('Caution: Results are estimates');
  });
});
