import { readFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser, screenshot, signInThroughStandIn } from './browser';

const baseUrl = inject('baseUrl');

type LibraryRow = { accession: string; revision: number; name: string; formula: string; nominalMass: number };

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

async function reader(start: string): Promise<Page> {
  const context = await browser.newContext({ viewport: { width: 1280, height: 900 }, acceptDownloads: true });
  const page = await context.newPage();
  page.on('pageerror', (e) => {
    throw e;
  });
  await signInThroughStandIn(page, baseUrl, 'mira.lindqvist', start);
  return page;
}

/** Every published row, page by page (the e2e database grows as other journeys publish). */
async function allRows(page: Page): Promise<LibraryRow[]> {
  const rows: LibraryRow[] = [];
  let cursor: string | null = null;
  do {
    const url = `${baseUrl}/api/v1/entries?limit=200${cursor ? `&cursor=${encodeURIComponent(cursor)}` : ''}`;
    const answer = (await (await page.request.get(url)).json()) as { entries: LibraryRow[]; nextCursor: string | null };
    rows.push(...answer.entries);
    cursor = answer.nextCursor;
  } while (cursor !== null);
  return rows;
}

/** Chlorine in a Hill formula: `Cl` followed by a count or the next element, never part of another symbol. */
const hasChlorine = (formula: string) => /Cl(?![a-z])/.test(formula);

describe('library and entry pages in the browser', () => {
  it('filters the library by element and mass range, and every row shown matches', async () => {
    const mira = await reader('/library');
    const grid = mira.getByRole('grid', { name: 'Library entries' });
    await grid.getByRole('row').nth(1).waitFor();
    const filters = mira.getByRole('search', { name: 'Filter the library' });
    await filters.getByLabel('Contains elements').fill('Cl');
    await filters.getByLabel('Mass from').fill('100');
    await filters.getByLabel('to', { exact: true }).fill('160');
    const listed = mira.waitForResponse((r) => r.url().includes('/api/v1/entries?') && r.url().includes('elements=Cl'));
    await filters.getByRole('button', { name: 'Filter' }).click();
    const answer = (await (await listed).json()) as { entries: LibraryRow[]; nextCursor: string | null };
    await expect.poll(() => mira.url()).toMatch(/elements=Cl/);
    expect(answer.nextCursor).toBeNull();
    expect(answer.entries.length).toBeGreaterThan(0);

    // Every row the grid shows (it draws only what is on screen) carries chlorine and a mass inside the range.
    const rows = grid.locator('[role=row][aria-rowindex]:not([aria-rowindex="1"])');
    await expect.poll(async () => (await rows.first().getByRole('gridcell').first().textContent()) ?? '').toBe(answer.entries[0]!.accession);
    const shown = await rows.evaluateAll((els) => els.map((el) => Array.from(el.querySelectorAll('[role=gridcell]'), (c) => c.textContent ?? '')));
    expect(shown.length).toBeGreaterThan(0);
    for (const [accession, , formula, mass] of shown) {
      expect(hasChlorine(formula!), `${accession} ${formula}`).toBe(true);
      expect(Number(mass), `${accession} nominal mass`).toBeGreaterThanOrEqual(100);
      expect(Number(mass), `${accession} nominal mass`).toBeLessThanOrEqual(160);
    }
    // And the rows behind them, as the API sent them.
    for (const row of answer.entries) {
      expect(hasChlorine(row.formula), `${row.accession} ${row.formula}`).toBe(true);
      expect(row.nominalMass).toBeGreaterThanOrEqual(100);
      expect(row.nominalMass).toBeLessThanOrEqual(160);
    }
    // The filter left some chlorine-free or out-of-range entries behind.
    const all = await allRows(mira);
    expect(all.length).toBeGreaterThan(answer.entries.length);
    const expected = all.filter((r) => hasChlorine(r.formula) && r.nominalMass >= 100 && r.nominalMass <= 160).map((r) => r.accession);
    expect(answer.entries.map((r) => r.accession).sort()).toEqual(expected.sort());
    await screenshot(mira, 'library-1-filtered');

    await mira.goto(`${baseUrl}/overview`);
    await mira.getByRole('heading', { name: 'Entries by state' }).waitFor();
    await mira.getByRole('heading', { name: 'Element coverage' }).waitFor();
    await mira.locator('canvas').first().waitFor();
    await screenshot(mira, 'library-3-overview');
    await mira.context().close();
  });

  it('an entry with two revisions: compare them, export JCAMP-DX, and search the library with its spectrum', async () => {
    const mira = await reader('/library');
    const row = (await allRows(mira)).find((r) => r.revision >= 2);
    expect(row, 'a published demo entry at r2 or later').toBeDefined();
    const { accession } = row!;
    const view = (await (await mira.request.get(`${baseUrl}/api/v1/entries/${accession}`)).json()) as { entry: { revisions: { number: number }[] } };
    expect(view.entry.revisions.length).toBeGreaterThanOrEqual(2);

    await mira.goto(`${baseUrl}/entries/${accession}`);
    await mira.getByText(`${accession} r${row!.revision}`).first().waitFor();

    // The compare panel: by default the revision before the shown one against it.
    const compare = mira.getByRole('region', { name: 'Compare revisions' });
    await compare.scrollIntoViewIfNeeded();
    const from = compare.getByLabel('Compare');
    const to = compare.getByLabel('with');
    expect(await from.inputValue()).toBe(String(row!.revision - 1));
    expect(await to.inputValue()).toBe(String(row!.revision));
    const cosine = compare.locator('output[aria-label="Cosine similarity"]');
    await cosine.first().waitFor();
    const cosineText = (await cosine.first().textContent()) ?? '';
    expect(cosineText).toMatch(/\d/);
    await compare.getByRole('heading', { name: 'Peaks' }).waitFor();
    // Comparing a revision with itself asks for two different ones.
    await to.selectOption(String(row!.revision - 1));
    await expect.poll(() => mira.url()).toMatch(new RegExp(`compare=${row!.revision - 1}&to=${row!.revision - 1}`));
    await compare.getByText('Choose two different revisions to see what changed.').waitFor();
    await to.selectOption(String(row!.revision));
    await cosine.first().waitFor();
    await screenshot(mira, 'library-2-entry');

    // Export JCAMP-DX.
    const downloading = mira.waitForEvent('download');
    await mira.getByRole('link', { name: 'Export JCAMP-DX' }).click();
    const jcamp = readFileSync((await (await downloading).path())!, 'utf8');
    expect(jcamp.startsWith('##TITLE=')).toBe(true);
    expect(jcamp).toContain('##END=');

    // Search the library with this spectrum: Identify opens with candidates, the entry itself left out.
    await mira.getByRole('link', { name: 'Search the library with this spectrum' }).click();
    await mira.waitForURL(/\/identify\?/);
    expect(new URL(mira.url()).searchParams.get('exclude')).toBe(accession);
    const table = mira.getByRole('region', { name: 'Results' }).getByRole('table', { name: 'Candidates' });
    await table.waitFor();
    const accessions = await table.locator('tbody tr').evaluateAll((els) => els.map((el) => el.getAttribute('data-accession')));
    expect(accessions.length).toBeGreaterThan(0);
    expect(accessions).not.toContain(accession);
    await mira.getByText(`${accession} left out`).first().waitFor();
    await mira.context().close();
  });
});
