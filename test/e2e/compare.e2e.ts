import { expect } from 'chai';
import { calculate } from '@linewright/lines';
import { openPage, outsideRequests, screenshot } from './browser';

describe('Compare page', () => {
  it('puts two geometries side by side, marks their difference and keeps it in a shareable URL', async () => {
    const page = await openPage();
    await page.goto('/compare');
    await page.locator('lw-candidate-card').nth(1).waitFor();

    // Candidate 2 becomes a microstrip twice as wide as candidate 1's 0.3 mm.
    await page.locator('mat-select[name="kind-1"]').click();
    await page.getByRole('option', { name: 'Microstrip', exact: true }).click();
    await page.locator('input[name="w-1"]').fill('0.6');

    const narrow = calculate({ kind: 'microstrip', w: 0.3e-3, h: 0.17e-3, t: 34.8e-6, er: 4.2, tanDelta: 0.02, frequency: 1e9 });
    const wide = calculate({ kind: 'microstrip', w: 0.6e-3, h: 0.17e-3, t: 34.8e-6, er: 4.2, tanDelta: 0.02, frequency: 1e9 });
    const z0Row = page.locator('tr[data-figure="z0"] td');
    await page.waitForFunction(
      (text) => document.querySelectorAll('tr[data-figure="z0"] td')[1]?.textContent?.includes(text),
      String(Number(wide.z0.toPrecision(4))),
    );
    expect(await z0Row.nth(0).textContent()).to.contain(String(Number(narrow.z0.toPrecision(4))));
    expect(await z0Row.nth(1).getAttribute('class')).to.contain('is-notable');

    await page.waitForFunction(() => location.search.includes('lines='));
    const shared = page.url();
    const second = await openPage();
    await second.goto(shared);
    await second.locator('input[name="w-1"]').waitFor();
    expect(await second.locator('input[name="w-1"]').inputValue()).to.equal('0.6');

    await screenshot(page, 'compare-two-geometries');
    expect(outsideRequests).to.deep.equal([]);
    await page.context().close();
    await second.context().close();
  });
});
