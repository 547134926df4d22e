import { expect } from 'chai';
import { PDFParse } from 'pdf-parse';
import { writeFileSync, mkdirSync } from 'node:fs';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { BASE_URL, openPage, outsideRequests, screenshot } from './browser';
import { signIn } from './sign-in';

async function placeLine(page: Page, line: { label: string; layer: string; pair?: boolean; target: string }): Promise<void> {
  const form = page.getByRole('form', { name: 'Place a line' });
  await form.getByLabel('Line').fill(line.label);
  await form.getByRole('combobox', { name: 'Layer' }).click();
  await page.getByRole('option', { name: line.layer, exact: true }).click();
  if (line.pair) {
    await form.getByRole('combobox', { name: 'Type' }).click();
    await page.getByRole('option', { name: 'differential pair' }).click();
  }
  await form.getByLabel('Target Ω').fill(line.target);
  await form.getByRole('button', { name: 'Place line' }).click();
  await page.locator(`tr[data-line="${line.label}"]`).waitFor();
}

describe('Stackups', () => {
  it('an engineer builds a 4-layer stack, solves widths for 50 Ω and 100 Ω differential and exports the PDF', async () => {
    const name = `E2E logger stack ${Date.now()}`;
    const page = await openPage({ width: 1366, height: 900 });
    await signIn(page, 'engineer');
    await page.goto('/stackups');
    await page.getByRole('button', { name: 'New stackup' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByLabel('Name').fill(name);
    await dialog.getByRole('combobox', { name: 'Copper layers' }).click();
    await page.getByRole('option', { name: '4 layers' }).click();
    await dialog.getByRole('button', { name: 'Create' }).click();
    await dialog.waitFor({ state: 'detached' });

    await page.getByLabel('Search stackups').fill(name);
    await page.getByRole('button', { name: `Open ${name}` }).click();
    await page.getByRole('dialog').getByRole('link', { name: 'Open the editor' }).click();
    await page.getByRole('heading', { name }).waitFor();

    await placeLine(page, { label: 'Radio 50', layer: 'L1 Top', target: '50' });
    await placeLine(page, { label: 'USB 100 pair', layer: 'L4 Bottom', pair: true, target: '100' });
    await page.getByRole('button', { name: 'Solve width of Radio 50' }).click();
    await page.getByRole('button', { name: 'Solve width of USB 100 pair' }).click();
    const impedanceOf = (label: string) => page.locator(`tr[data-line="${label}"] [data-figure="impedance"]`).textContent();
    expect(Number(await impedanceOf('Radio 50'))).to.be.closeTo(50, 0.05);
    expect(Number(await impedanceOf('USB 100 pair'))).to.be.closeTo(100, 0.05);
    await page.getByRole('button', { name: 'Save' }).click();
    await page.getByText('Saved version 2.').waitFor();

    // The export opens the server's PDF in a new tab; the context sees its answer.
    const pdfAnswer = page.context().waitForEvent('response', (response) => response.url().includes('/table.pdf'));
    await page.getByRole('button', { name: 'PDF' }).click();
    const answer = await pdfAnswer;
    expect(answer.status()).to.equal(200);
    expect(answer.headers()['content-type']).to.contain('application/pdf');
    await screenshot(page, 'stackup-4-layer-solved');

    const stackups = await (await page.request.get(`${BASE_URL}/api/v1/stackups?q=${encodeURIComponent(name)}`)).json();
    const id = stackups.items[0].id;
    const pdf = Buffer.from(await (await page.request.get(`${BASE_URL}/api/v1/stackups/${id}/table.pdf`)).body());
    const outputDir = join(process.env['TEST_OUTPUT_DIR'] ?? 'test-output', 'e2e');
    mkdirSync(outputDir, { recursive: true });
    writeFileSync(join(outputDir, 'stackup-4-layer-table.pdf'), pdf);
    const parser = new PDFParse({ data: pdf });
    const text = (await parser.getText()).text;
    // The exported page as an image beside the screenshots (pdf.js through pdf-parse).
    const image = await parser.getScreenshot({ scale: 1.5 });
    writeFileSync(join(outputDir, 'stackup-4-layer-table-pdf.png'), Buffer.from(image.pages[0].data));
    expect(text).to.include('Radio 50');
    expect(text).to.include('USB 100 pair');
    expect(text).to.include('Caution: Results are estimates');

    const table = await (await page.request.get(`${BASE_URL}/api/v1/stackups/${id}/table`)).json();
    expect(table.rows.map((row: { impedance: number }) => Math.round(row.impedance))).to.deep.equal([50, 100]);
    expect(outsideRequests).to.deep.equal([]);
    await page.context().close();
  });
});
