import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type TestAgent from 'supertest/lib/agent';
import { Molecule, SSSearcher } from 'openchemlib';
import { createTestContext, signInAs, type TestContext } from '../../testing/test-app';
import { publishEntry } from '../../testing/curation';
import { libraryContent, uniqueTag } from '../entries/list-test-rows';

let ctx: TestContext;
let reader: TestAgent;
const tag = uniqueTag();
const made: Record<string, string> = {};
const W = { 'X-Requested-With': 'ionfolio' };

// Nominal masses from integer masses C 12, H 1, N 14, O 16, Cl 35 (common practice).
const ROWS = [
  { key: 'chlorobenzene', formula: 'C6H5Cl', massDa: 112, smiles: 'Clc1ccccc1', benzene: true },
  { key: 'toluene', formula: 'C7H8', massDa: 92, smiles: 'Cc1ccccc1', benzene: true },
  { key: 'benzaldehyde', formula: 'C7H6O', massDa: 106, smiles: 'O=Cc1ccccc1', benzene: true },
  { key: 'cyclohexane', formula: 'C6H12', massDa: 84, smiles: 'C1CCCCC1', benzene: false },
  { key: 'hexanal', formula: 'C6H12O', massDa: 100, smiles: 'CCCCCC=O', benzene: false },
  { key: 'pyridine', formula: 'C5H5N', massDa: 79, smiles: 'c1ccncc1', benzene: false },
];

beforeAll(async () => {
  ctx = await createTestContext();
  const author = await signInAs(ctx, 'contributor');
  const curator = await signInAs(ctx, 'curator');
  reader = (await signInAs(ctx, 'reader')).agent;
  for (const row of ROWS) {
    made[row.key] = (await publishEntry(author.agent, curator.agent, libraryContent(`${row.key} ${tag}`, row.formula, row.massDa, row.smiles))).accession;
  }
});
afterAll(async () => {
  await ctx.close();
});

/** Every published structure, matched with openchemlib's plain searcher (no index, no stored keys). */
async function expectedBenzeneAccessions(): Promise<string[]> {
  const rows: { accession: string; structure: string; format: 'smiles' | 'molfile' }[] = await ctx.ds.query(
    `SELECT e.accession, r.structure, r.structure_format AS format FROM revisions r JOIN entries e ON e.id = r.entry_id
      WHERE r.state = 'published' AND r.structure IS NOT NULL ORDER BY e.accession`,
  );
  const fragment = Molecule.fromSmiles('c1ccccc1');
  fragment.setFragment(true);
  const searcher = new SSSearcher();
  return rows
    .filter((row) => {
      let mol: Molecule;
      try {
        mol = row.format === 'smiles' ? Molecule.fromSmiles(row.structure) : Molecule.fromMolfile(row.structure);
      } catch {
        return false;
      }
      searcher.setMol(fragment, mol);
      return searcher.isFragmentInMolecule();
    })
    .map((row) => row.accession);
}

describe('POST /structure-search', () => {
  it('finds the entries with a benzene ring and not the others, the same set openchemlib finds without the index', async () => {
    const res = await reader.post('/api/v1/structure-search').set(W).send({ smiles: 'c1ccccc1', mode: 'substructure', limit: 500 }).expect(200);
    const found: string[] = res.body.entries.map((e: { accession: string }) => e.accession);
    expect(res.body.truncated).toBe(false);
    for (const row of ROWS) expect(found.includes(made[row.key]!), row.key).toBe(row.benzene);
    expect(found).toEqual(await expectedBenzeneAccessions());
    expect(res.body.screened).toBeGreaterThanOrEqual(found.length);
  });

  it('keeps keys per revision: a second search computes nothing new and agrees', async () => {
    const keys: { n: number }[] = await ctx.ds.query(
      `SELECT count(*)::int AS n FROM structure_keys sk JOIN revisions r ON r.id = sk.revision_id JOIN entries e ON e.id = r.entry_id
        WHERE e.accession = ANY($1)`,
      [Object.values(made)],
    );
    expect(keys[0]!.n).toBe(ROWS.length);
    const again = await reader.post('/api/v1/structure-search').set(W).send({ smiles: 'C=O', limit: 500 }).expect(200);
    const found: string[] = again.body.entries.map((e: { accession: string }) => e.accession);
    expect(found).toContain(made.benzaldehyde);
    expect(found).toContain(made.hexanal);
    expect(found).not.toContain(made.toluene);
  });

  it('in exact mode, finds the same molecule written another way and nothing that merely contains it', async () => {
    const res = await reader.post('/api/v1/structure-search').set(W).send({ smiles: 'c1ccccc1C', mode: 'exact' }).expect(200);
    const found: string[] = res.body.entries.map((e: { accession: string }) => e.accession);
    expect(found).toContain(made.toluene);
    expect(found).not.toContain(made.benzaldehyde);
  });

  it('when the SMILES cannot be read, answers 400 UNREADABLE_STRUCTURE', async () => {
    const res = await reader.post('/api/v1/structure-search').set(W).send({ smiles: 'C1CC(' }).expect(400);
    expect(res.body.error.code).toBe('UNREADABLE_STRUCTURE');
    expect(res.body.error.message).toMatch(/ring closure/);
  });
});
