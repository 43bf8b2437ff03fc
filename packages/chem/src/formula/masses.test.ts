import { describe, expect, it } from 'vitest';
import { IsotopicDistribution } from 'isotopic-distribution';
import { ChemError } from '../errors/chem-error';
import { seededRandom } from '../isotopes/seeded-random';
import { formatFormula } from './format-formula';
import { monoisotopicMass } from './monoisotopic-mass';
import { elementNominalMass, nominalMass } from './nominal-mass';

const NIST_12C = 12;
const NIST_1H = 1.00782503223; // NIST / AME 2016, SCIENCE.md §1
const NIST_35CL = 34.968852682; // NIST / AME 2016, SCIENCE.md §1
const NIST_16O = 15.99491461957; // NIST / AME 2016, SCIENCE.md §1

function randomFormula(random: () => number): Record<string, number> {
  const counts: Record<string, number> = { C: 1 + Math.floor(random() * 40), H: Math.floor(random() * 60) };
  for (const [symbol, max] of [
    ['N', 4],
    ['O', 6],
    ['S', 2],
    ['Cl', 4],
    ['Br', 3],
    ['F', 6],
    ['Si', 2],
    ['P', 1],
    ['I', 1],
  ] as const) {
    if (random() < 0.3) counts[symbol] = 1 + Math.floor(random() * max);
  }
  return counts;
}

describe('monoisotopicMass', () => {
  it('gives benzene C6H6 from the NIST/AME table values to 1e-6 u', () => {
    expect(Math.abs(monoisotopicMass('C6H6') - (6 * NIST_12C + 6 * NIST_1H))).toBeLessThan(1e-6);
    // 78.0469502 u for benzene, PubChem "monoisotopic mass" (from memory)
    expect(monoisotopicMass('C6H6')).toBeCloseTo(78.0469502, 6);
  });

  it('gives chlorobenzene and water from the NIST/AME table values to 1e-6 u', () => {
    expect(Math.abs(monoisotopicMass('C6H5Cl') - (6 * NIST_12C + 5 * NIST_1H + NIST_35CL))).toBeLessThan(
      1e-6,
    );
    expect(Math.abs(monoisotopicMass({ H: 2, O: 1 }) - (2 * NIST_1H + NIST_16O))).toBeLessThan(1e-6);
  });

  it('agrees with isotopic-distribution (independent code, chemical-elements data) to 1e-6 u on 60 seeded random formulas', () => {
    const random = seededRandom(7);
    for (let k = 0; k < 60; k++) {
      const formula = formatFormula(randomFormula(random));
      const theirs = new IsotopicDistribution(formula).getParts()[0]?.monoisotopicMass as number;
      expect(Math.abs(monoisotopicMass(formula) - theirs), formula).toBeLessThan(1e-6);
    }
  });

  it('gives 0 for no atoms, never NaN, and throws ChemError for bad text', () => {
    expect(monoisotopicMass({})).toBe(0);
    expect(() => monoisotopicMass('C6Xx')).toThrow(ChemError);
  });
});

describe('nominalMass', () => {
  it('sums most-abundant mass numbers: chlorobenzene 112, bromoform 250 (12C, 1H, 35Cl, 79Br; SCIENCE.md §1)', () => {
    expect(nominalMass('C6H5Cl')).toBe(112);
    expect(nominalMass('CHBr3')).toBe(250);
    expect(nominalMass('C8H24O4Si4')).toBe(296);
    expect(elementNominalMass('I')).toBe(127);
  });

  it('equals round(monoisotopic mass) for ordinary organic formulas (seeded random set)', () => {
    const random = seededRandom(11);
    for (let k = 0; k < 100; k++) {
      const counts = randomFormula(random);
      if ((counts.I ?? 0) + (counts.Br ?? 0) > 1) continue; // heavy halogens push the mass defect past 0.5 u
      expect(nominalMass(counts)).toBe(Math.round(monoisotopicMass(counts)));
    }
  });

  it('does not mutate its input', () => {
    const input = Object.freeze({ C: 2, H: 6, O: 1 });
    expect(nominalMass(input)).toBe(46);
  });
});
