/**
 * Headless Chromium from Debian's package, driven by playwright-core (no
 * browser download). Each flow saves a screenshot under test-output/e2e/.
 */
import { chromium, type Browser, type Page } from 'playwright-core';
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';

export const BASE_URL = process.env['E2E_BASE_URL'] ?? 'http://127.0.0.1:3100';
const SCREENSHOT_DIR = join(process.env['TEST_OUTPUT_DIR'] ?? 'test-output', 'e2e');

// Flags as Chromium needs them on a closed network as root without a GPU.
const CHROMIUM_ARGS = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--disable-dev-shm-usage',
];

let browser: Browser | undefined;
/** Pages still open, so a failing flow leaves a picture of where it stopped. */
const openPages = new Set<Page>();

/** Requests any page made to a host other than our own; flows assert it stays empty. */
export const outsideRequests: string[] = [];

export async function openPage(viewport = { width: 1366, height: 768 }): Promise<Page> {
  browser ??= await chromium.launch({
    executablePath: process.env['CHROMIUM_PATH'] ?? '/usr/bin/chromium',
    headless: true,
    args: CHROMIUM_ARGS,
  });
  const context = await browser.newContext({ viewport, baseURL: BASE_URL });
  const page = await context.newPage();
  openPages.add(page);
  page.on('close', () => openPages.delete(page));
  // Every request must stay on our own host: fonts and icons ship with the app.
  page.on('request', (request) => {
    const url = new URL(request.url());
    if (url.protocol.startsWith('http') && url.host !== new URL(BASE_URL).host) outsideRequests.push(request.url());
  });
  return page;
}

export async function screenshot(page: Page, name: string): Promise<void> {
  mkdirSync(SCREENSHOT_DIR, { recursive: true });
  await page.screenshot({ path: join(SCREENSHOT_DIR, `${name}.png`), fullPage: true });
}

export const mochaHooks = {
  async afterEach(this: Mocha.Context) {
    if (this.currentTest?.state !== 'failed') return;
    let index = 0;
    for (const page of openPages) await screenshot(page, `failed-${this.currentTest.title.slice(0, 40).replace(/\W+/g, '-')}-${index++}`);
  },
  async afterAll() {
    await browser?.close();
    browser = undefined;
  },
};
