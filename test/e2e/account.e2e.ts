import { expect } from 'chai';
import { BASE_URL, openPage, outsideRequests, screenshot } from './browser';
import { signIn } from './sign-in';

describe('Account', () => {
  it('an engineer creates an API token, a script lists line types with it, and revoking it locks the script out', async () => {
    const page = await openPage();
    await signIn(page, 'engineer');
    await page.goto('/account');
    const name = `e2e script ${Date.now()}`;
    await page.getByLabel('Token name').fill(name);
    await page.getByRole('button', { name: 'Create token' }).click();
    const secret = (await page.locator('[data-secret]').textContent())!.trim();
    expect(secret).to.match(/^lwt_/);
    await page.getByRole('row').filter({ hasText: name }).waitFor();
    await screenshot(page, 'account-api-token-created');

    // The script's side: plain Node fetch with the bearer token, no cookie.
    const listed = await fetch(`${BASE_URL}/api/v1/line-types?state=approved`, { headers: { Authorization: `Bearer ${secret}` } });
    expect(listed.status).to.equal(200);
    const page1 = (await listed.json()) as { items: { name: string; state: string }[]; total: number };
    expect(page1.total).to.be.greaterThan(0);
    expect(page1.items.every((item) => item.state === 'approved')).to.equal(true);

    // A read token cannot write.
    const write = await fetch(`${BASE_URL}/api/v1/materials`, {
      method: 'POST',
      headers: { Authorization: `Bearer ${secret}`, 'Content-Type': 'application/json' },
      body: JSON.stringify({ name: 'From a read token', dk: 4 }),
    });
    expect(write.status).to.equal(403);

    await page.reload();
    const row = page.getByRole('row').filter({ hasText: name });
    expect(await row.textContent()).not.to.contain('Never');
    await page.getByRole('button', { name: `Revoke ${name}` }).click();
    await row.waitFor({ state: 'detached' });
    const refused = await fetch(`${BASE_URL}/api/v1/line-types`, { headers: { Authorization: `Bearer ${secret}` } });
    expect(refused.status).to.equal(401);
    expect(outsideRequests).to.deep.equal([]);
    await page.context().close();
  });
});
