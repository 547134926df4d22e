import { expect } from 'chai';
import type { Page } from 'playwright-core';
import { BASE_URL, openPage, outsideRequests, screenshot } from './browser';
import { CSRF_HEADERS, signIn } from './sign-in';

/** The row of one entry in a catalog table, found through the search box. */
async function findRow(page: Page, name: string) {
  // The filtered page must have replaced the first one before a row's menu is opened, or the refresh closes the menu.
  // A search typed while the save dialog was still closing can be lost, so it is typed again if the page never narrows.
  for (let attempt = 1; ; attempt++) {
    await page.getByLabel('Search materials').fill('');
    await page.getByLabel('Search materials').fill(name);
    try {
      await page.waitForFunction(
        (wanted) => {
          const names = [...document.querySelectorAll('.name-link')].map((link) => link.textContent?.trim());
          return names.length === 1 && names[0] === wanted;
        },
        name,
        { timeout: 8_000 },
      );
      break;
    } catch (error) {
      if (attempt === 3) throw error;
    }
  }
  return page.getByRole('row').filter({ has: page.getByRole('button', { name: `Open ${name}`, exact: true }) });
}

async function act(page: Page, name: string, action: string): Promise<void> {
  await page.getByRole('button', { name: `Actions for ${name}` }).click();
  await page.getByRole('menuitem', { name: action }).click();
}

describe('Catalog', () => {
  it('an engineer saves a material as a draft and proposes it; an admin approves it', async () => {
    const name = `E2E laminate ${Date.now()}`;
    const engineer = await openPage();
    await signIn(engineer, 'engineer');
    await engineer.goto('/catalog/materials');
    await engineer.getByRole('button', { name: 'New material' }).click();
    const dialog = engineer.getByRole('dialog');
    await dialog.getByLabel('Name').fill(name);
    await dialog.getByLabel('Dk', { exact: true }).fill('3.9');
    await dialog.getByLabel('Df', { exact: true }).fill('0.012');
    await dialog.getByLabel('Reference frequency').fill('2');
    await dialog.getByRole('button', { name: 'Save as draft' }).click();
    await dialog.waitFor({ state: 'detached' });

    const draftRow = await findRow(engineer, name);
    expect(await draftRow.locator('.lw-state-chip').textContent()).to.contain('draft');
    await act(engineer, name, 'Propose for approval');
    await draftRow.locator('.lw-state-chip', { hasText: 'proposed' }).waitFor();

    // The stored values are SI: 2 GHz reads back as 2e9 Hz.
    const listed = await engineer.request.get(`${BASE_URL}/api/v1/materials?q=${encodeURIComponent(name)}`);
    const [stored] = (await listed.json()).items;
    expect(stored).to.include({ name, dk: 3.9, df: 0.012, referenceFrequency: 2e9, state: 'proposed' });
    await engineer.context().close();

    const admin = await openPage();
    await signIn(admin, 'admin');
    await admin.goto('/catalog/materials');
    const proposedRow = await findRow(admin, name);
    await act(admin, name, 'Approve');
    await proposedRow.locator('.lw-state-chip', { hasText: 'approved' }).waitFor();
    await screenshot(admin, 'catalog-material-approved');
    expect(outsideRequests).to.deep.equal([]);
    await admin.context().close();
  });

  it('a viewer reads the catalog without edit controls, and a direct write answers 403', async () => {
    const viewer = await openPage();
    await signIn(viewer, 'viewer');
    await viewer.goto('/catalog/materials');
    await viewer.getByRole('button', { name: /^Open / }).first().waitFor();
    expect(await viewer.getByRole('button', { name: 'New material' }).count()).to.equal(0);
    expect(await viewer.getByRole('button', { name: 'Import CSV' }).count()).to.equal(0);
    expect(await viewer.getByRole('button', { name: /^Actions for / }).count()).to.equal(0);

    await viewer.getByRole('button', { name: /^Open / }).first().click();
    const dialog = viewer.getByRole('dialog');
    await dialog.getByText('Read only').waitFor();
    expect(await dialog.getByRole('button', { name: /^Save/ }).count()).to.equal(0);
    await screenshot(viewer, 'catalog-viewer-read-only');

    // The hidden buttons are only a convenience: the server refuses the write itself.
    const write = await viewer.request.post(`${BASE_URL}/api/v1/materials`, { headers: CSRF_HEADERS, data: { name: 'Viewer attempt', dk: 4 } });
    expect(write.status()).to.equal(403);
    expect(write.headers()['content-type']).to.contain('application/problem+json');
    expect((await write.json()).detail).to.contain('engineer');
    await viewer.context().close();
  });

  it('previews a CSV import row by row, refuses it while a row is wrong, then imports all rows and exports them again', async () => {
    const stamp = Date.now();
    const page = await openPage();
    await signIn(page, 'engineer');
    await page.goto('/catalog/materials');
    await page.getByRole('button', { name: 'Import CSV' }).click();
    const dialog = page.getByRole('dialog');
    const file = (rows: string) => ({ name: 'materials.csv', mimeType: 'text/csv', buffer: Buffer.from(`name,dk,df,referenceFrequency\n${rows}`) });

    await dialog.locator('input[type=file]').setInputFiles(file(`Import A ${stamp},4.1,0.015,1 GHz\nImport B ${stamp},"4,2",0.01,1 GHz\n`));
    await dialog.locator('tr[data-row="2"]', { hasText: 'is not a number' }).waitFor();
    expect(await dialog.getByRole('button', { name: /^Import 2 materials/ }).isDisabled()).to.equal(true);
    await screenshot(page, 'catalog-import-preview');

    await dialog.locator('input[type=file]').setInputFiles(file(`Import A ${stamp},4.1,0.015,1 GHz\nImport B ${stamp},4.2,0.01,2.5 GHz\n`));
    await dialog.getByRole('button', { name: /^Import 2 materials/ }).click();
    await dialog.waitFor({ state: 'detached' });
    await page.getByLabel('Search materials').fill(String(stamp));
    await page.getByRole('button', { name: `Open Import B ${stamp}` }).waitFor();

    const exported = await page.request.get(`${BASE_URL}/api/v1/materials/export?q=${stamp}`);
    expect(exported.headers()['content-type']).to.contain('text/csv');
    expect(await exported.text()).to.contain(`Import B ${stamp},,4.2,0.01,2500000000`);
    await page.context().close();
  });
});
