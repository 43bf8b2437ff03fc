import { describe, expect, it } from 'vitest';
import { IsotopicDistribution } from 'isotopic-distribution';
import { ChemError } from '../errors/chem-error';
import { seededRandom } from '../isotopes/seeded-random';
import { formatFormula } from './format-formula';
import { nitrogenRuleHolds } from './nitrogen-rule';
import { rdbe } from './rdbe';

describe('rdbe', () => {
  it('gives the textbook values: benzene 4, cyclohexane 1, pyridine 4, hexane 0 (SCIENCE.md §2 formula)', () => {
    expect(rdbe('C6H6')).toBe(4);
    expect(rdbe('C6H12')).toBe(1);
    expect(rdbe('C5H5N')).toBe(4);
    expect(rdbe('C6H14')).toBe(0);
  });

  it('counts Si like C, halogens like H, P like N: hexamethyldisiloxane 0, tetrachloroethene 1, trimethyl phosphate 0', () => {
    expect(rdbe('C6H18OSi2')).toBe(0);
    expect(rdbe('C2Cl4')).toBe(1);
    expect(rdbe('C3H9O4P')).toBe(0);
  });

  it('gives a half-integer for an even-electron ion: tropylium C7H7 4.5', () => {
    expect(rdbe('C7H7')).toBe(4.5);
  });

  it('agrees with the unsaturation of isotopic-distribution (independent code) on seeded random formulas', () => {
    const random = seededRandom(3);
    for (let k = 0; k < 50; k++) {
      const counts = {
        C: 1 + Math.floor(random() * 20),
        H: Math.floor(random() * 40),
        N: Math.floor(random() * 3),
        O: Math.floor(random() * 4),
        Cl: Math.floor(random() * 3),
      };
      const formula = formatFormula(counts);
      expect(rdbe(formula), formula).toBeCloseTo(
        new IsotopicDistribution(formula).getParts()[0]?.unsaturation as number,
        10,
      );
    }
  });

  it('when the formula is bad, throws ChemError instead of returning NaN', () => {
    expect(() => rdbe('C6H(')).toThrow(ChemError);
    expect(() => rdbe({ C: NaN })).toThrow(ChemError);
  });
});

describe('nitrogenRuleHolds', () => {
  it('holds for molecules: pyridine (79, 1 N), benzene (78), pyrazine (80, 2 N), PCl3 (136) (textbook rule)', () => {
    expect(nitrogenRuleHolds('C5H5N')).toBe(true);
    expect(nitrogenRuleHolds('C6H6')).toBe(true);
    expect(nitrogenRuleHolds('C4H4N2')).toBe(true);
    expect(nitrogenRuleHolds('PCl3')).toBe(true);
  });

  it('fails for radicals / even-electron ions: C7H7 (91, no N), C5H4N (78, 1 N)', () => {
    expect(nitrogenRuleHolds('C7H7')).toBe(false);
    expect(nitrogenRuleHolds('C5H4N')).toBe(false);
  });

  it('holds exactly when RDBE is a whole number (seeded random formulas)', () => {
    const random = seededRandom(5);
    for (let k = 0; k < 200; k++) {
      const counts = {
        C: 1 + Math.floor(random() * 20),
        H: Math.floor(random() * 40),
        N: Math.floor(random() * 4),
        P: Math.floor(random() * 2),
        Cl: Math.floor(random() * 3),
        Si: Math.floor(random() * 2),
      };
      expect(nitrogenRuleHolds(counts)).toBe(Number.isInteger(rdbe(counts)));
    }
  });
});
