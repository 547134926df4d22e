/**
 * Signing in as the seeded demo team (seeds/01_demo_team.ts) once per role,
 * and reading the caught mail, for the API suites.
 */
import request from 'supertest';
import { DEMO_USERS } from '../../seeds/01_demo_team';
import type { Role } from '../../server/users/users-repository';
import { testApp } from './test-app';

const bearers = new Map<string, string>();

export function demoUser(role: Role) {
  return DEMO_USERS.find((user) => user.role === role)!;
}

/** A bearer sign-in token for an account (cached per e-mail and password). */
export async function bearerFor(email: string, password: string): Promise<string> {
  const key = `${email}\n${password}`;
  if (!bearers.has(key)) {
    const response = await request(testApp().app).post('/api/v1/auth/token').send({ email, password }).expect(200);
    bearers.set(key, response.body.accessToken);
  }
  return bearers.get(key)!;
}

/** `Authorization` header value for a demo role. */
export async function authAs(role: Role): Promise<string> {
  const user = demoUser(role);
  return `Bearer ${await bearerFor(user.email, user.password)}`;
}

/** The session cookie from a browser-style sign-in. */
export async function cookieFor(email: string, password: string): Promise<string> {
  const response = await request(testApp().app).post('/api/v1/auth/login').send({ email, password }).expect(200);
  const cookie = ([] as string[]).concat(response.headers['set-cookie'] ?? [])[0];
  return cookie.split(';')[0];
}

export interface CaughtMail {
  to: string[];
  subject: string;
  text: string;
}

/** The newest caught message to `to`, read through the development mail route as admin. */
export async function latestMailTo(to: string): Promise<CaughtMail> {
  const response = await request(testApp().app).get('/api/v1/dev/mail').set('Authorization', await authAs('admin')).expect(200);
  const mail = (response.body.items as CaughtMail[]).find((item) => item.to.includes(to));
  if (!mail) throw new Error(`No caught mail to ${to}`);
  return mail;
}

/** The `token` query value of the first link in a message. */
export function linkToken(mail: CaughtMail): string {
  const match = /[?&]token=([A-Za-z0-9_-]+)/.exec(mail.text);
  if (!match) throw new Error(`No link with a token in "${mail.subject}"`);
  return match[1];
}

let counter = 0;
/** A name no other test uses, so tests never depend on each other's data. */
export function uniqueName(stem: string): string {
  counter += 1;
  return `${stem} ${Date.now().toString(36)}-${counter}`;
}
