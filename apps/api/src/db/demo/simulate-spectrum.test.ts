import { isotopeCluster, nominalMass, parseFormula } from '@ionfolio/chem';
import { describe, expect, it } from 'vitest';
import { DEMO_COMPOUNDS } from './demo-compounds';
import { demoRandom } from './demo-random';
import { simulateSpectrum } from './simulate-spectrum';

const at = (peaks: [number, number][], mz: number): number => peaks.find(([m]) => m === mz)?.[1] ?? 0;

function cosine(a: [number, number][], b: [number, number][]): number {
  const mzs = new Set([...a, ...b].map(([mz]) => mz));
  let ab = 0;
  let aa = 0;
  let bb = 0;
  for (const mz of mzs) {
    ab += at(a, mz) * at(b, mz);
    aa += at(a, mz) ** 2;
    bb += at(b, mz) ** 2;
  }
  return ab / Math.sqrt(aa * bb);
}

/**
 * M+2/M in % for a halogen pattern, SCIENCE.md §1 [computed from the NIST/CIAAW table there]:
 * Cl 32.0; Cl2 64.0; Cl3 96.0; Br 97.3; Br2 100/51.4; ClBr 100/77.4.
 */
const HALOGEN_M2_PERCENT: Record<string, number> = {
  'Cl1Br0': 32.0,
  'Cl2Br0': 64.0,
  'Cl3Br0': 96.0,
  'Cl0Br1': 97.3,
  'Cl0Br2': (100 / 51.4) * 100,
  'Cl1Br1': (100 / 77.4) * 100,
};

const spectra = DEMO_COMPOUNDS.map((compound, i) => ({ compound, peaks: simulateSpectrum(compound, demoRandom(1000 + i)) }));

describe('simulateSpectrum over every demo compound', () => {
  it('returns unique integer m/z in increasing order with intensities in (0, 100] and the base peak at exactly 100', () => {
    for (const { peaks } of spectra) {
      for (let i = 0; i < peaks.length; i++) {
        const [mz, intensity] = peaks[i] as [number, number];
        expect(Number.isInteger(mz)).toBe(true);
        expect(intensity).toBeGreaterThan(0);
        expect(intensity).toBeLessThanOrEqual(100);
        if (i > 0) expect(mz).toBeGreaterThan((peaks[i - 1] as [number, number])[0]);
      }
      expect(Math.max(...peaks.map(([, v]) => v))).toBe(100);
    }
  });

  it('puts the molecular ion M (nominal mass of the formula) in the spectrum and nothing above the M cluster', () => {
    for (const { compound, peaks } of spectra) {
      const massDa = nominalMass(compound.formula);
      const cluster = isotopeCluster(compound.formula);
      const clusterTopMz = Math.max(...cluster.map((p) => p.mz));
      expect(at(peaks, massDa), compound.key).toBeGreaterThan(0);
      const highest = (peaks.at(-1) as [number, number])[0];
      expect(highest, compound.key).toBeGreaterThanOrEqual(massDa);
      expect(highest, compound.key).toBeLessThanOrEqual(clusterTopMz);
    }
  });

  it('shows the M+2/M ratio of its chlorine and bromine atoms (SCIENCE.md §1) within 6 %', () => {
    let checked = 0;
    for (const { compound, peaks } of spectra) {
      const counts = parseFormula(compound.formula);
      const cl = counts.Cl ?? 0;
      const br = counts.Br ?? 0;
      if (cl + br === 0) continue;
      const massDa = nominalMass(compound.formula);
      const ratioPercent = (at(peaks, massDa + 2) / at(peaks, massDa)) * 100;
      const expected = HALOGEN_M2_PERCENT[`Cl${cl}Br${br}`];
      expect(expected, compound.key).toBeDefined();
      expect(Math.abs(ratioPercent - (expected as number)) / (expected as number), compound.key).toBeLessThan(0.06);
      // And against the exact cluster of the formula (13C, 18O included), tighter.
      const cluster = isotopeCluster(compound.formula);
      const exact = ((cluster.find((p) => p.mz === massDa + 2)?.relIntensity ?? 0) / (cluster.find((p) => p.mz === massDa)?.relIntensity ?? 1)) * 100;
      expect(Math.abs(ratioPercent - exact) / exact, compound.key).toBeLessThan(0.04);
      checked++;
    }
    expect(checked).toBeGreaterThanOrEqual(15);
  });

  it('shows the sulfur M+2 (34S, 4.47 % per S, SCIENCE.md §1) in sulfur compounds', () => {
    for (const { compound, peaks } of spectra) {
      const counts = parseFormula(compound.formula);
      if (!counts.S || counts.Cl || counts.Br || counts.Si) continue;
      const massDa = nominalMass(compound.formula);
      const ratioPercent = (at(peaks, massDa + 2) / at(peaks, massDa)) * 100;
      // 34S plus a little 13C2 and 18O: at least the sulfur share, at most ~1.5 points more.
      expect(ratioPercent, compound.key).toBeGreaterThan(4.47 * counts.S * 0.9);
      expect(ratioPercent, compound.key).toBeLessThan(4.47 * counts.S + 1.5);
    }
  });
});

describe('simulateSpectrum, single compounds', () => {
  const byKey = (key: string) => {
    const compound = DEMO_COMPOUNDS.find((c) => c.key === key);
    if (!compound) throw new Error(`no demo compound ${key}`);
    return compound;
  };

  it('gives the same spectrum for the same rng sequence and a different one for another', () => {
    const c = byKey('linalool');
    expect(simulateSpectrum(c, demoRandom(7))).toEqual(simulateSpectrum(c, demoRandom(7)));
    expect(simulateSpectrum(c, demoRandom(7))).not.toEqual(simulateSpectrum(c, demoRandom(8)));
  });

  it('adds only small noise: two draws of one compound stay alike (cosine above 0.98)', () => {
    for (const key of ['linalool', 'benzyl-chloride', 'eugenol-tms', 'dibromoethane']) {
      expect(cosine(simulateSpectrum(byKey(key), demoRandom(1)), simulateSpectrum(byKey(key), demoRandom(2)))).toBeGreaterThan(0.98);
    }
  });

  it('keeps different compounds of one formula apart (alpha-pinene vs limonene, cosine below 0.95)', () => {
    expect(cosine(simulateSpectrum(byKey('alpha-pinene'), demoRandom(1)), simulateSpectrum(byKey('limonene'), demoRandom(1)))).toBeLessThan(0.95);
  });

  it('gives fragments the isotope cluster of their own formula: CH2Cl+ 51/49, CHCl2+ 85/83, C2H4Br+ 109/107 (SCIENCE.md §1)', () => {
    const dcm = simulateSpectrum(byKey('dichloromethane'), demoRandom(3));
    expect(Math.abs((at(dcm, 51) / at(dcm, 49)) * 100 - 32.0)).toBeLessThan(2.5);
    const chloroform = simulateSpectrum(byKey('chloroform'), demoRandom(3));
    expect(Math.abs((at(chloroform, 85) / at(chloroform, 83)) * 100 - 64.0)).toBeLessThan(4);
    const edb = simulateSpectrum(byKey('dibromoethane'), demoRandom(3));
    expect(Math.abs((at(edb, 109) / at(edb, 107)) * 100 - 97.3)).toBeLessThan(5);
  });

  it('shows the loss of Cl (M−35) for benzyl chloride and of Br (M−79) for benzyl bromide', () => {
    expect(at(simulateSpectrum(byKey('benzyl-chloride'), demoRandom(4)), 126 - 35)).toBeGreaterThan(10);
    expect(at(simulateSpectrum(byKey('benzyl-bromide'), demoRandom(4)), 170 - 79)).toBeGreaterThan(10);
  });

  it('gives TMS derivatives m/z 73 and a strong M−15, and acetates a strong m/z 43', () => {
    for (const c of DEMO_COMPOUNDS.filter((d) => d.role === 'derivative')) {
      const peaks = simulateSpectrum(c, demoRandom(5));
      expect(at(peaks, 73), c.key).toBeGreaterThan(10);
      expect(at(peaks, nominalMass(c.formula) - 15), c.key).toBeGreaterThan(20);
    }
    for (const key of ['linalyl-acetate', 'benzyl-acetate', 'isoamyl-acetate']) {
      expect(at(simulateSpectrum(byKey(key), demoRandom(5)), 43), key).toBeGreaterThan(30);
    }
  });

  it('never explains a peak by an atom the formula lacks: no m/z 73 cluster of Si, no Cl pattern, in hexane', () => {
    const hexane = simulateSpectrum({ formula: 'C6H14', smiles: 'CCCCCC' }, demoRandom(6));
    expect(at(hexane, 86)).toBeGreaterThan(0);
    for (const [mz] of hexane) expect(mz).toBeLessThanOrEqual(88);
    expect(at(hexane, 86 - 35)).toBe(0);
    expect(at(hexane, 73)).toBe(0);
  });

  it('drops peaks below fromMz and still puts the base peak at 100', () => {
    const peaks = simulateSpectrum(byKey('linalool'), demoRandom(9), { fromMz: 50 });
    expect(Math.min(...peaks.map(([mz]) => mz))).toBeGreaterThanOrEqual(50);
    expect(Math.max(...peaks.map(([, v]) => v))).toBe(100);
  });

  it('changes intensities but keeps the molecular ion for another variant', () => {
    const c = byKey('geraniol');
    const a = simulateSpectrum(c, demoRandom(10));
    const b = simulateSpectrum(c, demoRandom(10), { variant: 1 });
    expect(b).not.toEqual(a);
    expect(at(b, 154)).toBeGreaterThan(0);
  });

  it('works from the formula alone', () => {
    const peaks = simulateSpectrum({ formula: 'C7H7Cl' }, demoRandom(11));
    expect(at(peaks, 126)).toBeGreaterThan(0);
    expect(Math.abs((at(peaks, 128) / at(peaks, 126)) * 100 - 32.0)).toBeLessThan(2.5);
  });

  it('throws RangeError when fromMz is above the molecular ion, and ChemError for a bad formula', () => {
    expect(() => simulateSpectrum({ formula: 'CH4O' }, demoRandom(1), { fromMz: 40 })).toThrow(RangeError);
    expect(() => simulateSpectrum({ formula: 'C6H5Xx' }, demoRandom(1))).toThrow(/Xx|element/i);
  });
});
