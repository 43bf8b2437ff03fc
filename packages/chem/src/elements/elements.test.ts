import { describe, expect, it } from 'vitest';
import { elementsAndStableIsotopesObject } from 'chemical-elements';
import { ELEMENTS, ELEMENT_SYMBOLS, isElementSymbol, mostAbundantIsotope } from './elements';

describe('ELEMENTS', () => {
  it('holds the eleven supported elements, once each', () => {
    expect(Object.keys(ELEMENTS).sort()).toEqual([...ELEMENT_SYMBOLS].sort());
    expect(new Set(ELEMENT_SYMBOLS).size).toBe(11);
  });

  it('has mole fractions that sum to 1 for every element (SCIENCE.md §1, CIAAW compositions)', () => {
    for (const symbol of ELEMENT_SYMBOLS) {
      const sum = ELEMENTS[symbol].isotopes.reduce((s, i) => s + i.abundance, 0);
      expect(sum, symbol).toBeCloseTo(1, 9);
    }
  });

  it('matches the independent chemical-elements package isotope by isotope (same NIST/AME source)', () => {
    for (const symbol of ELEMENT_SYMBOLS) {
      const theirs = elementsAndStableIsotopesObject[symbol]?.isotopes ?? [];
      const ours = ELEMENTS[symbol].isotopes;
      expect(ours.length, symbol).toBe(theirs.length);
      ours.forEach((isotope, k) => {
        expect(isotope.massNumber).toBe(theirs[k]?.nominal);
        expect(Math.abs(isotope.massU - (theirs[k]?.mass ?? NaN))).toBeLessThan(1e-9);
        expect(isotope.abundance).toBe(theirs[k]?.abundance);
      });
    }
  });

  it('gives the table values of SCIENCE.md §1 for 37Cl and 81Br (NIST / AME 2016)', () => {
    expect(ELEMENTS.Cl.isotopes[1]).toEqual({ massNumber: 37, massU: 36.965902602, abundance: 0.2424 });
    expect(ELEMENTS.Br.isotopes[1]).toEqual({ massNumber: 81, massU: 80.9162897, abundance: 0.4931 });
  });

  it('lists isotopes lightest first, and the most abundant is the lightest for every element', () => {
    for (const symbol of ELEMENT_SYMBOLS) {
      const masses = ELEMENTS[symbol].isotopes.map((i) => i.massNumber);
      expect(masses).toEqual([...masses].sort((a, b) => a - b));
      expect(mostAbundantIsotope(symbol)).toBe(ELEMENTS[symbol].isotopes[0]);
    }
  });

  it('uses the lowest common valences (common practice)', () => {
    expect(ELEMENTS.C.valence).toBe(4);
    expect(ELEMENTS.N.valence).toBe(3);
    expect(ELEMENTS.S.valence).toBe(2);
    expect(ELEMENTS.Si.valence).toBe(4);
    expect(ELEMENTS.Cl.valence).toBe(1);
  });

  it('is frozen, so callers cannot change the table', () => {
    expect(Object.isFrozen(ELEMENTS)).toBe(true);
    expect(Object.isFrozen(ELEMENTS.C.isotopes)).toBe(true);
    expect(Object.isFrozen(ELEMENTS.C.isotopes[0])).toBe(true);
  });
});

describe('isElementSymbol', () => {
  it('accepts supported symbols and rejects others, case-sensitively', () => {
    expect(isElementSymbol('Cl')).toBe(true);
    expect(isElementSymbol('CL')).toBe(false);
    expect(isElementSymbol('Xx')).toBe(false);
    expect(isElementSymbol('toString')).toBe(false);
  });
});
