/** Sharing with the fabricator: the mailed link opens the table read-only, and stops working when it expires or is withdrawn. */
import { expect } from 'chai';
import { authAs, latestMailTo, uniqueName } from '../sign-in';
import { testApp } from '../test-app';
import { api, binary, createStackup } from './stackup-fixtures';

const tokenOf = (text: string) => /\/shared\/stackup\?token=([A-Za-z0-9._-]+)/.exec(text)![1];

async function share(stackupId: number, email = `${uniqueName('cam').replace(/[^a-z0-9-]/gi, '')}@fabricator.test`) {
  const response = await api().post(`/api/v1/stackups/${stackupId}/shares`).set('Authorization', await authAs('engineer')).send({ email, days: 7, message: 'Please check the widths.' }).expect(201);
  const mail = await latestMailTo(email);
  return { share: response.body, mail, token: tokenOf(mail.text) };
}

describe('sharing a stackup with the fabricator', () => {
  it('mails a link that opens the table, CSV and PDF without signing in', async () => {
    const stackup = await createStackup();
    const { share: created, mail, token } = await share(stackup.id);
    expect(mail.subject).to.include(stackup.name);
    expect(mail.text).to.include('Please check the widths.');
    expect(mail.text).to.include('Results are estimates');
    expect(created.link).to.include(token);
    const opened = await api().get(`/api/v1/shared/stackups/${token}`).expect(200);
    expect(opened.body.stackup.name).to.equal(stackup.name);
    expect(opened.body.table.rows).to.have.length(2);
    expect(opened.body.share).to.include({ sharedVersion: 1, isChangedSinceShared: false });
    await api().get(`/api/v1/shared/stackups/${token}/table.csv`).expect(200).expect('Content-Type', /text\/csv/);
    const pdf = await binary(api().get(`/api/v1/shared/stackups/${token}/table.pdf`)).expect(200);
    expect((pdf.body as Buffer).subarray(0, 5).toString()).to.equal('%PDF-');
  });

  it('is read-only: writes under /shared answer 405, and the token is no sign-in for the API', async () => {
    const stackup = await createStackup();
    const { token } = await share(stackup.id);
    const write = await api().post(`/api/v1/shared/stackups/${token}`).send({ name: 'changed' }).expect(405);
    expect(write.headers['allow']).to.equal('GET');
    await api().patch(`/api/v1/shared/stackups/${token}`).send({ name: 'changed' }).expect(405);
    await api().patch(`/api/v1/stackups/${stackup.id}`).set('Authorization', `Bearer ${token}`).set('If-Match', '"1"').send({ name: 'changed' }).expect(401);
    await api().get(`/api/v1/stackups/${stackup.id}`).set('Authorization', `Bearer ${token}`).expect(401);
    const unchanged = await api().get(`/api/v1/stackups/${stackup.id}`).set('Authorization', await authAs('viewer')).expect(200);
    expect(unchanged.body).to.include({ name: stackup.name, version: 1 });
  });

  it('answers 410 once the share has expired, and when it is withdrawn', async () => {
    const stackup = await createStackup();
    const first = await share(stackup.id);
    await testApp().db('stackup_shares').where({ id: first.share.id }).update({ expires_at: new Date(Date.now() - 1000) });
    const expired = await api().get(`/api/v1/shared/stackups/${first.token}`).expect(410);
    expect(expired.type).to.equal('application/problem+json');
    expect(expired.body.detail).to.match(/expired/);
    await api().get(`/api/v1/shared/stackups/${first.token}/table.pdf`).expect(410);

    const second = await share(stackup.id);
    await api().delete(`/api/v1/stackups/${stackup.id}/shares/${second.share.id}`).set('Authorization', await authAs('engineer')).expect(204);
    const withdrawn = await api().get(`/api/v1/shared/stackups/${second.token}`).expect(410);
    expect(withdrawn.body.detail).to.match(/withdrawn/);
  });

  it('a token whose own signed expiry has passed answers 410; a forged or altered one 404', async () => {
    const stackup = await createStackup();
    const { share: created, token } = await share(stackup.id);
    const { StackupShares } = await import('../../../server/stackups/stackup-shares');
    const { loadConfig } = await import('../../../server/config');
    const signer = new StackupShares(loadConfig(process.env), undefined as never, undefined as never);
    const lapsed = signer.sign({ sid: created.id, stk: stackup.id }, -60);
    await api().get(`/api/v1/shared/stackups/${lapsed}`).expect(410);
    const altered = `${token.slice(0, -4)}AAAA`;
    await api().get(`/api/v1/shared/stackups/${altered}`).expect(404);
    const otherStackup = signer.sign({ sid: created.id, stk: stackup.id + 1000 }, 600);
    await api().get(`/api/v1/shared/stackups/${otherStackup}`).expect(404);
  });

  it('only engineers and admins share; the address is checked', async () => {
    const stackup = await createStackup();
    await api().post(`/api/v1/stackups/${stackup.id}/shares`).set('Authorization', await authAs('viewer')).send({ email: 'cam@fabricator.test' }).expect(403);
    const bad = await api().post(`/api/v1/stackups/${stackup.id}/shares`).set('Authorization', await authAs('engineer')).send({ email: 'not an address' }).expect(400);
    expect(bad.body.errors[0].field).to.equal('email');
  });
});
