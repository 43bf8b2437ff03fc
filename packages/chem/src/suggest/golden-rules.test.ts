import { describe, expect, it } from 'vitest';
import { parseFormula } from '../formula/parse-formula';
import {
  elementCap,
  heteroatomRatioFailures,
  passesElementProbability,
  passesHcRatio,
  passesLewisSenior,
  type CountsVector,
} from './golden-rules';

function vector(formula: string): CountsVector {
  const c = parseFormula(formula);
  return {
    C: c.C ?? 0,
    H: c.H ?? 0,
    N: c.N ?? 0,
    O: c.O ?? 0,
    S: c.S ?? 0,
    Cl: c.Cl ?? 0,
    Br: c.Br ?? 0,
    F: c.F ?? 0,
    Si: c.Si ?? 0,
    P: c.P ?? 0,
    I: c.I ?? 0,
  };
}

describe('Seven Golden Rules checks (Kind & Fiehn 2007, SCIENCE.md §2)', () => {
  it('caps element counts below 500 Da as SCIENCE.md §2 lists them (secondary source)', () => {
    expect([elementCap('C', 300), elementCap('H', 300), elementCap('N', 300), elementCap('O', 300)]).toEqual([
      39, 72, 20, 20,
    ]);
    expect([
      elementCap('P', 300),
      elementCap('S', 300),
      elementCap('F', 300),
      elementCap('Cl', 300),
      elementCap('Br', 300),
      elementCap('Si', 300),
    ]).toEqual([9, 10, 16, 10, 5, 8]);
    expect(elementCap('C', 700)).toBeGreaterThan(39);
  });

  it('LEWIS/SENIOR: accepts molecules, rejects odd valence sums and over-saturated formulas', () => {
    for (const ok of ['C6H6', 'CH4', 'C2H6OS', 'CCl4', 'C6H18OSi2', 'CS2', 'C3H9O4P'])
      expect(passesLewisSenior(vector(ok)), ok).toBe(true);
    for (const bad of ['CH5', 'C2H8', 'C7H7', 'H2', 'HCl']) {
      const expected = bad === 'H2' || bad === 'HCl';
      expect(passesLewisSenior(vector(bad)), bad).toBe(expected);
    }
  });

  it('H/C common range 0.2–3.1: hexane passes, methane and CCl4 fail', () => {
    expect(passesHcRatio(vector('C6H14'))).toBe(true);
    expect(passesHcRatio(vector('CH4'))).toBe(false);
    expect(passesHcRatio(vector('CCl4'))).toBe(false);
  });

  it('heteroatom ratios: caffeine passes, CCl4 (Cl/C 4 > 0.8) and CH2F2 fail', () => {
    expect(heteroatomRatioFailures(vector('C8H10N4O2'))).toBe(0);
    expect(heteroatomRatioFailures(vector('CCl4'))).toBe(1);
    expect(heteroatomRatioFailures(vector('CN2O3'))).toBe(2);
  });

  it('element probability: limits several of N, O, P, S at once (from memory)', () => {
    expect(passesElementProbability(vector('C20H30N2O4P2S2'))).toBe(true);
    expect(passesElementProbability(vector('C20H30N5O4P3S3'))).toBe(false);
  });
});
