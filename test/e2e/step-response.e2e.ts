import { expect } from 'chai';
import type { Page } from 'playwright-core';
import { openPage, outsideRequests, screenshot } from './browser';

/** SI prefixes as the page's engineering format writes them. */
const PREFIX: Record<string, number> = { f: 1e-15, p: 1e-12, n: 1e-9, µ: 1e-6, m: 1e-3, '': 1, k: 1e3, M: 1e6 };

/** "3.333 V" → 3.333, "1 ns" → 1e-9; the page shows four significant digits. */
function quantity(text: string | null, unit: string): number {
  const match = new RegExp(`^(−?-?[\\d.]+(?:e[-+]?\\d+)?) ([fpnµmkM]?)${unit}$`).exec((text ?? '').trim());
  if (!match) throw new Error(`"${text}" is not a quantity in ${unit}`);
  return Number(match[1].replace('−', '-')) * PREFIX[match[2]];
}

/** Four significant digits shown: half a unit in the fourth digit, relative. */
const SHOWN_TOLERANCE = 5e-4;

async function fill(page: Page, name: string, value: string): Promise<void> {
  await page.locator(`input[name="${name}"]`).fill(value);
}

describe('Step response page', () => {
  it('shows the closed-form levels for a 10 Ω driver into an open 50 Ω line, live in the browser', async () => {
    const page = await openPage();
    await page.goto('/step-response');
    const vs = 2;
    const rs = 10;
    const z0 = 50;
    await fill(page, 'amplitude', String(vs));
    await fill(page, 'sourceResistance', String(rs));
    await fill(page, 'z0', String(z0));
    await fill(page, 'delay', '1');
    await page.locator('mat-select[name="loadKind"]').click();
    await page.getByRole('option', { name: 'Open end', exact: true }).click();

    // Closed forms (H. W. Johnson and M. Graham, High-Speed Digital Design, 1993; REFERENCES.md, Time domain):
    // the launched step is V0 = Vs·Z0/(Rs + Z0); the open end (ΓL = +1) doubles it on arrival, one delay later;
    // the final level is Vs·RL/(Rs + RL) → Vs as RL → ∞.
    const v0 = (vs * z0) / (rs + z0);
    const final = quantity(await page.locator('[data-figure="load-final"] .value').textContent(), 'V');
    expect(final).to.be.closeTo(vs, vs * SHOWN_TOLERANCE);

    const first = page.locator('[data-arrival="0"]');
    expect(await first.locator('td').nth(2).textContent()).to.equal('Load');
    expect(quantity(await first.locator('[data-cell="level"]').textContent(), 'V')).to.be.closeTo(2 * v0, 2 * v0 * SHOWN_TOLERANCE);
    expect(quantity(await first.locator('[data-cell="time"]').textContent(), 's')).to.be.closeTo(1e-9, 1e-9 * SHOWN_TOLERANCE);
    // The same arrival in the summary figures.
    expect(quantity(await page.locator('[data-figure="first-arrival"] .value').textContent(), 'V')).to.be.closeTo(2 * v0, 2 * v0 * SHOWN_TOLERANCE);
    await page.locator('lw-bounce-panel svg').waitFor();
    await screenshot(page, 'step-response');

    // A series resistor Z0 − Rs at the driver: V0 = Vs/2, doubled at the open end to Vs in one clean step.
    await page.getByRole('tab', { name: 'Terminations' }).click();
    await page.getByRole('button', { name: 'Fit the series at the driver termination' }).click();
    await page.getByRole('tab', { name: 'Bounce diagram' }).click();
    expect(quantity(await page.locator('[data-arrival="0"] [data-cell="level"]').textContent(), 'V')).to.be.closeTo(vs, vs * SHOWN_TOLERANCE);
    await screenshot(page, 'step-response-series-terminated');

    expect(outsideRequests).to.deep.equal([]);
    await page.context().close();
  });

  it('explains the missing bounce diagram for a capacitive load and warns above 50 V', async () => {
    const page = await openPage({ width: 400, height: 800 });
    await page.goto('/step-response');
    await fill(page, 'amplitude', '120');
    await page.locator('mat-select[name="loadKind"]').click();
    await page.getByRole('option', { name: 'Capacitor to ground', exact: true }).click();
    await page.locator('[data-no-diagram]').waitFor();
    expect(await page.locator('[data-no-diagram]').textContent()).to.contain('The load has a capacitor.');
    expect(await page.locator('[data-high-voltage]').textContent()).to.contain('licensed practice');
    await screenshot(page, 'step-response-narrow');
    expect(outsideRequests).to.deep.equal([]);
    await page.context().close();
  });
});
