import { expect } from 'chai';
import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { calculate, fieldSolveLine, lineKinds, solve } from '@linewright/lines';
import type { Page } from 'playwright-core';
import { openPage, outsideRequests, screenshot } from './browser';

async function chooseOption(page: Page, selectName: string, option: string): Promise<void> {
  await page.locator(`mat-select[name="${selectName}"]`).click();
  await page.getByRole('option', { name: option, exact: true }).click();
}

/**
 * Browser-side timing of nine edits: from the input event to the result text
 * changing (Angular's scheduling included), sorted. Sent as source text because tsx would wrap inline helpers
 * in a `__name` call the page does not have.
 */
function measureEdits(fieldName: string): string {
  return `(async () => {
    const input = document.querySelector('input[name="${fieldName}"]');
    const readout = () => document.querySelector('lw-line-readout .value')?.textContent ?? '';
    const times = [];
    for (let i = 0; i < 9; i++) {
      const before = readout();
      const started = performance.now();
      input.value = String(3 + (i % 2) * 0.5 + i * 0.01);
      input.dispatchEvent(new Event('input', { bubbles: true }));
      // A MutationObserver fires right after the DOM changes, so the figure is not rounded up to a frame.
      await new Promise((done) => {
        const observer = new MutationObserver(() => {
          if (readout() !== before) { observer.disconnect(); done(); }
        });
        observer.observe(document.querySelector('lw-line-readout') ?? document.body, { subtree: true, childList: true, characterData: true });
      });
      times.push(performance.now() - started);
    }
    return times.sort((a, b) => a - b);
  })()`;
}

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
    expect(await shown.textContent()).to.equal(`${Number(expected.z0.toPrecision(4))} Ω`);

    await page.locator('[data-check="agrees"]').waitFor({ timeout: 10_000 });
    await page.locator('[data-dimension="w"]').waitFor();
    await screenshot(page, 'calculate-microstrip');
    expect(outsideRequests).to.deep.equal([]);
    await page.context().close();
  });

  it('solves for the strip width that gives 50 Ω and shows it in the width field', async () => {
    const page = await openPage();
    await page.goto('/calculate');
    await chooseOption(page, 'unknown', 'Strip width');
    await page.locator('input[name="targetValue"]').fill('50');

    // Defaults: h 0.17 mm, t 34.8 µm, εr 4.3; the library's own solve is the reference.
    const expected = solve({ kind: 'microstrip', w: 0.3e-3, h: 0.17e-3, t: 34.8e-6, er: 4.3 }, 'w', { quantity: 'z0', value: 50 });
    const width = page.locator('input[name="w"]');
    await page.waitForFunction(() => (document.querySelector('input[name="w"]') as HTMLInputElement | null)?.readOnly === true);
    expect(Number(await width.inputValue())).to.be.closeTo(expected.value * 1e3, 1e-4);
    expect(await page.locator('[data-figure="z0"] .value').textContent()).to.equal('50 Ω');
    await screenshot(page, 'calculate-solve-width');
    await page.context().close();
  });

  it('checks the line with the field solver in a Web Worker and shows the field Z0 beside the formula', async () => {
    const page = await openPage();
    await page.goto('/calculate');
    await page.getByRole('tab', { name: 'Field solver' }).click();
    await page.getByRole('button', { name: 'Check with the field solver' }).click();
    const fieldCell = page.locator('tr[data-row="Z0"] td[data-cell="field"]');
    await fieldCell.waitFor({ timeout: 30_000 });
    // The same solve in Node, with the page's tolerance (0.5 %): the worker runs the same library.
    const reference = await fieldSolveLine({ kind: 'microstrip', w: 0.3e-3, h: 0.17e-3, t: 34.8e-6, er: 4.3 }, { tolerance: 0.005 });
    const shown = Number((await fieldCell.textContent())!.replace('Ω', '').trim());
    expect(shown).to.be.closeTo(reference.z0, reference.z0 * 1e-4);
    await screenshot(page, 'calculate-field-solver');
    await page.context().close();
  });

  it('records keystroke-to-result time for every kind (figures for the bench, not a timed assertion)', async () => {
    const page = await openPage();
    await page.goto('/calculate');
    const figures: Record<string, number> = {};
    for (const kind of lineKinds) {
      await chooseOption(page, 'kind', kind.label);
      const field = kind.fields.find((candidate) => candidate.name === 'er')!;
      await page.locator(`input[name="${field.name}"]`).waitFor();
      const samples = (await page.evaluate(measureEdits(field.name))) as number[];
      // The median of the nine edits.
      figures[kind.kind] = samples[Math.floor(samples.length / 2)];
    }
    const outputDir = join(process.env['TEST_OUTPUT_DIR'] ?? 'test-output', 'perf');
    mkdirSync(outputDir, { recursive: true });
    writeFileSync(join(outputDir, 'keystroke-to-result.json'), JSON.stringify({ measuredAt: new Date().toISOString(), medianMs: figures }, null, 2));
    expect(Object.keys(figures)).to.have.length(lineKinds.length);
    await page.context().close();
  });
});
