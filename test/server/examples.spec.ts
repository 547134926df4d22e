/** The examples under examples/ run against a listening server with a real API token. */
import { expect } from 'chai';
import request from 'supertest';
import { execFile, spawnSync } from 'node:child_process';
import { promisify } from 'node:util';
import type { AddressInfo } from 'node:net';
import type { Server } from 'node:http';
import { approvedLineSweep } from '../../examples/approved-line-sweep';
import { authAs, uniqueName } from './sign-in';
import { testApp } from './test-app';

describe('examples', () => {
  let server: Server;
  let baseUrl: string;
  let token: string;

  before(async () => {
    server = testApp().app.listen(0, '127.0.0.1');
    await new Promise((resolve) => server.once('listening', resolve));
    baseUrl = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
    const created = await request(testApp().app).post('/api/v1/tokens').set('Authorization', await authAs('viewer')).send({ name: uniqueName('example'), scope: 'read' }).expect(201);
    token = created.body.secret;
  });

  after(async () => {
    server.closeAllConnections();
    await new Promise((resolve) => server.close(resolve));
  });

  it('approved-line-sweep.ts lists approved line types and sweeps the first one', async () => {
    const lines: string[] = [];
    const outcome = await approvedLineSweep({ baseUrl, token, log: (line) => lines.push(line) });
    expect(outcome.lineTypes).to.be.greaterThan(0);
    expect(outcome.widths).to.have.length(5);
    expect(outcome.impedance[0]).to.be.greaterThan(outcome.impedance[4]);
    expect(lines.join('\n')).to.match(/width sweep/);
  });

  it('calculate.sh runs with curl', async function () {
    if (spawnSync('curl', ['--version']).status !== 0) this.skip();
    // Asynchronous: the server answering curl runs in this very process.
    const run = await promisify(execFile)('sh', ['examples/calculate.sh'], { env: { ...process.env, LINEWRIGHT_URL: baseUrl, LINEWRIGHT_TOKEN: token } });
    expect(run.stdout).to.match(/"z0":/).and.to.match(/"items":/);
  });
});
