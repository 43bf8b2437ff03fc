import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type TestAgent from 'supertest/lib/agent';
import { createTestContext, signInAs, type TestContext } from '../../testing/test-app';
import { publishEntry } from '../../testing/curation';
import { libraryContent, uniqueTag } from './list-test-rows';

let ctx: TestContext;
let reader: TestAgent;
let authorLogin: string;
let authorAgent: TestAgent;
let curatorAgent: TestAgent;
const W = { 'X-Requested-With': 'ionfolio' };
const tag = uniqueTag();
const made: Record<string, string> = {};

// Nominal masses from integer masses C 12, H 1, O 16, Cl 35, Br 79 (common practice).
const ROWS = [
  { key: 'musk', name: `Heptamerolide ${tag}`, formula: 'C15H26O2', massDa: 238, smiles: 'O=C1CCCCCCCCCCCCCO1', synonyms: [`oxacyclohexadecanone ${tag}`] },
  { key: 'mono', name: `Chlorobenzene ${tag}`, formula: 'C6H5Cl', massDa: 112, smiles: 'Clc1ccccc1', synonyms: [] },
  { key: 'di', name: `1,2-Dichlorobenzene ${tag}`, formula: 'C6H4Cl2', massDa: 146, smiles: 'Clc1ccccc1Cl', synonyms: [] },
  { key: 'tri', name: `1,2,4-Trichlorobenzene ${tag}`, formula: 'C6H3Cl3', massDa: 180, smiles: 'Clc1ccc(Cl)c(Cl)c1', synonyms: [] },
  { key: 'bromo', name: `=HYPERLINK("x") Bromobenzene ${tag}`, formula: 'C6H5Br', massDa: 156, smiles: 'Brc1ccccc1', synonyms: [] },
];

beforeAll(async () => {
  ctx = await createTestContext();
  const author = await signInAs(ctx, 'contributor');
  authorLogin = author.login;
  const curator = await signInAs(ctx, 'curator');
  authorAgent = author.agent;
  curatorAgent = curator.agent;
  reader = (await signInAs(ctx, 'reader')).agent;
  for (const row of ROWS) {
    const content = libraryContent(row.name, row.formula, row.massDa, row.smiles, {
      synonyms: row.synonyms,
      ...(row.key === 'di' ? { retentionIndex: { value: 1030, column: 'non-polar' as const } } : {}),
    });
    made[row.key] = (await publishEntry(author.agent, curator.agent, content)).accession;
  }
});
afterAll(async () => {
  await ctx.close();
});

const list = (query: Record<string, string | number>) => reader.get('/api/v1/entries').query(query);
const accessions = (body: { entries: { accession: string }[] }) => body.entries.map((e) => e.accession);

describe('GET /entries filters', () => {
  it('when the name is misspelled, the trigram match still finds it, ranked first', async () => {
    const res = await list({ q: `heptamerolyde ${tag}` }).expect(200);
    expect(accessions(res.body)[0]).toBe(made.musk);
    expect(res.body.sort).toBe('relevance');
  });

  it('when a synonym is asked for, ranks the entry it belongs to first (near-misses of earlier runs may follow)', async () => {
    const res = await list({ q: `oxacyclohexadecanone ${tag}` }).expect(200);
    expect(accessions(res.body)[0]).toBe(made.musk);
    expect(accessions(res.body)).not.toContain(made.mono);
  });

  it('with element ranges Cl2-3, finds the di- and trichloro entries and not the mono', async () => {
    const res = await list({ q: tag, formula: 'C6 Cl2-3', sort: 'accession' }).expect(200);
    expect(accessions(res.body).sort()).toEqual([made.di, made.tri].sort());
  });

  it('with an exact formula in any order, finds it in Hill order', async () => {
    const res = await list({ q: tag, formula: 'ClC6H5' }).expect(200);
    expect(accessions(res.body)).toEqual([made.mono]);
  });

  it('with elements=Br, a mass window, a retention index or a contributor, narrows as asked', async () => {
    expect(accessions((await list({ q: tag, elements: 'Br' }).expect(200)).body)).toEqual([made.bromo]);
    const window = await list({ q: tag, minMass: 140, maxMass: 160, sort: 'nominalMass' }).expect(200);
    expect(accessions(window.body)).toEqual([made.di, made.bromo]);
    expect(accessions((await list({ q: tag, hasRetentionIndex: 'true' }).expect(200)).body)).toEqual([made.di]);
    const mine = await list({ q: tag, contributor: authorLogin, limit: 500 }).expect(200);
    expect(mine.body.entries).toHaveLength(ROWS.length);
    expect(mine.body.entries[0].authorLogin).toBe(authorLogin);
    expect(accessions((await list({ q: tag, contributor: 'nobody-here' }).expect(200)).body)).toEqual([]);
  });

  it.each(['name', 'nominalMass', 'updatedAt', 'accession'])('paging by %s with limit 2 returns each row exactly once, in order', async (sort) => {
    for (const order of ['asc', 'desc']) {
      const seen: string[] = [];
      let cursor: string | null = null;
      let pages = 0;
      do {
        const query: Record<string, string | number> = { q: tag, sort, order, limit: 2 };
        if (cursor) query.cursor = cursor;
        const res: { body: { entries: { accession: string }[]; nextCursor: string | null } } = await list(query).expect(200);
        seen.push(...accessions(res.body));
        cursor = res.body.nextCursor;
        pages += 1;
      } while (cursor && pages < 10);
      expect(seen.slice().sort()).toEqual(Object.values(made).sort());
      expect(pages).toBe(3);
      const all = await list({ q: tag, sort, order, limit: 500 }).expect(200);
      expect(seen).toEqual(accessions(all.body));
    }
  });

  it('when a filter cannot be read, answers 400 naming the filter and the bad part', async () => {
    const range = await list({ formula: 'C6-8 Xq1-2' }).expect(400);
    expect(range.body.error.code).toBe('VALIDATION');
    expect(range.body.error.details[0].path).toBe('formula');
    expect(range.body.error.message).toContain('Xq1-2');
    const element = await list({ elements: 'Cl,Zz' }).expect(400);
    expect(element.body.error.details[0].path).toBe('elements');
    expect(element.body.error.message).toContain('Zz');
    const backwards = await list({ formula: 'Cl3-1' }).expect(400);
    expect(backwards.body.error.message).toContain('Cl3-1');
    const cursor = await list({ sort: 'name', cursor: 'not-a-cursor' }).expect(400);
    expect(cursor.body.error.details[0].path).toBe('cursor');
    expect((await list({ edition: `none-${tag}` }).expect(404)).body.error.code).toBe('NOT_FOUND');
  });
});

describe('GET /entries.csv', () => {
  it('exports the filtered rows with every cell quoted and a leading = neutralised', async () => {
    const res = await reader.get('/api/v1/entries.csv').query({ q: tag, sort: 'accession' }).expect(200);
    expect(res.headers['content-type']).toContain('text/csv');
    const lines = res.text.trim().split('\r\n');
    expect(lines[0]).toMatch(/^accession,revision,state,name,/);
    expect(lines).toHaveLength(ROWS.length + 1);
    const bromo = lines.find((l) => l.startsWith(`"${made.bromo}"`))!;
    expect(bromo).toContain(`"'=HYPERLINK(""x"") Bromobenzene ${tag}"`);
    expect(bromo).not.toContain(`,"=HYPERLINK`);
  });

  it('takes the same filters as the list', async () => {
    const res = await reader.get('/api/v1/entries.csv').query({ q: tag, elements: 'Cl', formula: 'Cl2-' }).expect(200);
    const rows = res.text.trim().split('\r\n').slice(1).map((l) => l.split(',')[0]);
    expect(rows.sort()).toEqual([`"${made.di}"`, `"${made.tri}"`].sort());
  });
});

// Last in the file: it withdraws one of the rows above.
describe('GET /entries status and edition', () => {
  it('a withdrawn entry leaves the default list and shows under withdrawn and any; an edition lists its own members', async () => {
    const label = `lib-${tag}`;
    await curatorAgent.post('/api/v1/editions').set(W).send({ label, notes: 'library list test' }).expect(201);
    const late = await publishEntry(authorAgent, curatorAgent, libraryContent(`Late toluene ${tag}`, 'C7H8', 92, 'Cc1ccccc1'));
    await curatorAgent.post(`/api/v1/entries/${made.tri}/withdraw`).set(W).send({ reason: 'Test: retired from the list test' }).expect(200);

    const published = accessions((await list({ q: tag, limit: 500 }).expect(200)).body);
    expect(published).not.toContain(made.tri);
    expect(published).toContain(late.accession);
    const withdrawn = await list({ q: tag, status: 'withdrawn' }).expect(200);
    expect(accessions(withdrawn.body)).toEqual([made.tri]);
    expect(withdrawn.body.entries[0].state).toBe('withdrawn');
    const any = accessions((await list({ q: tag, status: 'any', limit: 500 }).expect(200)).body);
    expect(any.sort()).toEqual([...Object.values(made), late.accession].sort());
    const edition = accessions((await list({ q: tag, edition: label, limit: 500 }).expect(200)).body);
    expect(edition.sort()).toEqual(Object.values(made).sort());
  });
});
