import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createDataSource } from '../../db/data-source';
import { createTestContext, signInAs, type TestContext } from '../../testing/test-app';
import { chlorobenzeneContent } from '../../testing/fixtures';
import { createThrowawayCluster, type ThrowawayCluster } from './throwaway-cluster';

const W = { 'X-Requested-With': 'ionfolio' };
// The bound: back to normal within 5 s of PostgreSQL accepting connections again.
const RECOVERY_LIMIT_MS = 5000;
// A bound on the load, so a hang can never turn into an endless loop.
const MAX_WRITES = 400;

let cluster: ThrowawayCluster;
let ctx: TestContext;
beforeAll(async () => {
  cluster = await createThrowawayCluster();
  const ds = createDataSource(cluster.url);
  await ds.initialize();
  await ds.runMigrations({ transaction: 'each' });
  await ds.destroy();
  ctx = await createTestContext({ DATABASE_URL: cluster.url });
}, 120_000);
afterAll(async () => {
  await ctx?.close().catch(() => undefined);
  await cluster?.destroy();
});

interface Write {
  status: number;
  sentAtMs: number;
  accession?: string;
  code?: string;
  retryAfter?: string;
}

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

async function waitFor(what: string, limitMs: number, check: () => boolean | Promise<boolean>): Promise<number> {
  const started = performance.now();
  while (!(await check())) {
    if (performance.now() - started > limitMs) throw new Error(`${what}: not within ${limitMs} ms`);
    await sleep(25);
  }
  return performance.now() - started;
}

describe('PostgreSQL stopped and started under a stream of writes', () => {
  it('answers 503 with Retry-After meanwhile, recovers by itself within 5 s, and loses no acknowledged write', async () => {
    const author = await signInAs(ctx, 'contributor');
    const writes: Write[] = [];
    let writing = true;
    const writer = (async () => {
      for (let n = 0; writing && n < MAX_WRITES; n++) {
        const sentAtMs = performance.now();
        const res = await author.agent.post('/api/v1/entries').set(W).send(chlorobenzeneContent({ name: `Fault write ${n}` }));
        writes.push({
          status: res.status,
          sentAtMs,
          accession: res.status === 201 ? res.body.revision.accession : undefined,
          code: res.body?.error?.code,
          retryAfter: res.headers['retry-after'],
        });
        await sleep(10);
      }
    })();

    await waitFor('writes before the stop', 20_000, () => writes.filter((w) => w.status === 201).length >= 60);
    const stoppedAtMs = performance.now();
    await cluster.stop();
    await waitFor('503s while the database is down', 10_000, () => writes.filter((w) => w.sentAtMs > stoppedAtMs && w.status === 503).length >= 40);
    // Down for a while, as a restart or a fail-over would be, not just for an instant.
    await sleep(Math.max(0, 1500 - (performance.now() - stoppedAtMs)));
    const health = await request(ctx.app).get('/api/health');
    expect(health.status).toBe(503);
    expect(health.body).toEqual({ status: 'degraded', database: 'down' });
    expect(health.headers['retry-after']).toBe('5');

    await cluster.start();
    const upAtMs = performance.now();
    const healthMs = await waitFor('health back up', RECOVERY_LIMIT_MS, async () => (await request(ctx.app).get('/api/health')).status === 200);
    const writeMs = await waitFor('a write acknowledged again', RECOVERY_LIMIT_MS, () => writes.some((w) => w.sentAtMs >= upAtMs && w.status === 201));
    await waitFor('more writes after recovery', 20_000, () => writes.filter((w) => w.sentAtMs >= upAtMs && w.status === 201).length >= 60);
    writing = false;
    await writer;

    const down = writes.filter((w) => w.status !== 201);
    console.log(
      `database fault: ${writes.length} writes, ${writes.length - down.length} acknowledged, ${down.length} answered 503; ` +
        `health up ${healthMs.toFixed(0)} ms and first acknowledged write ${writeMs.toFixed(0)} ms after PostgreSQL was back`,
    );
    // Never a 500: every refusal is a 503 that says why and when to come back.
    expect(new Set(writes.map((w) => w.status))).toEqual(new Set([201, 503]));
    for (const w of down) expect(w).toMatchObject({ status: 503, code: 'DATABASE_UNAVAILABLE', retryAfter: '5' });
    // After recovery nothing fails any more.
    const lastFailure = Math.max(...down.map((w) => w.sentAtMs));
    expect(lastFailure).toBeLessThan(upAtMs + RECOVERY_LIMIT_MS);

    const acknowledged = writes.filter((w) => w.status === 201).map((w) => w.accession!);
    const rows: { accession: string }[] = await ctx.ds.query(`SELECT accession FROM entries WHERE accession = ANY($1)`, [acknowledged]);
    expect(rows.map((r) => r.accession).sort()).toEqual([...acknowledged].sort());
  }, 90_000); // bounded by the waits above; a busy machine needs more than the project's 20 s
});
