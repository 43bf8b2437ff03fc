import { describe, expect, it } from 'vitest';
import { ChemError } from '../errors/chem-error';
import { isotopeCluster } from '../isotopes/isotope-cluster';
import type { Peak } from '../types';
import { checkRevision } from './check-revision';
import type { CheckResult } from './check-result';

// Spectra are simulated: clusters from isotopeCluster (isotope table, SCIENCE.md §1) plus invented fragments.
function cluster(formula: string, topIntensity: number): Peak[] {
  return isotopeCluster(formula).map((p) => [p.mz, (p.relIntensity * topIntensity) / 100] as Peak);
}

const FRAGMENTS: Peak[] = [
  [50, 14],
  [51, 30],
  [74, 5],
  [75, 4],
  [77, 100],
  [78, 6.5],
];
const CHLOROBENZENE: Peak[] = [...FRAGMENTS, ...cluster('C6H5Cl', 80)];

function byId(results: CheckResult[], id: string): CheckResult {
  const result = results.find((r) => r.id === id);
  if (!result) throw new Error(`no check ${id}`);
  return result;
}

function statusOf(peaks: Peak[], formula = 'C6H5Cl', ionizationEnergyEv: number | undefined = 70): Record<string, string> {
  return Object.fromEntries(checkRevision({ formula, peaks, ionizationEnergyEv }).map((r) => [r.id, r.status]));
}

describe('checkRevision', () => {
  it('when the formula and a clean simulated spectrum agree, every check passes with a one-line reason', () => {
    const results = checkRevision({ formula: 'C6H5Cl', peaks: CHLOROBENZENE, ionizationEnergyEv: 70 });
    expect(results.map((r) => r.id)).toEqual([
      'molecular-ion-mass',
      'isotope-cluster',
      'nitrogen-rule',
      'peaks-above-molecular-ion',
      'peak-count',
      'clipped-base-peak',
      'background-ions',
      'impossible-fragment',
      'ionization-energy',
    ]);
    for (const result of results) {
      expect(result.status, `${result.id}: ${result.reason}`).toBe('pass');
      expect(result.reason).not.toContain('\n');
    }
    expect(byId(results, 'molecular-ion-mass').numbers['formulaMassDa']).toBe(112);
  });

  it('when the formula is lighter than the cluster found, fails the mass check and flags the peaks above M', () => {
    const status = statusOf(CHLOROBENZENE, 'C6H6');
    expect(status['molecular-ion-mass']).toBe('fail');
    expect(status['peaks-above-molecular-ion']).toBe('fail');
  });

  it('when the formula is heavier than any peak, warns that M may be absent', () => {
    expect(statusOf(CHLOROBENZENE, 'C6H5Br')['molecular-ion-mass']).toBe('warn');
  });

  it('when M+2 is far from the 32 % of one chlorine (SCIENCE.md §1), the cluster check fails and names the m/z', () => {
    const peaks = CHLOROBENZENE.map(([mz, y]) => [mz, mz === 114 ? 48 : y] as Peak);
    const result = byId(checkRevision({ formula: 'C6H5Cl', peaks, ionizationEnergyEv: 70 }), 'isotope-cluster');
    expect(result.status).toBe('fail');
    expect(result.numbers['worstMz']).toBe(114);
    expect(result.numbers['theoretical']).toBeCloseTo(32.6, 0);
  });

  it('when the formula breaks the nitrogen rule (odd mass, no N; SCIENCE.md §2), fails', () => {
    expect(statusOf(CHLOROBENZENE, 'C6H7')['nitrogen-rule']).toBe('fail');
  });

  it('when a peak stands above the cluster, warns for a weak one and fails for a strong one', () => {
    expect(statusOf([...CHLOROBENZENE, [130, 2]])['peaks-above-molecular-ion']).toBe('warn');
    const results = checkRevision({ formula: 'C6H5Cl', peaks: [...CHLOROBENZENE, [130, 10]], ionizationEnergyEv: 70 });
    expect(byId(results, 'peaks-above-molecular-ion')).toMatchObject({ status: 'fail', numbers: { strongestMz: 130, strongestRelIntensity: 10 } });
  });

  it('when there are very few peaks, warns below 5 and fails for one', () => {
    expect(statusOf(cluster('C6H5Cl', 100).slice(0, 3))['peak-count']).toBe('warn');
    expect(statusOf([[112, 100]])['peak-count']).toBe('fail');
  });

  it('when two peaks sit at 100 % or a neighbour is 98 % of the base peak, warns of a clipped base peak', () => {
    expect(statusOf(CHLOROBENZENE.map(([mz, y]) => [mz, mz === 51 ? 100 : y] as Peak))['clipped-base-peak']).toBe('warn');
    expect(statusOf(CHLOROBENZENE.map(([mz, y]) => [mz, mz === 78 ? 98 : y] as Peak))['clipped-base-peak']).toBe('warn');
  });

  it('when air and column-bleed ions are present (common practice), warns with their intensities', () => {
    const results = checkRevision({ formula: 'C6H5Cl', peaks: [...CHLOROBENZENE, [28, 20], [32, 5], [207, 0.5]], ionizationEnergyEv: 70 });
    const result = byId(results, 'background-ions');
    expect(result.status).toBe('warn');
    expect(result.numbers).toMatchObject({ mz28: 20, mz32: 5 });
    expect(result.numbers['mz207']).toBeUndefined();
  });

  it('when a fragment cluster shows two Cl but the formula has one, fails naming the fragment', () => {
    const peaks = [...CHLOROBENZENE, ...cluster('C2HCl2', 40)];
    const result = byId(checkRevision({ formula: 'C6H5Cl', peaks, ionizationEnergyEv: 70 }), 'impossible-fragment');
    expect(result.status).toBe('fail');
    expect(result.numbers).toMatchObject({ fragmentMz: 95, fragmentChlorine: 2, formulaChlorine: 1 });
  });

  it('when the same fragment cluster is checked against a dichloro formula, passes', () => {
    const peaks = [...FRAGMENTS, ...cluster('C2HCl2', 40), ...cluster('C6H4Cl2', 80)];
    expect(statusOf(peaks, 'C6H4Cl2')['impossible-fragment']).toBe('pass');
  });

  it('when the ionization energy is not 70 eV or not given, warns', () => {
    expect(statusOf(CHLOROBENZENE, 'C6H5Cl', 20)['ionization-energy']).toBe('warn');
    expect(byId(checkRevision({ formula: 'C6H5Cl', peaks: CHLOROBENZENE }), 'ionization-energy').status).toBe('warn');
  });

  it('does not mutate its input', () => {
    const peaks = CHLOROBENZENE.map((p) => [...p] as Peak);
    checkRevision({ formula: 'C6H5Cl', peaks });
    expect(peaks).toEqual(CHLOROBENZENE);
  });

  it('when the formula or peaks are bad, throws a documented error', () => {
    expect(() => checkRevision({ formula: 'C6H5Xx', peaks: CHLOROBENZENE })).toThrow(ChemError);
    expect(() => checkRevision({ formula: 'C6H5Cl', peaks: [] })).toThrow(ChemError);
    expect(() => checkRevision({ formula: 'C6H5Cl', peaks: CHLOROBENZENE, ionizationEnergyEv: Number.NaN })).toThrow(RangeError);
  });
});
