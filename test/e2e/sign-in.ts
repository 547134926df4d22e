/**
 * Signs a page in as one of the demo team. The first time per role it goes
 * through the sign-in page; later pages reuse that session cookie, so the
 * suite stays well inside the server's sign-in rate limit.
 */
import type { Cookie, Page } from 'playwright-core';

export type DemoRole = 'admin' | 'engineer' | 'viewer';

/** The demo sign-ins of seeds/01_demo_team.ts. */
export const DEMO_PASSWORD: Record<DemoRole, string> = {
  admin: 'halden-admin-1',
  engineer: 'halden-engineer-1',
  viewer: 'halden-viewer-1',
};

const sessions = new Map<DemoRole, Cookie[]>();

export async function signIn(page: Page, role: DemoRole): Promise<void> {
  const cookies = sessions.get(role);
  if (cookies) {
    await page.context().addCookies(cookies);
    return;
  }
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(`${role}@halden.test`);
  await page.getByLabel('Password').fill(DEMO_PASSWORD[role]);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL('**/calculate');
  sessions.set(role, await page.context().cookies());
}

/** Headers a cookie-authenticated write needs (the server's CSRF rule). */
export const CSRF_HEADERS = { 'X-Requested-With': 'XMLHttpRequest', 'Content-Type': 'application/json' };
