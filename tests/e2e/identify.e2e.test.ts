import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser, screenshot, signInThroughStandIn } from './browser';

const baseUrl = inject('baseUrl');

type Peak = [number, number];
type LibraryRow = { accession: string; revision: number; name: string; nominalMass: number };

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

async function as(login: string, start: string): Promise<Page> {
  const context = await browser.newContext({ viewport: { width: 1280, height: 900 }, acceptDownloads: true });
  const page = await context.newPage();
  page.on('pageerror', (e) => {
    throw e;
  });
  await signInThroughStandIn(page, baseUrl, login, start);
  return page;
}

/** The API through the signed-in browser context (its session cookie). */
async function apiGet<T>(page: Page, url: string): Promise<T> {
  const response = await page.request.get(baseUrl + url);
  expect(response.status(), url).toBe(200);
  return (await response.json()) as T;
}

async function publishedRows(page: Page): Promise<LibraryRow[]> {
  return (await apiGet<{ entries: LibraryRow[] }>(page, '/api/v1/entries?limit=200')).entries;
}

async function peaksOf(page: Page, accession: string): Promise<Peak[]> {
  return (await apiGet<{ entry: { revision: { peaks: Peak[] } } }>(page, `/api/v1/entries/${accession}`)).entry.revision.peaks;
}

/**
 * The peaks as another run of the same compound might give them: every intensity moved by a few per
 * cent, deterministically (a fixed pattern, so a failure repeats), rounded to one decimal.
 */
function perturb(peaks: Peak[], salt: number): Peak[] {
  return peaks.map(([mz, intensity], i) => {
    const factor = 1 + 0.05 * Math.sin(1.7 * i + salt);
    return [mz, Math.max(0.1, Math.round(intensity * factor * 10) / 10)];
  });
}

const peakLines = (peaks: Peak[]) => peaks.map(([mz, i]) => `${mz} ${i}`).join('\n');

describe('identify in the browser', () => {
  it('a reader pastes a peak list, finds its entry first, opens the mirror view and the molecular-ion check, and exports CSV', async () => {
    const mira = await as('mira.lindqvist', '/identify');
    const rows = await publishedRows(mira);
    expect(rows.length).toBeGreaterThan(100);
    const source = rows.find((r) => r.name.length > 0 && r.nominalMass > 100) ?? rows[0]!;
    const query = perturb(await peaksOf(mira, source.accession), 0.3);
    expect(query.length).toBeGreaterThan(5);

    await mira.getByRole('heading', { name: 'Identify', exact: true }).waitFor();
    await mira.getByLabel('Name of the unknown (for the report)').fill('Lot E2E-1, peak at 9.8 min');
    await mira.getByRole('textbox', { name: /Peak list/ }).fill(peakLines(query));
    await mira.getByRole('button', { name: 'Identify', exact: true }).click();

    const results = mira.getByRole('region', { name: 'Results' });
    const table = results.getByRole('table', { name: 'Candidates' });
    await table.waitFor();
    const first = table.locator('tbody tr').first();
    await expect.poll(() => first.getAttribute('data-accession')).toBe(source.accession);
    const similarity = Number(await first.getByTestId('similarity').textContent());
    expect(similarity).toBeGreaterThanOrEqual(0);
    expect(similarity).toBeLessThanOrEqual(100);
    // A few per cent of intensity noise leaves the same compound far ahead of a chance match.
    expect(similarity).toBeGreaterThan(90);
    const similarities = (await table.getByTestId('similarity').allTextContents()).map(Number);
    expect(similarities).toEqual([...similarities].sort((a, b) => b - a));
    await screenshot(mira, 'identify-1-results');

    // The caution sits beside the results.
    await expect.poll(() => results.getByRole('complementary', { name: 'Caution' }).textContent()).toMatch(/Caution/);

    // Mirror view of the first candidate, shown by default; choosing the second moves it, choosing the first brings it back.
    const mirrorTitle = new RegExp(`^Mirror view: ${source.accession} r${source.revision}`);
    await results.getByRole('region', { name: mirrorTitle }).waitFor();
    const secondRow = table.locator('tbody tr').nth(1);
    const second = await secondRow.getAttribute('data-accession');
    await secondRow.getByRole('button', { name: /^Mirror view of / }).click();
    await results.getByRole('region', { name: new RegExp(`^Mirror view: ${second} r`) }).waitFor();
    await first.getByRole('button', { name: /^Mirror view of / }).click();
    const mirror = results.getByRole('region', { name: mirrorTitle });
    await mirror.getByRole('figure', { name: /^Mirror view: Unknown \(query\) above, / }).locator('canvas').first().waitFor();
    await mirror.getByText('Above: Unknown (query)').waitFor();
    await mirror.scrollIntoViewIfNeeded();
    await screenshot(mira, 'identify-2-mirror');

    // The molecular-ion check of the query.
    const check = results.getByRole('region', { name: 'Molecular-ion check' });
    await check.getByTestId('molecular-ion-check').waitFor();
    await expect.poll(() => check.textContent()).toMatch(/Molecular ion/);
    await expect.poll(() => check.textContent()).toMatch(/Nitrogen rule/);

    // CSV export: the header, then the first candidate's accession in the first row.
    const downloading = mira.waitForEvent('download');
    await results.getByRole('button', { name: 'Download CSV' }).click();
    const download = await downloading;
    expect(download.suggestedFilename()).toMatch(/^ionfolio-candidates-.*\.csv$/);
    const csv = readFileSync((await download.path())!, 'utf8').split(/\r?\n/);
    expect(csv[0]!.split(',').slice(0, 3)).toEqual(['rank', 'accession', 'revision']);
    expect(csv[0]).toContain('similarity_0_100');
    const firstRow = csv[1]!.split(',');
    expect(firstRow[0]).toBe('1');
    expect(firstRow[1]).toBe(source.accession);
    expect(firstRow[2]).toBe(String(source.revision));
    await mira.context().close();
  });

  it('a batch of 50 unknowns from a multi-block file runs to completion, its best candidates mostly the entries they came from', async () => {
    const mira = await as('mira.lindqvist', '/identify/batch');
    const rows = (await publishedRows(mira)).slice(0, 50);
    expect(rows).toHaveLength(50);
    const blocks: string[] = [];
    for (const [index, row] of rows.entries()) {
      const peaks = perturb(await peaksOf(mira, row.accession), index);
      blocks.push(`# Unknown ${index + 1} from ${row.accession}\n${peakLines(peaks)}`);
    }
    const dir = mkdtempSync(path.join(tmpdir(), 'ionfolio-batch-'));
    const file = path.join(dir, 'unknowns-50.txt');
    writeFileSync(file, blocks.join('\n\n') + '\n');

    await mira.getByLabel('Unknowns file').setInputFiles(file);
    await expect.poll(() => mira.getByRole('status').filter({ hasText: 'spectra read' }).textContent()).toMatch(/^50 spectra read/);
    const started = mira.waitForResponse((r) => r.url().includes('/api/v1/') && r.request().method() === 'POST');
    await mira.getByRole('button', { name: 'Start the batch' }).click();
    const start = await started;
    expect(start.status(), await start.text()).toBeLessThan(300);
    await expect.poll(() => mira.url()).toMatch(/\/identify\/batch\?job=/);

    // Follow the progress bar until it is full; what it showed on the way never goes back.
    const bar = mira.getByRole('progressbar', { name: 'Unknowns identified' });
    await bar.waitFor();
    expect(await bar.getAttribute('aria-valuemax')).toBe('50');
    const seen: number[] = [];
    const until = Date.now() + 45000;
    while (Date.now() < until) {
      const now = Number(await bar.getAttribute('aria-valuenow'));
      if (seen.at(-1) !== now) seen.push(now);
      if (now === 50) break;
      await mira.waitForTimeout(100);
    }
    expect(seen.at(-1)).toBe(50);
    expect(seen).toEqual([...seen].sort((a, b) => a - b));
    await mira.getByRole('status').filter({ hasText: 'Done' }).waitFor();
    await mira.getByTestId('batch-count').filter({ hasText: '50 / 50' }).waitFor();

    const table = mira.getByRole('table', { name: 'Best candidate per unknown' });
    const bodyRows = table.locator('tbody tr');
    await expect.poll(() => bodyRows.count()).toBe(50);
    const bestCells = await bodyRows.locator('td:nth-child(3)').allTextContents();
    const names = await bodyRows.locator('th').allTextContents();
    let hits = 0;
    for (const [i, name] of names.entries()) {
      const from = /from (\S+)$/.exec(name)?.[1];
      expect(from).toBe(rows[i]!.accession);
      if (bestCells[i]!.startsWith(`${from} r`)) hits += 1;
    }
    // Intensity noise of ±5 % should rarely let another demo entry overtake the source.
    expect(hits).toBeGreaterThanOrEqual(45);
    await mira.getByRole('link', { name: 'Download the results as CSV' }).waitFor();
    await screenshot(mira, 'identify-3-batch-done');
    console.log(`batch: progress seen ${seen.join(' → ')}; ${hits}/50 best candidates are the source entries`);

    // The rows count from 1, and drilling into the first unknown opens Identify with its own peaks.
    expect(await bodyRows.first().locator('td').first().textContent()).toBe('1');
    expect(await bodyRows.last().locator('td').first().textContent()).toBe('50');
    await mira.getByRole('link', { name: `Open ${names[0]} in Identify` }).click();
    await mira.waitForURL(/\/identify\?/);
    const drilled = mira.getByRole('region', { name: 'Results' }).getByRole('table', { name: 'Candidates' });
    await expect.poll(() => drilled.locator('tbody tr').first().getAttribute('data-accession')).toBe(rows[0]!.accession);
    await mira.context().close();
  });
});
