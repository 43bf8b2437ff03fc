import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type TestAgent from 'supertest/lib/agent';
import { createTestContext, signInAs, type TestContext } from '../../testing/test-app';
import { publishEntry } from '../../testing/curation';
import { libraryContent, uniqueTag } from '../entries/list-test-rows';
import type { Overview } from './overview.service';

let ctx: TestContext;
let reader: TestAgent;
let author: TestAgent;
let curator: TestAgent;
const W = { 'X-Requested-With': 'ionfolio' };

beforeAll(async () => {
  ctx = await createTestContext();
  author = (await signInAs(ctx, 'contributor')).agent;
  curator = (await signInAs(ctx, 'curator')).agent;
  reader = (await signInAs(ctx, 'reader')).agent;
});
afterAll(async () => {
  await ctx.close();
});

const overview = async (): Promise<Overview> => (await reader.get('/api/v1/overview').expect(200)).body as Overview;
const bin = (o: Overview, fromDa: number) => o.massHistogram.bins.find((b) => b.fromDa === fromDa)?.entries ?? 0;
const element = (o: Overview, symbol: string) => o.elementCoverage.find((e) => e.element === symbol)!.entries;
const state = (o: Overview, s: string) => o.entriesByState.find((e) => e.state === s)!.entries;
const month = new Date().toISOString().slice(0, 7);

describe('GET /overview', () => {
  it('counts the entries we publish in state, growth, mass bins and elements; a draft only as a draft', async () => {
    const tag = uniqueTag();
    const before = await overview();
    // Nominal masses from integer masses C 12, H 1, I 127 (common practice): C160H322 → 2242 Da (bin 2225),
    // C6H5I → 204 Da (bin 200). Bins this high hold no other test's rows.
    await publishEntry(author, curator, libraryContent(`Long alkane ${tag}`, 'C160H322', 2242, null));
    await publishEntry(author, curator, libraryContent(`Iodobenzene ${tag}`, 'C6H5I', 204, 'Ic1ccccc1'));
    await author.post('/api/v1/entries').set(W).send(libraryContent(`Draft ${tag}`, 'C160H322', 2242, null)).expect(201);
    const after = await overview();

    expect(after.massHistogram.binDa).toBe(25);
    expect(bin(after, 2225) - bin(before, 2225)).toBe(1);
    expect(after.publishedEntries - before.publishedEntries).toBe(2);
    expect(state(after, 'published') - state(before, 'published')).toBe(2);
    expect(state(after, 'draft') - state(before, 'draft')).toBe(1);
    expect(element(after, 'I') - element(before, 'I')).toBe(1);
    expect(element(after, 'C') - element(before, 'C')).toBe(2);
    expect(element(after, 'Cl') - element(before, 'Cl')).toBe(0);
    const grown = (o: Overview) => o.growthByMonth.find((g) => g.month === month);
    expect((grown(after)?.newEntries ?? 0) - (grown(before)?.newEntries ?? 0)).toBe(2);
    expect(after.growthByMonth.at(-1)!.cumulativeEntries).toBe(after.growthByMonth.reduce((sum, g) => sum + g.newEntries, 0));
    const decided = (o: Overview) => o.reviewTurnaround.find((t) => t.month === month)?.decisions ?? 0;
    expect(decided(after) - decided(before)).toBe(2);
    const turnaround = after.reviewTurnaround.find((t) => t.month === month)!;
    expect(turnaround.p90Hours).toBeGreaterThanOrEqual(turnaround.medianHours);
  });

  it('counts checks that warn or fail on published revisions by check id, matching the stored checks', async () => {
    const o = await overview();
    const rows: { id: string; status: string; n: number }[] = await ctx.ds.query(
      `SELECT c->>'id' AS id, c->>'status' AS status, count(*)::int AS n
         FROM revisions r, jsonb_array_elements(r.checks) c WHERE r.state = 'published' GROUP BY 1, 2`,
    );
    for (const row of rows.filter((r) => r.status === 'warn' || r.status === 'fail')) {
      const item = o.checkProblems.find((c) => c.checkId === row.id)!;
      expect(item[row.status as 'warn' | 'fail']).toBe(row.n);
    }
    expect(o.checkProblems.length).toBe(new Set(rows.filter((r) => r.status !== 'pass').map((r) => r.id)).size);
  });
});
