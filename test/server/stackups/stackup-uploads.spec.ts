/** The fabricator's reply and coupon measurements: row-by-row comparison, pass/fail, and malformed files refused with nothing stored. */
import { expect } from 'chai';
import { authAs } from '../sign-in';
import { testApp } from '../test-app';
import { api, createStackup } from './stackup-fixtures';

const upload = async (path: string, csv: string, fields: Record<string, string> = {}) => {
  let request = api().post(path).set('Authorization', await authAs('engineer'));
  for (const [name, value] of Object.entries(fields)) request = request.field(name, value);
  return request.attach('file', Buffer.from(csv), { filename: 'upload.csv', contentType: 'text/csv' });
};
const storedUploads = async (stackupId: number) => Number((await testApp().db('stackup_uploads').where({ stackup_id: stackupId }).count({ total: '*' }))[0].total);

describe('fabricator reply upload', () => {
  it('shows differences row by row and flags the row outside tolerance', async () => {
    const stackup = await createStackup();
    const table = (await api().get(`/api/v1/stackups/${stackup.id}/table`).set('Authorization', await authAs('viewer'))).body;
    const [radio, usb] = table.rows;
    // Their radio line: 10 µm narrower, their own 52.0 Ω (inside 50 ± 5). Their pair: unchanged geometry, their 101 Ω (outside 90 ± 9).
    const csv = ['label,width_mm,gap_mm,impedance_ohm', `Radio 50 ohm,${(radio.width * 1e3 - 0.01).toFixed(4)},,52.0`, `USB 90 ohm pair,8 mil,${(usb.gap * 1e3).toFixed(4)},101`].join('\n');
    const response = await upload(`/api/v1/stackups/${stackup.id}/fabricator-replies`, csv);
    expect(response.status).to.equal(201);
    const [first, second] = response.body.report.rows;
    expect(first.differences.width).to.be.closeTo(-10e-6, 1e-12);
    expect(first.differences.impedance).to.be.closeTo(52 - radio.impedance, 1e-9);
    expect(first.isTheirsWithinTolerance).to.equal(true);
    // 8 mil = 0.2032 mm, read from a unit string.
    expect(second.theirs.width).to.be.closeTo(0.2032e-3, 1e-12);
    expect(second.isTheirsWithinTolerance).to.equal(false);
    expect(second.isOutOfTolerance).to.equal(true);
    expect(response.body.report.outOfTolerance).to.be.at.least(1);
    const listed = await api().get(`/api/v1/stackups/${stackup.id}/fabricator-replies`).set('Authorization', await authAs('viewer')).expect(200);
    expect(listed.body.items[0].id).to.equal(response.body.id);
  });

  it('refuses a malformed reply with one error per bad cell and stores nothing', async () => {
    const stackup = await createStackup();
    const csv = ['label,width_mm,gap_mm,impedance_ohm', 'Radio 50 ohm,wide,,52', 'Unknown line,0.2,,50', 'USB 90 ohm pair,0.2,,-3'].join('\n');
    const response = await upload(`/api/v1/stackups/${stackup.id}/fabricator-replies`, csv);
    expect(response.status).to.equal(400);
    expect(response.type).to.equal('application/problem+json');
    const fields = response.body.errors.map((error: { field: string }) => error.field);
    expect(fields).to.include.members(['rows[1].width_mm', 'rows[2].label', 'rows[3].gap_mm', 'rows[3].impedance_ohm']);
    expect(response.body.detail).to.match(/nothing was stored/);
    expect(await storedUploads(stackup.id)).to.equal(0);
  });

  it('refuses text that is not CSV, a missing column and a missing file, naming them', async () => {
    const stackup = await createStackup();
    const path = `/api/v1/stackups/${stackup.id}/fabricator-replies`;
    const ragged = await upload(path, 'label,width_mm,impedance_ohm\n"Radio 50 ohm,0.3\n');
    expect(ragged.body.errors[0].field).to.equal('file');
    const column = await upload(path, 'label,width_mm\nRadio 50 ohm,0.3\n');
    expect(column.body.errors[0].field).to.equal('columns.impedance_ohm');
    const none = await api().post(path).set('Authorization', await authAs('engineer')).field('note', 'x').expect(400);
    expect(none.body.errors[0].field).to.equal('file');
    expect(await storedUploads(stackup.id)).to.equal(0);
  });
});

describe('coupon measurement upload', () => {
  /** A TDR-like trace: launch, a plateau at `level`, then the open end. */
  const trace = (label: string, level: number) => {
    const lines = [`time_ns,${label}`];
    for (let index = 0; index <= 40; index++) {
      const impedance = index < 4 ? 30 + index * 5 : index > 36 ? 200 : level + (index % 2 === 0 ? 0.3 : -0.3);
      lines.push(`${(index * 0.05).toFixed(2)},${impedance}`);
    }
    return lines.join('\n');
  };

  it('passes a line whose plateau lies inside target ± tolerance and fails one outside', async () => {
    const stackup = await createStackup();
    const pass = await upload(`/api/v1/stackups/${stackup.id}/coupons`, trace('Radio 50 ohm', 51));
    expect(pass.status).to.equal(201);
    const [radio] = pass.body.report.lines;
    expect(pass.body.report.axis).to.equal('time');
    // Window 30–70 % of 0…2 ns = 0.6…1.4 ns: only plateau samples; band 45…55 Ω.
    expect(pass.body.report.window.from).to.be.closeTo(0.6e-9, 1e-18);
    expect(radio.isPass).to.equal(true);
    expect(radio.bandLow).to.be.closeTo(45, 1e-9);
    expect(radio.bandHigh).to.be.closeTo(55, 1e-9);
    expect(radio.measured.max).to.be.closeTo(51.3, 1e-9);
    const fail = await upload(`/api/v1/stackups/${stackup.id}/coupons`, trace('USB 90 ohm pair', 101));
    expect(fail.body.report.lines[0].isPass).to.equal(false);
    expect(fail.body.report.failed).to.equal(1);
    const listed = await api().get(`/api/v1/stackups/${stackup.id}/coupons`).set('Authorization', await authAs('viewer')).expect(200);
    expect(listed.body.items).to.have.length(2);
  });

  it('refuses an unknown axis, an unknown line, a bad cell and time running backwards, storing nothing', async () => {
    const stackup = await createStackup();
    const path = `/api/v1/stackups/${stackup.id}/coupons`;
    const axis = await upload(path, 'seconds,Radio 50 ohm\n0,50\n1,50\n2,50\n3,50\n4,50\n');
    expect(axis.body.errors[0].field).to.equal('columns.seconds');
    const line = await upload(path, 'time_ns,Nobody\n0,50\n1,50\n2,50\n3,50\n4,50\n');
    expect(line.body.errors[0].field).to.equal('columns.Nobody');
    const cells = await upload(path, 'time_ns,Radio 50 ohm\n0,50\n1,fifty\n0.5,50\n3,50\n4,50\n');
    expect(cells.body.errors.map((error: { field: string }) => error.field)).to.deep.equal(['rows[2].Radio 50 ohm', 'rows[3].time_ns']);
    expect(await storedUploads(stackup.id)).to.equal(0);
  });
});

describe('demo data', () => {
  it('seeds the Halden data-logger 6-layer stack with its lines placed, each meeting its target', async () => {
    const list = await api().get('/api/v1/stackups?q=Halden field logger').set('Authorization', await authAs('viewer')).expect(200);
    expect(list.body.items).to.have.length(1);
    const stackup = list.body.items[0];
    expect(stackup.layers.filter((layer: { type: string }) => layer.type === 'copper')).to.have.length(6);
    const table = await api().get(`/api/v1/stackups/${stackup.id}/table`).set('Authorization', await authAs('viewer')).expect(200);
    expect(table.body.rows.map((row: { kind: string }) => row.kind)).to.deep.equal(['embedded-microstrip', 'stripline', 'coupled-stripline', 'coupled-microstrip']);
    // Widths are stored rounded to 0.1 µm, which moves the impedance by well under 0.1 %.
    for (const row of table.body.rows) expect(Math.abs(row.deviation)).to.be.below(1e-3);
  });
});
