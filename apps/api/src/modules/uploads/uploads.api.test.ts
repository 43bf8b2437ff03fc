import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestContext, signInAs, type TestContext } from '../../testing/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(async () => {
  await ctx.close();
});

const W = { 'X-Requested-With': 'ionfolio' };

// Invented test files in the layouts of JCAMP-DX for MS (McDonald & Wilks 1988; Lampen et al. 1994, as SCIENCE.md §5 lists them).
const PEAK_TABLE = `##TITLE=Test ester (invented)
##JCAMP-DX=5.01
##DATA TYPE=MASS SPECTRUM
##DATA CLASS=PEAK TABLE
##MOLFORM=C 4 H 8 O 2
##.IONIZATION ENERGY=70
##XUNITS=M/Z
##YUNITS=RELATIVE ABUNDANCE
##NPOINTS=4
##PEAK TABLE=(XY..XY)
43,100 45,18
61,40 88,12
##END=
`;

const XY_DATA = `##TITLE=Test ketone XY (invented)
##JCAMP-DX=5.01
##DATA TYPE=MASS SPECTRUM
##DATA CLASS=XYDATA
##MOLFORM=C3H6O
##XUNITS=M/Z
##YUNITS=RELATIVE ABUNDANCE
##FIRSTX=42
##LASTX=44
##XFACTOR=1
##YFACTOR=1
##NPOINTS=3
##XYDATA=(X++(Y..Y))
42 10 100 3
##END=
`;

const LINK = `##TITLE=Two blocks (invented)
##JCAMP-DX=5.01
##DATA TYPE=LINK
##BLOCKS=2
${PEAK_TABLE.replace('##TITLE=Test ester (invented)', '##TITLE=Block one\n##BLOCK_ID=1')}${PEAK_TABLE.replace('##TITLE=Test ester (invented)', '##TITLE=Block two\n##BLOCK_ID=2')}##END=
`;

describe('POST /api/v1/uploads/spectra', () => {
  it.each([
    ['JCAMP-DX peak table', 'a.jdx', PEAK_TABLE, 1, [[43, 100], [45, 18], [61, 40], [88, 12]]],
    ['JCAMP-DX XYDATA (X++(Y..Y))', 'b.jdx', XY_DATA, 1, [[42, 10], [43, 100], [44, 3]]],
    ['JCAMP-DX LINK with two blocks', 'c.jdx', LINK, 2, [[43, 100], [45, 18], [61, 40], [88, 12]]],
    ['CSV with a header', 'd.csv', 'm/z,intensity\n43,100\n58,25\n', 1, [[43, 100], [58, 25]]],
    ['TXT mz intensity lines', 'e.txt', '43 100\n58 25\n', 1, [[43, 100], [58, 25]]],
  ])('reads a %s', async (_layout, name, text, blocks, peaks) => {
    const { agent } = await signInAs(ctx, 'contributor');
    const res = await agent.post('/api/v1/uploads/spectra').set(W).attach('file', Buffer.from(text), name).expect(200);
    expect(res.body.blocks).toHaveLength(blocks);
    expect(res.body.blocks[0].peaks).toEqual(peaks);
  });

  it('takes formula and energy from a JCAMP-DX block', async () => {
    const { agent } = await signInAs(ctx, 'contributor');
    const res = await agent.post('/api/v1/uploads/spectra').set(W).attach('file', Buffer.from(PEAK_TABLE), 'a.jdx').expect(200);
    expect(res.body.blocks[0]).toMatchObject({ title: 'Test ester (invented)', formula: 'C 4 H 8 O 2', ionizationEnergyEv: 70 });
  });

  it.each([
    ['truncated (no ##END)', 'f.jdx', PEAK_TABLE.replace('##END=\n', ''), 400, 'UNREADABLE_FILE'],
    ['non-numeric peaks', 'g.jdx', PEAK_TABLE.replace('61,40', '61,abc'), 400, 'UNREADABLE_FILE'],
    ['binary', 'h.jdx', Buffer.from([0, 1, 2, 3, 0, 255, 0]), 400, 'BINARY_FILE'],
    ['an unsupported type', 'i.pdf', '%PDF-1.4', 415, 'UNSUPPORTED_FILE'],
  ])('refuses a %s file with a clear 4xx', async (_what, name, content, status, code) => {
    const { agent } = await signInAs(ctx, 'contributor');
    const res = await agent.post('/api/v1/uploads/spectra').set(W).attach('file', Buffer.from(content), name).expect(status);
    expect(res.body.error.code).toBe(code);
    expect(res.body.error.message).toContain(name);
  });

  it('refuses a 21 MB file with 413', async () => {
    const { agent } = await signInAs(ctx, 'contributor');
    const big = Buffer.alloc(21 * 1024 * 1024, '4');
    const res = await agent.post('/api/v1/uploads/spectra').set(W).attach('file', big, 'big.txt').expect(413);
    expect(res.body.error.code).toBe('FILE_TOO_LARGE');
  });

  it('a reader may not upload', async () => {
    const { agent } = await signInAs(ctx, 'reader');
    await agent.post('/api/v1/uploads/spectra').set(W).attach('file', Buffer.from('43 100'), 'x.txt').expect(403);
  });
});

describe('POST /api/v1/structures/preview', () => {
  it('draws a SMILES and gives its formula (openchemlib)', async () => {
    const { agent } = await signInAs(ctx, 'contributor');
    const res = await agent.post('/api/v1/structures/preview').set(W).send({ structure: 'Clc1ccccc1', format: 'smiles' }).expect(200);
    expect(res.body.formula).toBe('C6H5Cl');
    expect(res.body.nominalMass).toBe(112);
    expect(res.body.svg).toMatch(/^<svg/);
  });

  it('an unreadable SMILES is a 400 that says so', async () => {
    const { agent } = await signInAs(ctx, 'contributor');
    const res = await agent.post('/api/v1/structures/preview').set(W).send({ structure: 'C1CC(', format: 'smiles' }).expect(400);
    expect(res.body.error.code).toBe('UNREADABLE_STRUCTURE');
  });
});
