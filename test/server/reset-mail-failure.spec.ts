import request from 'supertest';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { createLogger } from '../../server/logger';
import { testApp } from './test-app';

describe('password reset when mail cannot be sent', () => {
  it('answers the same 202 for a known address, so the failure reveals nothing about accounts', async () => {
    const failingMailer = { send: () => Promise.reject(new Error('SMTP down')) };
    const app = createApp({ config: loadConfig(process.env), db: testApp().db, logger: createLogger('silent'), mailer: failingMailer });
    await request(app).post('/api/v1/auth/password-reset').send({ email: 'viewer@halden.test' }).expect(202);
    await request(app).post('/api/v1/auth/password-reset').send({ email: 'nobody@halden.test' }).expect(202);
  });
});
