import type TestAgent from 'supertest/lib/agent';
import { Molecule, SSSearcher } from 'openchemlib';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_IDENTITIES } from '@ionfolio/fakes';
import { buildDemoLibrary, type DemoEntryPlan } from '../../db/demo/build-demo-library';
import { seedDemoLibrary } from '../../db/seed-demo-library';
import { createScratchDatabase, type ScratchDatabase } from '../reliability/scratch-database';
import { createTestContext, signInAs, type TestContext } from '../../testing/test-app';

const W = { 'X-Requested-With': 'ionfolio' };

// The demo library in a database of its own: the shared test database holds other tests' entries.
let db: ScratchDatabase;
let ctx: TestContext;
let reader: TestAgent;
const plans = buildDemoLibrary();

beforeAll(async () => {
  db = await createScratchDatabase('ionfolio_demo_structures');
  ctx = await createTestContext({ DATABASE_URL: db.url });
  for (const p of DEMO_IDENTITIES) {
    await ctx.ds.query(`INSERT INTO users (github_id, login, display_name, email, role) VALUES ($1, $2, $3, $4, $5)`, [
      String(p.id),
      p.login,
      p.name,
      p.email,
      p.demoRole,
    ]);
  }
  expect(await seedDemoLibrary(ctx.ds)).toBe(plans.length);
  reader = (await signInAs(ctx, 'reader')).agent;
}, 240_000);
afterAll(async () => {
  await ctx?.close();
  await db?.drop();
});

/**
 * Whether a plan leaves a published revision behind, read from the plan alone: the last revision
 * when it ends published; an earlier (published) one when the last is still in review, returned or
 * a draft; none when the entry was withdrawn.
 */
function searchable(plan: DemoEntryPlan): boolean {
  if (plan.finalState === 'published') return true;
  if (plan.finalState === 'withdrawn') return false;
  return plan.revisions.length > 1;
}

/** The names of the searchable demo compounds that hold the fragment, by openchemlib's plain searcher over the plans' SMILES. */
function expectedNames(fragmentSmiles: string): string[] {
  const fragment = Molecule.fromSmiles(fragmentSmiles);
  fragment.setFragment(true);
  const searcher = new SSSearcher();
  return plans
    .filter(searchable)
    .filter((plan) => {
      searcher.setMol(fragment, Molecule.fromSmiles(plan.compound.smiles));
      return searcher.isFragmentInMolecule();
    })
    .map((plan) => plan.compound.name)
    .sort();
}

async function searchNames(smiles: string): Promise<string[]> {
  const res = await reader.post('/api/v1/structure-search').set(W).send({ smiles, mode: 'substructure', limit: 500 }).expect(200);
  expect(res.body.truncated).toBe(false);
  const hits = res.body.entries as { accession: string; name: string; simulated: boolean }[];
  for (const hit of hits) expect(hit.simulated, hit.accession).toBe(true);
  expect(new Set(hits.map((h) => h.accession)).size).toBe(hits.length);
  return hits.map((h) => h.name).sort();
}

describe('substructure search over the whole demo library', () => {
  it('the demo compounds have unique names, so a name stands for one entry', () => {
    expect(new Set(plans.map((p) => p.compound.name)).size).toBe(plans.length);
    expect(plans.filter(searchable).length).toBeGreaterThan(100);
  });

  // Fragments of the trade (common practice): the aromatic ring, the carbonyl bonded to an oxygen
  // (esters and acids) and a chlorine on an aromatic ring.
  it.each([
    ['benzene ring', 'c1ccccc1'],
    ['carbonyl bonded to oxygen (ester or acid)', 'C(=O)O'],
    ['chlorine on an aromatic ring', 'Clc1ccccc1'],
  ])('%s (%s): the same entries openchemlib finds over every demo structure', async (_label, smiles) => {
    const expected = expectedNames(smiles);
    // Each fragment splits the library: some compounds hold it and some do not.
    expect(expected.length).toBeGreaterThan(0);
    expect(expected.length).toBeLessThan(plans.filter(searchable).length);
    expect(await searchNames(smiles)).toEqual(expected);
  });

  it('leaves out the withdrawn demo entries even when their structure holds the fragment', async () => {
    const withdrawn = plans.filter((p) => p.finalState === 'withdrawn');
    expect(withdrawn.length).toBeGreaterThan(0);
    const found = new Set(await searchNames('C'));
    for (const plan of withdrawn) expect(found.has(plan.compound.name), plan.compound.name).toBe(false);
    expect(found.size).toBe(expectedNames('C').length);
  });
});
