import path from 'node:path';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser, screenshot, signInThroughStandIn } from './browser';

const baseUrl = inject('baseUrl');
const oauthUrl = inject('oauthUrl');
const FILE = path.resolve(import.meta.dirname, '../fixtures/test-chlorotoluene.jdx');

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

async function as(login: string, start: string): Promise<Page> {
  const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
  const page = await context.newPage();
  page.on('pageerror', (e) => {
    throw e;
  });
  await signInThroughStandIn(page, baseUrl, login, start);
  return page;
}

async function mailbox(): Promise<{ to: string[]; subject: string }[]> {
  return (await (await fetch(`${oauthUrl}/_mail`)).json()).messages;
}

describe('curation in the browser', () => {
  it('contributor uploads and sends; curator returns; contributor fixes and resends; curator publishes', async () => {
    await fetch(`${oauthUrl}/_mail`, { method: 'DELETE' });

    // The contributor uploads a JCAMP-DX file and sees the live checks.
    const tomas = await as('tomas.reyes', '/submit');
    await tomas.getByLabel('Upload a spectrum file').setInputFiles(FILE);
    await tomas.getByLabel('Formula').first().waitFor();
    await expect.poll(() => tomas.getByLabel('Name', { exact: true }).inputValue()).toContain('4-Chlorotoluene');
    await expect.poll(() => tomas.getByLabel('Formula', { exact: true }).inputValue()).toMatch(/C\s*7\s*H\s*7\s*Cl/);
    const checks = tomas.getByRole('region', { name: 'Live consistency checks' });
    await checks.getByText(/isotope/i).first().waitFor();
    await screenshot(tomas, 'curation-1-submit');
    const created = tomas.waitForResponse((r) => r.url().endsWith('/api/v1/entries') && r.request().method() === 'POST');
    await tomas.getByRole('button', { name: 'Send for review' }).click();
    const body = await (await created).json();
    const { id, accession } = body.revision as { id: string; accession: string };
    await tomas.waitForURL(new RegExp(`/submit/${id}`));

    // The curator returns it with a comment.
    const dana = await as('dana.okafor', `/review/${id}`);
    await dana.getByRole('button', { name: 'Return with comment' }).waitFor();
    await dana.getByRole('textbox', { name: /comment/i }).first().fill('Please add the purity evidence of the standard.');
    const returned = dana.waitForResponse((r) => r.url().includes(`/revisions/${id}/decision`));
    await dana.getByRole('button', { name: 'Return with comment' }).click();
    expect((await returned).status()).toBe(200);
    await screenshot(dana, 'curation-2-returned');

    // The contributor reads the comment, fixes the notes and sends it again.
    await tomas.goto(`${baseUrl}/submit/${id}`);
    await tomas.getByText('Please add the purity evidence of the standard.').first().waitFor();
    await tomas.getByLabel('Sample notes').fill('Invented test standard, lot T-4411, 99.3 % by GC-FID (test data)');
    const resent = tomas.waitForResponse((r) => r.url().includes(`/revisions/${id}/submit`));
    await tomas.getByRole('button', { name: 'Send for review' }).click();
    expect((await resent).status()).toBe(200);

    // The curator publishes it.
    await dana.goto(`${baseUrl}/review/${id}`);
    const publish = dana.getByRole('button', { name: 'Publish r1' });
    await publish.waitFor();
    const published = dana.waitForResponse((r) => r.url().includes(`/revisions/${id}/decision`));
    await publish.click();
    expect((await published).status()).toBe(200);

    // The entry page shows r1 published.
    await tomas.goto(`${baseUrl}/entries/${accession}`);
    await tomas.getByText(`${accession} r1`).first().waitFor();
    await tomas.getByText(/published/i).first().waitFor();
    await screenshot(tomas, 'curation-3-entry');

    // Mails: the curators heard of the submission (twice), the contributor of both decisions.
    await expect
      .poll(
        async () => {
          const mails = await mailbox();
          const toTomas = mails.filter((m) => m.to.includes('tomas.reyes@quillmere.example')).map((m) => m.subject);
          const toDana = mails.filter((m) => m.to.includes('dana.okafor@quillmere.example')).map((m) => m.subject);
          return {
            returned: toTomas.some((s) => s.includes(`${accession} r1`) && s.includes('needs changes')),
            published: toTomas.some((s) => s.includes(`${accession} r1`) && s.includes('was published')),
            waiting: toDana.filter((s) => s.includes(`${accession} r1`) && s.includes('waiting for review')).length,
          };
        },
        { timeout: 20000, interval: 500 },
      )
      .toEqual({ returned: true, published: true, waiting: 2 });
  });
});
