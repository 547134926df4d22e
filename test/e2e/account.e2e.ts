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

describe('Invitation and password reset', () => {
  it('an admin invites by e-mail, the link from the caught mail creates the account, and a reset link sets a new password', async () => {
    const email = `invitee-${Date.now()}@halden.test`;
    const admin = await openPage();
    await signIn(admin, 'admin');
    await admin.goto('/admin');
    await admin.getByRole('tab', { name: 'Invitations' }).click();
    await admin.getByLabel('E-mail to invite').fill(email);
    await admin.getByRole('button', { name: 'Invite' }).click();
    await admin.getByRole('row').filter({ hasText: email }).waitFor();

    // The development mail viewer shows what the catcher caught; the link is in the text.
    await admin.getByRole('tab', { name: 'Caught mail' }).click();
    await admin.getByRole('button', { name: /You are invited to Linewright/ }).first().click();
    const mailText = await admin.locator('mat-expansion-panel.mat-expanded pre').textContent();
    const invitationLink = /https?:\/\/\S+\/accept-invitation\?token=\S+/.exec(mailText ?? '')![0];
    await screenshot(admin, 'admin-caught-invitation');

    const invitee = await openPage();
    await invitee.goto(new URL(invitationLink).pathname + new URL(invitationLink).search);
    await invitee.getByLabel('Your name').fill('Lars Nyberg');
    await invitee.getByLabel('New password', { exact: true }).fill('first-passphrase-1');
    await invitee.getByLabel('New password again').fill('first-passphrase-1');
    await invitee.getByRole('button', { name: 'Create my account' }).click();
    await invitee.waitForURL('**/account');
    await invitee.getByRole('heading', { name: 'Lars Nyberg' }).waitFor();

    await invitee.getByRole('button', { name: /^Account of/ }).click();
    await invitee.getByRole('menuitem', { name: 'Sign out' }).click();
    await invitee.waitForURL('**/sign-in');
    await invitee.getByRole('link', { name: 'Forgot the password?' }).click();
    await invitee.getByLabel('E-mail').fill(email);
    await invitee.getByRole('button', { name: 'Send the link' }).click();
    await invitee.getByRole('heading', { name: 'Check your mail' }).waitFor();

    const caught = await admin.request.get(`${BASE_URL}/api/v1/dev/mail`, { headers: { Accept: 'application/json' } });
    const reset = ((await caught.json()).items as { to: string[]; subject: string; text: string }[]).find((mail) => mail.to.includes(email) && /reset/i.test(mail.subject))!;
    const resetLink = new URL(/https?:\/\/\S+\/reset-password\?token=\S+/.exec(reset.text)![0]);
    await invitee.goto(resetLink.pathname + resetLink.search);
    await invitee.getByLabel('New password', { exact: true }).fill('second-passphrase-2');
    await invitee.getByLabel('New password again').fill('second-passphrase-2');
    await invitee.getByRole('button', { name: 'Set the password' }).click();
    await invitee.getByRole('heading', { name: 'Your password is set' }).waitFor();

    const signedIn = await fetch(`${BASE_URL}/api/v1/auth/token`, { method: 'POST', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify({ email, password: 'second-passphrase-2' }) });
    expect(signedIn.status).to.equal(200);
    await admin.context().close();
    await invitee.context().close();
  });
});
