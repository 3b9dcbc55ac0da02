import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { chromium, type Browser, type Page } from 'playwright-core';

/** Debian's chromium: playwright's own browser download cannot work on these machines. */
export const CHROMIUM_PATH = '/usr/bin/chromium';
export const CHROMIUM_ARGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

const ARTIFACTS_DIR =
  process.env.ARTIFACTS_DIR ?? path.resolve(__dirname, '..', '..', '..', '.artifacts');
export const SCREENS_DIR = path.join(ARTIFACTS_DIR, 'screens');

export interface TestBrowser {
  browser: Browser;
  /** A page in a context of its own (own cookies and storage), so two people can be signed in at once. */
  newPage(viewport: { width: number; height: number }): Promise<Page>;
  close(): Promise<void>;
}

/**
 * Headless Debian chromium through playwright-core. Playwright gives every launch a fresh
 * temporary --user-data-dir; chromium's config and cache go to a temp folder of ours.
 */
export async function launchBrowser(): Promise<TestBrowser> {
  if (!fs.existsSync(CHROMIUM_PATH)) {
    throw new Error(
      `${CHROMIUM_PATH} is missing: run the tests with npm test, which installs chromium.`,
    );
  }
  const home = fs.mkdtempSync(path.join(os.tmpdir(), 'sf-chromium-'));
  const browser = await chromium.launch({
    executablePath: CHROMIUM_PATH,
    headless: true,
    args: CHROMIUM_ARGS,
    env: {
      ...process.env,
      XDG_CONFIG_HOME: path.join(home, 'config'),
      XDG_CACHE_HOME: path.join(home, 'cache'),
    },
  });
  return {
    browser,
    async newPage(viewport) {
      const context = await browser.newContext({ viewport });
      return context.newPage();
    },
    async close() {
      await browser.close();
      fs.rmSync(home, { recursive: true, force: true });
    },
  };
}

/** Saves a full-page PNG to .artifacts/screens/<name>.png and returns its path. */
export async function screenshot(page: Page, name: string): Promise<string> {
  const file = path.join(SCREENS_DIR, `${name.replace(/[^A-Za-z0-9._-]+/g, '-')}.png`);
  fs.mkdirSync(SCREENS_DIR, { recursive: true });
  await page.screenshot({ path: file, fullPage: true });
  return file;
}
