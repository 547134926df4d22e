/**
 * The role × route matrix: for every route, each role's call is allowed or
 * denied on the server (401 without credentials, 403 below the route's least
 * role). Allowed calls send a deliberately incomplete body where that keeps
 * the database unchanged: passing authorization then shows as 400 or 404,
 * never as 401/403.
 */
import { expect } from 'chai';
import request from 'supertest';
import type { Role } from '../../server/users/users-repository';
import { ROLES } from '../../server/users/users-repository';
import { authAs } from './sign-in';
import { testApp } from './test-app';

type Least = Role | 'public';
interface RouteCase {
  method: 'get' | 'post' | 'patch' | 'delete';
  path: string;
  least: Least;
  body?: object;
}

const NO_SUCH_ID = 999999;
const microstrip = { kind: 'microstrip', w: 0.3e-3, h: 0.17e-3, t: 34.8e-6, er: 4.2 };

const catalogCases = (path: string): RouteCase[] => [
  { method: 'get', path: `/${path}`, least: 'viewer' },
  { method: 'get', path: `/${path}/1`, least: 'viewer' },
  { method: 'post', path: `/${path}`, least: 'engineer', body: {} },
  { method: 'patch', path: `/${path}/${NO_SUCH_ID}`, least: 'engineer', body: {} },
  { method: 'post', path: `/${path}/${NO_SUCH_ID}/state`, least: 'engineer', body: {} },
  { method: 'delete', path: `/${path}/${NO_SUCH_ID}`, least: 'engineer' },
];

const ROUTES: RouteCase[] = [
  { method: 'get', path: '/health', least: 'public' },
  { method: 'post', path: '/calculate', least: 'public', body: { spec: microstrip } },
  { method: 'post', path: '/solve', least: 'public', body: { spec: microstrip, unknown: 'w', target: { quantity: 'z0', value: 50 } } },
  { method: 'post', path: '/sweep', least: 'public', body: { spec: microstrip, field: 'w', from: 1e-4, to: 5e-4, points: 3 } },
  { method: 'post', path: '/tolerance', least: 'public', body: { spec: microstrip, spreads: { w: { plusMinusRelative: 0.05 } }, samples: 10 } },
  { method: 'post', path: '/compare', least: 'public', body: { specs: [microstrip, microstrip] } },
  { method: 'post', path: '/auth/logout', least: 'public' },
  { method: 'get', path: '/auth/me', least: 'viewer' },
  { method: 'patch', path: '/auth/me/preferences', least: 'viewer', body: {} },
  { method: 'post', path: '/auth/password', least: 'viewer', body: {} },
  { method: 'get', path: '/tokens', least: 'viewer' },
  { method: 'post', path: '/tokens', least: 'viewer', body: {} },
  { method: 'delete', path: `/tokens/${NO_SUCH_ID}`, least: 'viewer' },
  { method: 'get', path: '/users', least: 'admin' },
  { method: 'patch', path: `/users/${NO_SUCH_ID}`, least: 'admin', body: { role: 'viewer' } },
  { method: 'get', path: '/invitations', least: 'admin' },
  { method: 'post', path: '/invitations', least: 'admin', body: {} },
  { method: 'delete', path: `/invitations/${NO_SUCH_ID}`, least: 'admin' },
  { method: 'get', path: '/dev/mail', least: 'admin' },
  { method: 'get', path: '/materials/export', least: 'viewer' },
  { method: 'post', path: '/materials/import', least: 'engineer' },
  ...catalogCases('materials'),
  ...catalogCases('conductors'),
  ...catalogCases('line-types'),
];

const CALLERS: (Role | 'anonymous')[] = ['anonymous', ...ROLES];

function expectedFor(caller: Role | 'anonymous', least: Least): 'allowed' | 401 | 403 {
  if (least === 'public') return 'allowed';
  if (caller === 'anonymous') return 401;
  return ROLES.indexOf(caller) >= ROLES.indexOf(least) ? 'allowed' : 403;
}

describe('role × route matrix', () => {
  for (const route of ROUTES) {
    for (const caller of CALLERS) {
      const expected = expectedFor(caller, route.least);
      it(`${route.method.toUpperCase()} ${route.path} as ${caller} is ${expected === 'allowed' ? 'allowed' : `refused with ${expected}`}`, async () => {
        let call = request(testApp().app)[route.method](`/api/v1${route.path}`).set('If-Match', '"1"');
        if (caller !== 'anonymous') call = call.set('Authorization', await authAs(caller));
        const response = await (route.body ? call.send(route.body) : call);
        if (expected === 'allowed') expect(response.status, JSON.stringify(response.body)).to.not.be.oneOf([401, 403]);
        else expect(response.status, JSON.stringify(response.body)).to.equal(expected);
        expect(response.status).to.be.below(500);
      });
    }
  }
});
