import { describe, expect, it } from 'vitest';
import { IsotopicDistribution } from 'isotopic-distribution';
import { ChemError } from '../errors/chem-error';
import { formatFormula } from '../formula/format-formula';
import { monoisotopicMass } from '../formula/monoisotopic-mass';
import { nominalMass } from '../formula/nominal-mass';
import { isotopeCluster, type ClusterPeak } from './isotope-cluster';
import { seededRandom } from './seeded-random';
import { nowMs, reportLine } from './test-clock';

/**
 * Independent reference: isotopic-distribution (MIT, other code) gives the fine structure; summed
 * here by nominal offset from the monoisotopic mass and scaled so the most intense is 100.
 */
function referenceCluster(formula: string): Map<number, number> {
  const peaks = new IsotopicDistribution(formula, { fwhm: 1e-6 }).getPeaks({ maxValue: 1 }) as {
    x: number;
    y: number;
  }[];
  const m0 = monoisotopicMass(formula);
  const base = nominalMass(formula);
  const summed = new Map<number, number>();
  for (const { x, y } of peaks) {
    const mz = base + Math.round(x - m0);
    summed.set(mz, (summed.get(mz) ?? 0) + y);
  }
  const max = Math.max(...summed.values());
  for (const [mz, y] of summed) summed.set(mz, (100 * y) / max);
  return summed;
}

function maxDeviation(ours: ClusterPeak[], reference: Map<number, number>): number {
  const mine = new Map(ours.map((p) => [p.mz, p.relIntensity]));
  let worst = 0;
  for (const mz of new Set([...mine.keys(), ...reference.keys()])) {
    worst = Math.max(worst, Math.abs((mine.get(mz) ?? 0) - (reference.get(mz) ?? 0)));
  }
  return worst;
}

const FIXED_FORMULAS = [
  'C6H6',
  'C7H8',
  'C6H5Cl',
  'CH2Cl2',
  'CHCl3',
  'CCl4',
  'C2Cl4',
  'CHBr3',
  'C6H4Br2',
  'C6Cl6',
  'C4H4S',
  'C8H24O4Si4',
  'C10H30O5Si5',
  'C6H18OSi2',
  'C12H10',
  'C60',
  'C100H202',
  'Br6',
  'Cl10',
  'C3H9O4P',
  'C6H5I',
  'C2F6',
  'C20H42',
  'C5H5N',
  'C2H6OS',
  'C12H4Cl4O2',
  'C7H5BrClNO2S',
  'CS2',
  'C6H5NO2',
  'C16H10',
];

function randomFormula(random: () => number): string {
  const counts: Record<string, number> = { C: 1 + Math.floor(random() * 60), H: Math.floor(random() * 100) };
  for (const [symbol, max] of [
    ['N', 6],
    ['O', 10],
    ['S', 4],
    ['Cl', 8],
    ['Br', 5],
    ['F', 8],
    ['Si', 6],
    ['P', 2],
    ['I', 2],
  ] as const) {
    if (random() < 0.35) counts[symbol] = 1 + Math.floor(random() * max);
  }
  return formatFormula(counts);
}

describe('isotopeCluster', () => {
  it('agrees with isotopic-distribution within 0.1 percentage points for 30 fixed and 40 seeded random formulas', () => {
    const random = seededRandom(2024);
    const formulas = [...FIXED_FORMULAS, ...Array.from({ length: 40 }, () => randomFormula(random))];
    let worst = 0;
    let worstFormula = '';
    for (const formula of formulas) {
      const deviation = maxDeviation(
        isotopeCluster(formula, { minRelIntensity: 0 }),
        referenceCluster(formula),
      );
      if (deviation > worst) [worst, worstFormula] = [deviation, formula];
      expect(deviation, formula).toBeLessThan(0.1);
    }
    reportLine(
      `isotopeCluster vs isotopic-distribution: ${formulas.length} formulas, max deviation ${worst.toExponential(2)} pp (${worstFormula})`,
    );
  });

  it('reproduces the halogen cluster table of SCIENCE.md §1 [computed from the NIST/CIAAW table]', () => {
    const table: [string, number[]][] = [
      ['Cl2', [100, 64.0, 10.2]],
      ['Cl3', [100, 96.0, 30.7, 3.3]],
      ['Br2', [51.4, 100, 48.6]],
      ['ClBr', [77.4, 100, 24.1]],
      ['Br3', [34.3, 100, 97.3, 31.5]],
    ];
    for (const [formula, expected] of table) {
      const cluster = isotopeCluster(formula);
      const m = nominalMass(formula);
      expected.forEach((relIntensity, k) => {
        const peak = cluster.find((p) => p.mz === m + 2 * k);
        expect(
          Math.abs((peak?.relIntensity ?? NaN) - relIntensity),
          `${formula} M+${2 * k}`,
        ).toBeLessThanOrEqual(0.051);
      });
    }
  });

  it('gives the rules of thumb of SCIENCE.md §1: M+1 1.08 % per C, M+2 32.0 % per Cl and 97.3 % per Br', () => {
    const c10 = isotopeCluster('C10');
    expect((c10[1]?.relIntensity ?? 0) / 10).toBeCloseTo(1.08, 2);
    expect(isotopeCluster('CH3Cl')[2]?.relIntensity).toBeCloseTo(32.0, 0);
    const bromomethane = isotopeCluster('CH3Br');
    expect(bromomethane.find((p) => p.mz === 96)?.relIntensity).toBeCloseTo(97.3, 0);
  });

  it('starts at the lightest-isotope nominal mass M and is sorted by m/z with the maximum at 100', () => {
    const cluster = isotopeCluster('C6H4Br2');
    expect(cluster[0]?.mz).toBe(234);
    expect(cluster.map((p) => p.mz)).toEqual([...cluster.map((p) => p.mz)].sort((a, b) => a - b));
    expect(Math.max(...cluster.map((p) => p.relIntensity))).toBe(100);
    expect(cluster.find((p) => p.relIntensity === 100)?.mz).toBe(236);
  });

  it('leaves out peaks below minRelIntensity, 0.01 by default', () => {
    expect(isotopeCluster('Cl2').map((p) => p.mz)).toEqual([70, 72, 74]);
    expect(isotopeCluster('C6H6').every((p) => p.relIntensity >= 0.01)).toBe(true);
    expect(isotopeCluster('C6H6', { minRelIntensity: 1 }).map((p) => p.mz)).toEqual([78, 79]);
  });

  it('is fast for C60, Br6, Cl10 and C100H202 (well under 5 ms each)', () => {
    for (const formula of ['C60', 'Br6', 'Cl10', 'C100H202']) {
      isotopeCluster(formula);
      const start = nowMs();
      for (let k = 0; k < 20; k++) isotopeCluster(formula);
      const msEach = (nowMs() - start) / 20;
      expect(msEach, formula).toBeLessThan(5);
    }
  });

  it('does not mutate its input counts', () => {
    const input = { C: 6, H: 5, Cl: 1 };
    isotopeCluster(input);
    expect(input).toEqual({ C: 6, H: 5, Cl: 1 });
  });

  it('when the formula is bad or empty, throws ChemError; when minRelIntensity is NaN, RangeError', () => {
    expect(() => isotopeCluster('Xx2')).toThrow(
      expect.objectContaining({ code: 'UNKNOWN_ELEMENT', position: 0 }),
    );
    expect(() => isotopeCluster({})).toThrow(ChemError);
    expect(() => isotopeCluster('C6H6', { minRelIntensity: NaN })).toThrow(RangeError);
    expect(() => isotopeCluster('C6H6', { minRelIntensity: -1 })).toThrow(RangeError);
  });
});
