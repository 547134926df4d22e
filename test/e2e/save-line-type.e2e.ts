import { expect } from 'chai';
import { BASE_URL, openPage, screenshot } from './browser';
import { signIn } from './sign-in';

describe('Save as line type', () => {
  it('an engineer saves the calculator line as a draft line type with a target, material and tags', async () => {
    const page = await openPage();
    await signIn(page, 'engineer');
    await page.goto('/calculate');
    await page.getByLabel('Strip width', { exact: true }).fill('0.3');
    await page.getByRole('tab', { name: 'Hand off' }).click();
    await page.getByRole('button', { name: 'Save as line type' }).click();
    const dialog = page.getByRole('dialog');
    const name = `E2E saved line ${Date.now()}`;
    await dialog.getByLabel('Name', { exact: true }).fill(name);
    await dialog.getByRole('combobox', { name: 'Material' }).click();
    await page.locator('mat-option', { hasText: 'FR-4' }).click();
    await dialog.getByLabel('Tags').fill('outer, e2e');
    await screenshot(page, 'save-as-line-type');
    await dialog.getByRole('button', { name: 'Save as draft' }).click();
    await dialog.waitFor({ state: 'detached' });

    const listed = await page.request.get(`${BASE_URL}/api/v1/line-types?q=${encodeURIComponent(name)}`);
    const [saved] = (await listed.json()).items;
    expect(saved).to.deep.include({ kind: 'microstrip', state: 'draft', tags: ['outer', 'e2e'] });
    expect(saved.geometry.w).to.be.closeTo(0.3e-3, 1e-12);
    expect(saved.target.quantity).to.equal('z0');
    await page.context().close();
  });

  it('tells a signed-out visitor to sign in instead of offering the button', async () => {
    const page = await openPage();
    await page.goto('/calculate');
    await page.getByRole('tab', { name: 'Hand off' }).click();
    expect(await page.locator('[data-save-note]').textContent()).to.contain('Sign in');
    expect(await page.getByRole('button', { name: 'Save as line type' }).count()).to.equal(0);
    await page.context().close();
  });
});
