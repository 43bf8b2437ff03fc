import { afterAll, describe, expect, it } from 'vitest';
import { ChemError, isotopeCluster } from '@ionfolio/chem';
import { createLogger } from '../../shared/logger';
import { createReadingPool, readOnThisThread } from './reading-pool';

const pool = createReadingPool(createLogger('silent'));
afterAll(() => pool.close());

// Simulated spectra: the theoretical clusters of a few formulas (isotopeCluster) with two fragments.
const spectra = ['C6H5Cl', 'C6H4Br2', 'C10H18O', 'C7H7NO2'].map((formula) => [
  [39, 30],
  [51, 45],
  ...isotopeCluster(formula).map((p) => [p.mz, p.relIntensity] as [number, number]),
] as [number, number][]);

describe('reading pool', () => {
  it('reads on the worker thread exactly what the main thread reads', async () => {
    const onWorker = await Promise.all(spectra.map((peaks) => pool.read(peaks)));
    expect(onWorker.map((r) => r?.chlorine)).toEqual([1, 0, 0, 0]);
    expect(onWorker.map((r) => r?.bromine)).toEqual([0, 2, 0, 0]);
    spectra.forEach((peaks, i) => expect(onWorker[i]).toEqual(readOnThisThread(peaks)));
  });

  it('hands back a bad peak list as a ChemError with its field', async () => {
    const error = await pool.read([[43, Number.NaN]]).catch((err: unknown) => err);
    expect(error).toBeInstanceOf(ChemError);
    expect(error).toMatchObject({ code: 'INVALID_PEAKS' });
    expect(String((error as ChemError).field)).toMatch(/^peaks/);
  });

  it('can start its worker before the first read', async () => {
    const warmed = createReadingPool(createLogger('silent'));
    warmed.warm();
    warmed.warm();
    expect(await warmed.read(spectra[2]!)).toEqual(readOnThisThread(spectra[2]!));
    await warmed.close();
  });

  it('reads on the calling thread once closed', async () => {
    const other = createReadingPool(createLogger('silent'));
    await other.read(spectra[0]!);
    await other.close();
    expect(await other.read(spectra[1]!)).toEqual(readOnThisThread(spectra[1]!));
  });
});
