import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { launchBrowser, screenshot, signInControl, signInThroughStandIn } from './browser';

const baseUrl = inject('baseUrl');
let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe('signing in through the OAuth stand-in', () => {
  it('the sign-in page renders, and the demo curator lands on the app with the role shown', async () => {
    const context = await browser.newContext({ viewport: { width: 1280, height: 800 } });
    const page = await context.newPage();
    const errors: string[] = [];
    page.on('pageerror', (e) => errors.push(e.message));
    await page.goto(`${baseUrl}/sign-in`);
    // The note comes from /api/auth/config after the first render: wait for it, then look.
    await signInControl(page).waitFor();
    expect(await signInControl(page).isVisible()).toBe(true);
    await page.getByText(/stand-in/i).first().waitFor();
    expect(await page.getByText(/stand-in/i).first().isVisible()).toBe(true);
    await screenshot(page, 'sign-in');

    await signInThroughStandIn(page, baseUrl, 'dana.okafor', '/library');
    expect(new URL(page.url()).pathname).toBe('/library');
    const role = page.getByTestId('current-role');
    await role.waitFor();
    expect((await role.textContent())?.toLowerCase()).toContain('curator');
    await page.getByText('Dana Okafor').first().waitFor();
    await screenshot(page, 'signed-in-curator');
    expect(errors).toEqual([]);
    await context.close();
  });

  it('a reader does not see the admin pages, and signing out returns to sign-in', async () => {
    const context = await browser.newContext();
    const page = await context.newPage();
    await signInThroughStandIn(page, baseUrl, 'mira.lindqvist');
    await page.getByTestId('current-role').waitFor();
    expect((await page.getByTestId('current-role').textContent())?.toLowerCase()).toContain('reader');
    await page.goto(`${baseUrl}/admin/users`);
    await page.getByText(/not allowed for your role/i).first().waitFor();
    expect(await page.getByText(/not allowed for your role/i).first().isVisible()).toBe(true);
    await page.getByRole('button', { name: /sign out/i }).click();
    await page.waitForURL(/\/sign-in/);
    const me = await page.evaluate(async () => (await fetch('/api/v1/me')).status);
    expect(me).toBe(401);
    await context.close();
  });

  it('an admin changes a role on the admin page', async () => {
    const context = await browser.newContext({ viewport: { width: 1280, height: 800 } });
    const page = await context.newPage();
    await signInThroughStandIn(page, baseUrl, 'ines.varga', '/admin/users');
    const row = page.getByRole('row').filter({ hasText: 'tomas.reyes' });
    await row.waitFor();
    const select = row.getByRole('combobox');
    const was = await select.inputValue();
    const next = was === 'contributor' ? 'curator' : 'contributor';
    const saved = page.waitForResponse((r) => r.url().includes('/api/v1/admin/users/') && r.request().method() === 'PATCH');
    await select.selectOption(next);
    expect((await saved).status()).toBe(200);
    await screenshot(page, 'admin-users');
    await page.reload();
    await page.getByRole('row').filter({ hasText: 'tomas.reyes' }).waitFor();
    expect(await page.getByRole('row').filter({ hasText: 'tomas.reyes' }).getByRole('combobox').inputValue()).toBe(next);
    await context.close();
  });
});
