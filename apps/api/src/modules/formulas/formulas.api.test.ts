import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { searchServiceOf } from '../../app';
import { createTestContext, signInAs, type TestContext } from '../../testing/test-app';
import { W } from '../identify/identify-test-helpers';
import { chlorobenzeneContent } from '../../testing/fixtures';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(async () => {
  await searchServiceOf(ctx.app).stop();
  await ctx.close();
});

describe('formula tools', () => {
  it('GET /formulas/:formula gives the Hill formula, masses, RDBE and the isotope cluster', async () => {
    const { agent } = await signInAs(ctx, 'reader');
    const res = await agent.get('/api/v1/formulas/ClC6H5').expect(200);
    expect(res.body).toMatchObject({ formula: 'C6H5Cl', nominalMass: 112, rdbe: 4 });
    // 6 × 12 + 5 × 1.00782503 + 34.96885268 (NIST atomic weights and isotopic compositions, SCIENCE.md §1).
    expect(res.body.monoisotopicMass).toBeCloseTo(112.00798, 4);
    const m2 = res.body.cluster.find((p: { mz: number }) => p.mz === 114);
    // 37Cl/35Cl = 24.22/75.78 → M+2 ≈ 32 % of M, plus a little 13C2 (SCIENCE.md §1).
    expect(m2.relativeIntensity).toBeGreaterThan(32);
    expect(m2.relativeIntensity).toBeLessThan(33.5);
    const bad = await agent.get('/api/v1/formulas/C6H(').expect(400);
    expect(bad.body.error.message).toMatch(/formula/);
    await agent.get('/api/v1/formulas/Xy2').expect(400);
  });

  it('POST /readings reads the molecular ion of a chlorobenzene-like spectrum', async () => {
    const { agent } = await signInAs(ctx, 'reader');
    const res = await agent.post('/api/v1/readings').set(W).send({ peaks: chlorobenzeneContent().peaks }).expect(200);
    expect(res.body.reading).toMatchObject({ molecularIonMz: 112, chlorine: 1, bromine: 0 });
    await agent.post('/api/v1/readings').set(W).send({ peaks: [] }).expect(400);
  });
});
