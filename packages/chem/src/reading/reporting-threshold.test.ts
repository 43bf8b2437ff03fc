import { describe, expect, it } from 'vitest';
import { readMolecularIon } from './read-molecular-ion';

// Peak lists are often cut at a reporting threshold of 1–3 % of the base peak (common practice),
// so small isotope peaks may be missing. The intensities below are invented; the 37Cl partner at
// M+2 is about 32 % of M for one chlorine (SCIENCE.md §1, from the NIST isotope table).
describe('readMolecularIon with peaks below the reporting threshold left out', () => {
  it('when the M+3 of a one-chlorine cluster is missing, still reads M and Cl 1', () => {
    const r = readMolecularIon([
      [112, 100],
      [113, 6.6],
      [114, 32.5],
    ]);
    expect(r.molecularIonMz).toBe(112);
    expect(r.chlorine).toBe(1);
  });

  it('when the cluster sits below a stronger fragment and small peaks are cut, reads M at the cluster start, not at its M+2', () => {
    const r = readMolecularIon([
      [39, 9],
      [63, 11],
      [65, 10],
      [89, 8],
      [91, 100],
      [92, 8],
      [126, 45],
      [127, 3.6],
      [128, 14.4],
    ]);
    expect(r.molecularIonMz).toBe(126);
    expect(r.chlorine).toBe(1);
    expect(r.bromine).toBe(0);
  });

  it('does not explain a whole cluster as [M−2H]+ of a sliver two m/z higher', () => {
    const r = readMolecularIon([
      [77, 60],
      [111, 12],
      [112, 100],
      [113, 6.6],
      [114, 32.5],
      [115, 2.1],
      [116, 0.5],
    ]);
    expect(r.molecularIonMz).not.toBe(114);
  });
});
