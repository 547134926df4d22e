import { apiRequest } from './api-request';

describe('apiRequest', () => {
  const spec = { kind: 'microstrip', w: 3e-4, h: 1.7e-4, t: 3.48e-5, er: 4.2 } as const;

  it('wraps the spec the way POST /api/v1/calculate expects', () => {
    const { json } = apiRequest(spec, 'http://127.0.0.1:3000');
    expect(JSON.parse(json)).toEqual({ spec });
  });

  it('builds a curl command for the same origin with the JSON body', () => {
    const { curl } = apiRequest(spec, 'http://127.0.0.1:3000');
    expect(curl).toContain('http://127.0.0.1:3000/api/v1/calculate');
    expect(curl).toContain(`-d '${JSON.stringify({ spec })}'`);
  });
});
