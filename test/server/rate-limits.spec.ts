/** Sign-in and reset are rate-limited; this app gets a limit of 3 so the check is quick. */
import { expect } from 'chai';
import request from 'supertest';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { createLogger } from '../../server/logger';
import { testApp } from './test-app';

describe('rate limits', () => {
  const limited = () => createApp({ config: loadConfig({ ...process.env, LOGIN_RATE_LIMIT: '3', RESET_RATE_LIMIT: '2' }), db: testApp().db, logger: createLogger('silent') });

  it('the fourth sign-in attempt in the window answers 429 with Retry-After', async () => {
    const app = limited();
    for (let attempt = 0; attempt < 3; attempt++) {
      await request(app).post('/api/v1/auth/login').send({ email: 'nobody@halden.test', password: 'guess' }).expect(401);
    }
    const response = await request(app).post('/api/v1/auth/login').send({ email: 'nobody@halden.test', password: 'guess' }).expect(429);
    expect(response.headers['retry-after']).to.be.a('string');
    expect(response.headers['content-type']).to.match(/application\/problem\+json/);
  });

  it('reset requests have their own limit', async () => {
    const app = limited();
    for (let attempt = 0; attempt < 2; attempt++) await request(app).post('/api/v1/auth/password-reset').send({ email: 'nobody@halden.test' }).expect(202);
    await request(app).post('/api/v1/auth/password-reset').send({ email: 'nobody@halden.test' }).expect(429);
  });
});
