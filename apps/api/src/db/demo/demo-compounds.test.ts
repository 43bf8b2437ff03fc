import { Molecule } from 'openchemlib';
import { formatFormula, nominalMass, parseFormula } from '@ionfolio/chem';
import { describe, expect, it } from 'vitest';
import { DEMO_COMPOUNDS, simulatedRetentionIndex } from './demo-compounds';

const count = (formula: string, symbol: 'Cl' | 'Br' | 'S' | 'N' | 'Si'): number => parseFormula(formula)[symbol] ?? 0;

describe('DEMO_COMPOUNDS', () => {
  it('holds about 150 compounds with unique kebab-case keys and unique structures', () => {
    expect(DEMO_COMPOUNDS.length).toBeGreaterThanOrEqual(140);
    expect(DEMO_COMPOUNDS.length).toBeLessThanOrEqual(160);
    expect(new Set(DEMO_COMPOUNDS.map((c) => c.key)).size).toBe(DEMO_COMPOUNDS.length);
    expect(new Set(DEMO_COMPOUNDS.map((c) => c.smiles)).size).toBe(DEMO_COMPOUNDS.length);
    for (const c of DEMO_COMPOUNDS) expect(c.key).toMatch(/^[a-z0-9]+(-[a-z0-9]+)*$/);
  });

  it('gives, for every compound, a SMILES whose formula (openchemlib) is the stated formula', () => {
    const mismatches = DEMO_COMPOUNDS.filter((c) => {
      const fromStructure = Molecule.fromSmiles(c.smiles).getMolecularFormula().formula;
      return formatFormula(parseFormula(fromStructure)) !== c.formula;
    }).map((c) => c.key);
    expect(mismatches).toEqual([]);
  });

  it('writes every formula in Hill order', () => {
    for (const c of DEMO_COMPOUNDS) expect(formatFormula(parseFormula(c.formula))).toBe(c.formula);
  });

  it('stays within nominal masses 30–400', () => {
    for (const c of DEMO_COMPOUNDS) {
      const massDa = nominalMass(c.formula);
      expect(massDa).toBeGreaterThanOrEqual(30);
      expect(massDa).toBeLessThanOrEqual(400);
    }
  });

  it('includes compounds with 1, 2 and 3 Cl, 1 and 2 Br, one Cl with one Br, and S, N and Si', () => {
    const has = (test: (f: string) => boolean) => DEMO_COMPOUNDS.filter((c) => test(c.formula)).length;
    for (const n of [1, 2, 3]) expect(has((f) => count(f, 'Cl') === n && count(f, 'Br') === 0)).toBeGreaterThan(0);
    for (const n of [1, 2]) expect(has((f) => count(f, 'Br') === n && count(f, 'Cl') === 0)).toBeGreaterThan(0);
    expect(has((f) => count(f, 'Br') === 1 && count(f, 'Cl') === 1)).toBeGreaterThan(0);
    expect(has((f) => count(f, 'S') > 0)).toBeGreaterThanOrEqual(5);
    expect(has((f) => count(f, 'N') > 0)).toBeGreaterThanOrEqual(5);
    expect(DEMO_COMPOUNDS.filter((c) => c.role === 'derivative' && count(c.formula, 'Si') > 0).length).toBeGreaterThanOrEqual(5);
  });

  it('uses every role', () => {
    const roles = new Set(DEMO_COMPOUNDS.map((c) => c.role));
    expect([...roles].sort()).toEqual(['derivative', 'impurity', 'intermediate', 'raw material', 'solvent']);
  });

  it('gives about half of the compounds a simulated retention index between 300 and 4000', () => {
    const withIndex = DEMO_COMPOUNDS.filter((c) => c.retentionIndex);
    expect(withIndex.length / DEMO_COMPOUNDS.length).toBeGreaterThan(0.4);
    expect(withIndex.length / DEMO_COMPOUNDS.length).toBeLessThan(0.6);
    for (const c of withIndex) {
      expect(Number.isInteger(c.retentionIndex?.value)).toBe(true);
      expect(c.retentionIndex?.value).toBeGreaterThanOrEqual(300);
      expect(c.retentionIndex?.value).toBeLessThanOrEqual(4000);
    }
    expect(withIndex.some((c) => c.retentionIndex?.columnClass === 'polar')).toBe(true);
  });

  it('carries no CAS Registry Number anywhere (names, synonyms)', () => {
    const text = JSON.stringify(DEMO_COMPOUNDS.map((c) => [c.name, c.synonyms]));
    expect(text).not.toMatch(/\d{2,7}-\d{2}-\d/);
  });
});

describe('simulatedRetentionIndex', () => {
  // IUPAC Gold Book R05360 (SCIENCE.md §4): an n-alkane with n carbons has index 100·n; the
  // heuristic must put hexane there within its ±20 jitter.
  it('puts an n-alkane near 100 per carbon on a non-polar column', () => {
    expect(Math.abs(simulatedRetentionIndex('hexane', 'C6H14', 'CCCCCC', 'non-polar') - 600)).toBeLessThanOrEqual(20);
    expect(Math.abs(simulatedRetentionIndex('decane', 'C10H22', 'CCCCCCCCCC', 'non-polar') - 1000)).toBeLessThanOrEqual(20);
  });

  it('gives an oxygenated compound a higher index on a polar column than on a non-polar one', () => {
    const nonPolar = simulatedRetentionIndex('linalool', 'C10H18O', 'CC(C)=CCCC(C)(O)C=C', 'non-polar');
    const polar = simulatedRetentionIndex('linalool', 'C10H18O', 'CC(C)=CCCC(C)(O)C=C', 'polar');
    expect(polar - nonPolar).toBeGreaterThan(200);
  });

  it('is the same on every call', () => {
    expect(simulatedRetentionIndex('x', 'C8H8O', 'CC(=O)c1ccccc1', 'non-polar')).toBe(
      simulatedRetentionIndex('x', 'C8H8O', 'CC(=O)c1ccccc1', 'non-polar'),
    );
  });
});
