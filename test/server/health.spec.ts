import { expect } from 'chai';
import request from 'supertest';
import { testApp } from './test-app';

describe('GET /api/v1/health', () => {
  it('reports the server and the database as up', async () => {
    const response = await request(testApp().app).get('/api/v1/health').expect(200);
    expect(response.body).to.include({ status: 'ok', database: 'ok' });
  });

  it('answers an unknown API route with problem+json 404', async () => {
    const response = await request(testApp().app).get('/api/v1/no-such-route').expect(404);
    expect(response.headers['content-type']).to.match(/application\/problem\+json/);
    expect(response.body).to.include({ status: 404 });
  });
});
