import { readMolecularIon } from '@ionfolio/chem';
import { describe, expect, it } from 'vitest';
import { formulaDisagreements } from './formula-disagreement';

// Invented chlorobenzene-like query: M 112 with M+2 32.5 % (one 37Cl at 32.0 %/Cl, SCIENCE.md §1).
const reading = readMolecularIon([
  [50, 9],
  [51, 14],
  [77, 60],
  [112, 100],
  [113, 6.6],
  [114, 32.5],
  [115, 2.1],
]);

describe('formulaDisagreements', () => {
  it('when the formula matches M and the Cl/Br counts, finds nothing', () => {
    expect(reading.molecularIonMz).toBe(112);
    expect(formulaDisagreements({ formula: 'C6H5Cl', nominalMass: 112 }, reading)).toEqual([]);
  });

  it('when nominal mass and halogens differ, names each difference', () => {
    expect(formulaDisagreements({ formula: 'C6H4Cl2', nominalMass: 146 }, reading)).toEqual([
      "nominal mass 146, the query's M reads 112",
      'Cl2 in the formula, the cluster reads Cl1',
    ]);
  });

  it('when M is likely absent or there is no reading, flags nothing', () => {
    expect(formulaDisagreements({ formula: 'C10H22', nominalMass: 142 }, { ...reading, likelyAbsent: true, molecularIonMz: null })).toEqual([]);
    expect(formulaDisagreements({ formula: 'C10H22', nominalMass: 142 }, null)).toEqual([]);
  });

  it('when the formula cannot be read, says so', () => {
    expect(formulaDisagreements({ formula: 'C6H5Xq', nominalMass: 112 }, reading)).toEqual(['formula "C6H5Xq" could not be read']);
  });
});
