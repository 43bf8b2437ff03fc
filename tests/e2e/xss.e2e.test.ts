import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser, screenshot, signInThroughStandIn } from './browser';

const baseUrl = inject('baseUrl');
const W = { 'X-Requested-With': 'ionfolio' };
const SCRIPT = '<script>window.__xss=1</script>';
const IMG = '<img src=x onerror="window.__xss=1">';

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

interface Watched {
  page: Page;
  /** Console lines in which the browser refused something under the CSP, and securitypolicyviolation events. */
  violations: string[];
}

/** A signed-in page that records every CSP violation, whether reported on the console or as an event. */
async function as(login: string, start: string): Promise<Watched> {
  const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
  // Runs before any page script, outside the page's CSP (it is injected by the browser driver).
  await context.addInitScript(() => {
    const w = window as unknown as { __csp: string[] };
    w.__csp = [];
    document.addEventListener('securitypolicyviolation', (e) => {
      w.__csp.push(`${e.violatedDirective} ${e.blockedURI}`);
    });
  });
  const page = await context.newPage();
  const violations: string[] = [];
  page.on('console', (m) => {
    if (/Refused to|Content Security Policy/i.test(m.text())) violations.push(m.text());
  });
  page.on('pageerror', (e) => violations.push(`page error: ${e.message}`));
  await signInThroughStandIn(page, baseUrl, login, start);
  return { page, violations };
}

async function assertInert({ page, violations }: Watched, where: string): Promise<void> {
  expect(await page.evaluate(() => (window as unknown as { __xss?: unknown }).__xss), `window.__xss on ${where}`).toBeUndefined();
  // The payload never became markup: no <img src="x"> and no inline script carrying it.
  expect(await page.locator('img[src="x"]').count(), `img on ${where}`).toBe(0);
  expect(await page.evaluate(() => Array.from(document.scripts).filter((s) => s.text.includes('__xss')).length), `script on ${where}`).toBe(0);
  const events = await page.evaluate(() => (window as unknown as { __csp: string[] }).__csp);
  expect([...violations, ...events], `CSP violations on ${where}`).toEqual([]);
}

describe('hostile text in names, synonyms, notes and comments', () => {
  it('is shown as text to the curator on the review desk, the revision under review with its comments and the entry page; nothing runs and the CSP is never violated', async () => {
    // The contributor submits through the API with the signed-in browser session.
    const tomas = await as('tomas.reyes', '/submit');
    await assertInert(tomas, 'the submit page');
    const content = {
      name: `Chloro probe ${SCRIPT} (test)`,
      synonyms: [IMG, `syn ${SCRIPT}`],
      formula: 'C6H5Cl',
      structure: 'Clc1ccccc1',
      structureFormat: 'smiles',
      casRn: null,
      peaks: [[50, 12], [51, 14], [77, 62], [112, 100], [113, 6.6], [114, 32.5], [115, 2.1]],
      conditions: { ionizationEnergyEv: 70, instrumentType: 'single quadrupole GC–MS', inlet: 'GC' },
      retentionIndex: { value: 846, column: 'non-polar' },
      sampleNotes: `Invented lot ${IMG} ${SCRIPT}`,
      changeNote: `First recording ${IMG}`,
    };
    const created = await tomas.page.request.post(`${baseUrl}/api/v1/entries`, { headers: W, data: content });
    expect(created.status(), await created.text()).toBe(201);
    const { id, accession, lockVersion } = (await created.json()).revision as { id: string; accession: string; lockVersion: number };
    const comment = await tomas.page.request.post(`${baseUrl}/api/v1/revisions/${id}/comments`, { headers: W, data: { body: `Note for review ${IMG} ${SCRIPT}` } });
    expect(comment.status(), await comment.text()).toBe(201);
    const sent = await tomas.page.request.post(`${baseUrl}/api/v1/revisions/${id}/submit`, { headers: W, data: { lockVersion } });
    expect(sent.status(), await sent.text()).toBe(200);
    const sentLock = (await sent.json()).revision.lockVersion as number;

    // The curator sees it on the review desk …
    const dana = await as('dana.okafor', '/review');
    await dana.page.getByText(`Chloro probe ${SCRIPT} (test)`).first().waitFor();
    await assertInert(dana, 'the review desk');
    await screenshot(dana.page, 'xss-1-review-desk');

    // … opens the revision under review, with its notes and the comment …
    await dana.page.goto(`${baseUrl}/review/${id}`);
    await dana.page.getByText(`Note for review ${IMG} ${SCRIPT}`).first().waitFor();
    await dana.page.getByText(`Chloro probe ${SCRIPT} (test)`).first().waitFor();
    await dana.page.getByText(IMG, { exact: false }).first().waitFor();
    await assertInert(dana, 'the revision under review');
    await screenshot(dana.page, 'xss-2-review-revision');

    // … publishes it and reads the entry page.
    const published = await dana.page.request.post(`${baseUrl}/api/v1/revisions/${id}/decision`, { headers: W, data: { decision: 'publish', lockVersion: sentLock, comment: `Fine ${SCRIPT}` } });
    expect(published.status(), await published.text()).toBe(200);
    await dana.page.goto(`${baseUrl}/entries/${accession}`);
    await dana.page.getByText(`Chloro probe ${SCRIPT} (test)`).first().waitFor();
    await dana.page.getByText(`syn ${SCRIPT}`, { exact: false }).first().waitFor();
    await dana.page.getByText(`Invented lot ${IMG} ${SCRIPT}`, { exact: false }).first().waitFor();
    // Wait for the chart, the structure drawing and the comments, so that their rendering is watched too.
    await dana.page.getByText(`Fine ${SCRIPT}`, { exact: false }).first().waitFor();
    await dana.page.getByText(`Note for review ${IMG} ${SCRIPT}`, { exact: false }).first().waitFor();
    await dana.page.getByText(/Drawing the (spectrum|structure)/).first().waitFor({ state: 'detached' });
    await assertInert(dana, 'the entry page');
    await screenshot(dana.page, 'xss-3-entry');
    // The document title, where the name is shown too, holds it as text.
    expect(await dana.page.title()).toContain(SCRIPT);
  });
});
