import { expect } from 'chai';
import { calculate } from '@linewright/lines';
import { openPage, outsideRequests, screenshot } from './browser';

describe('Calculate page', () => {
  it('shows the microstrip impedance live as a geometry is typed, and the API agrees', async () => {
    const page = await openPage();
    await page.goto('/calculate');
    await page.getByLabel('Strip width', { exact: true }).fill('0.25');
    await page.getByLabel('Dielectric height', { exact: true }).fill('0.2');
    await page.getByLabel('Dielectric constant (Dk)').fill('4.5');

    // The same spec through the library directly: 0.25 mm, 0.2 mm, the default 34.8 µm copper, εr 4.5.
    const expected = calculate({ kind: 'microstrip', w: 0.25e-3, h: 0.2e-3, t: 34.8e-6, er: 4.5 });
    const shown = page.locator('[data-figure="z0"] .value');
    await expect(await shown.textContent()).to.equal(`${Number(expected.z0.toPrecision(4))} Ω`);

    await page.locator('[data-check="agrees"]').waitFor({ timeout: 10_000 });
    await screenshot(page, 'calculate-microstrip');
    expect(outsideRequests).to.deep.equal([]);
    await page.context().close();
  });
});
