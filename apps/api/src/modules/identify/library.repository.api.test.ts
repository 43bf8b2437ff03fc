import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestContext, signInAs, type TestContext } from '../../testing/test-app';
import { publishEntry, seeded, simulatedPeaks, withdrawAll } from './identify-test-helpers';
import { loadLibraryIndex } from './library-index';
import { countPublished, publishedRevisionPages } from './library.repository';

let ctx: TestContext;
let curator: Awaited<ReturnType<typeof signInAs>>;
const accessions: string[] = [];

beforeAll(async () => {
  ctx = await createTestContext();
  const author = await signInAs(ctx, 'contributor');
  curator = await signInAs(ctx, 'curator');
  const random = seeded(4242);
  for (let i = 0; i < 5; i++) {
    const name = `Paged load compound ${i} (simulated)`;
    accessions.push(await publishEntry(author.agent, curator.agent, { name, formula: 'C21H44O', peaks: simulatedPeaks(random) }));
  }
  // One of them withdrawn: the library load must leave it out.
  await withdrawAll(curator.agent, accessions.slice(4));
}, 120_000);

afterAll(async () => {
  await withdrawAll(curator.agent, accessions.slice(0, 4));
  await ctx.close();
}, 60_000);

async function collect<T>(pages: AsyncIterable<T[]>): Promise<T[][]> {
  const out: T[][] = [];
  for await (const page of pages) out.push(page);
  return out;
}

describe('loading the published library in pages', () => {
  it('reads every published, not withdrawn revision exactly once, in pages no larger than asked', async () => {
    const whole: { accession: string; revision: number }[] = await ctx.ds.query(
      `SELECT e.accession, r.number AS revision FROM revisions r JOIN entries e ON e.id = r.entry_id
        WHERE r.state = 'published' AND e.withdrawn_at IS NULL ORDER BY e.id`,
    );
    const pages = await collect(publishedRevisionPages(ctx.ds, 2));
    expect(pages.every((page) => page.length >= 1 && page.length <= 2)).toBe(true);
    const paged = pages.flat().map((r) => `${r.accession}/${r.revision}`);
    expect(paged).toEqual(whole.map((r) => `${r.accession}/${r.revision}`));
    expect(new Set(paged).size).toBe(paged.length);
    for (const accession of accessions.slice(0, 4)) expect(paged.some((label) => label.startsWith(`${accession}/`))).toBe(true);
    expect(paged.some((label) => label.startsWith(`${accessions[4]}/`))).toBe(false);

    const counted = await countPublished(ctx.ds);
    expect(counted.spectra).toBe(whole.length);
    expect(counted.peaks).toBe(pages.flat().reduce((sum, r) => sum + r.peaks.length, 0));
  });

  it('builds an index that holds each paged revision, without keeping the peaks in its metadata', async () => {
    const library = await loadLibraryIndex(publishedRevisionPages(ctx.ds, 3), await countPublished(ctx.ds));
    for (const accession of accessions.slice(0, 4)) expect(library.has(accession, 1)).toBe(true);
    expect(library.has(accessions[4]!)).toBe(false);
    const rows: { peaks: [number, number][] }[] = await ctx.ds.query(
      `SELECT r.peaks FROM revisions r JOIN entries e ON e.id = r.entry_id WHERE e.accession = $1 AND r.state = 'published'`,
      [accessions[0]],
    );
    const [hit] = library.index.search(rows[0]!.peaks, { k: 1 });
    expect(library.meta(hit!.id)).toMatchObject({ accession: accessions[0], revision: 1 });
    expect(library.meta(hit!.id)).not.toHaveProperty('peaks');
    expect(library.index.matchedPeaks(rows[0]!.peaks, hit!.id)).toHaveLength(rows[0]!.peaks.length);
  });
});
