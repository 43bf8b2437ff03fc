import { describe, expect, it } from 'vitest';
import { ChemError } from '../errors/chem-error';
import { isotopeCluster } from '../isotopes/isotope-cluster';
import { clusterAgreement } from './cluster-agreement';

describe('clusterAgreement', () => {
  it('is 1 for identical clusters, on any intensity scale', () => {
    const cluster = isotopeCluster('C6H5Cl');
    expect(clusterAgreement(cluster, cluster, 112)).toBeCloseTo(1, 12);
    const scaled = cluster.map((p) => ({ mz: p.mz, relIntensity: p.relIntensity * 37 }));
    expect(clusterAgreement(cluster, scaled, 112)).toBeCloseTo(1, 12);
  });

  it('follows its documented definition: one extra 1 % peak at M+1 gives exp(−(1/0.525)²/18) = 0.8175 [computed]', () => {
    const agreement = clusterAgreement(
      [{ mz: 100, relIntensity: 100 }],
      [
        { mz: 100, relIntensity: 100 },
        { mz: 101, relIntensity: 1 },
      ],
      100,
    );
    expect(agreement).toBeCloseTo(Math.exp(-((1 / 0.525) ** 2) / 18), 12);
    expect(agreement).toBeCloseTo(0.8175, 4);
  });

  it('is near 0 when the chlorine count is wrong (Cl2 against a Cl1 cluster)', () => {
    expect(
      clusterAgreement(
        isotopeCluster('CH2Cl2'),
        isotopeCluster('CH3Cl').map((p) => ({ ...p, mz: p.mz + 34 })),
        84,
      ),
    ).toBeLessThan(0.01);
  });

  it('ignores peaks outside M … M+8 and rounds decimal m/z', () => {
    const base = [
      { mz: 100, relIntensity: 100 },
      { mz: 101, relIntensity: 5 },
    ];
    const extra = [
      { mz: 99, relIntensity: 40 },
      { mz: 100.2, relIntensity: 100 },
      { mz: 100.9, relIntensity: 5 },
      { mz: 109, relIntensity: 50 },
    ];
    expect(clusterAgreement(base, extra, 100)).toBeCloseTo(1, 12);
  });

  it('when a peak is bad or the window empty, throws ChemError with the field; a bad M gives RangeError', () => {
    expect(() =>
      clusterAgreement([{ mz: 100, relIntensity: 100 }], [{ mz: NaN, relIntensity: 1 }], 100),
    ).toThrow(expect.objectContaining({ code: 'INVALID_ARGUMENT', field: 'observed[0].mz' }));
    expect(() =>
      clusterAgreement([{ mz: 100, relIntensity: 100 }], [{ mz: 100, relIntensity: -1 }], 100),
    ).toThrow(ChemError);
    expect(() =>
      clusterAgreement([{ mz: 100, relIntensity: 100 }], [{ mz: 100, relIntensity: 0 }], 100),
    ).toThrow(expect.objectContaining({ field: 'observed' }));
    expect(() => clusterAgreement([], [], NaN)).toThrow(RangeError);
  });

  it('does not mutate its inputs', () => {
    const observed = [
      { mz: 101, relIntensity: 5 },
      { mz: 100, relIntensity: 50 },
    ];
    clusterAgreement([{ mz: 100, relIntensity: 100 }], observed, 100);
    expect(observed).toEqual([
      { mz: 101, relIntensity: 5 },
      { mz: 100, relIntensity: 50 },
    ]);
  });
});
