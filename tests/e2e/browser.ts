import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { chromium, type Browser, type Page } from 'playwright-core';

export const SCREENSHOTS = path.resolve(import.meta.dirname, 'screenshots');

/** Debian's Chromium, headless, with the flags this closed network needs. */
export async function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: '/usr/bin/chromium',
    headless: true,
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
      '--no-first-run',
      '--disable-quic',
    ],
  });
}

export async function screenshot(page: Page, name: string): Promise<void> {
  mkdirSync(SCREENSHOTS, { recursive: true });
  await page.screenshot({ path: path.join(SCREENSHOTS, `${name}.png`), fullPage: true });
}

/** The sign-in control: a link that navigates to the provider (a button would do too). */
export const signInControl = (page: Page) =>
  page.getByRole('link', { name: /sign in with github/i }).or(page.getByRole('button', { name: /sign in with github/i }));

/** Signs in through the sign-in page and the OAuth stand-in's page, as a person would. */
export async function signInThroughStandIn(page: Page, baseUrl: string, login: string, startPath = '/'): Promise<void> {
  await page.goto(baseUrl + startPath);
  await page.waitForURL(/\/sign-in/);
  await signInControl(page).click();
  await page.waitForURL(/login\/oauth\/authorize/);
  await page.locator(`button[data-login="${login}"]`).click();
  await page.waitForURL((url) => url.origin === baseUrl && !url.pathname.startsWith('/sign-in'));
}
