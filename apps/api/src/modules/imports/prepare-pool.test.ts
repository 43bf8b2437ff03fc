import { describe, expect, it } from 'vitest';
import { createLogger } from '../../shared/logger';
import type { UploadedBlock } from '../uploads/spectrum-file';
import { prepareBlock } from './import-block';
import { workerPreparer } from './prepare-pool';

// Invented test spectra (simulated): an acetone-like block, one with an unknown element, one without peaks.
const blocks: UploadedBlock[] = Array.from({ length: 9 }, (_, i) => ({
  index: i + 1,
  title: `Pool block ${i + 1}`,
  formula: i === 4 ? 'C3Xx6O' : 'C3H6O',
  peaks:
    i === 7
      ? []
      : [
          [15, 20 + i],
          [43, 100],
          [58, 30],
        ],
  retentionIndex: 500 + i,
}));

describe('workerPreparer', () => {
  it('prepares blocks on worker threads with the same outcome, in the same order, as on the main thread', async () => {
    const notUsed = async (): Promise<never> => {
      throw new Error('the main-thread fallback ran: the workers did not');
    };
    const pool = workerPreparer(createLogger('silent'), notUsed);
    try {
      const onWorkers = await pool.prepare(blocks);
      expect(onWorkers).toEqual(blocks.map(prepareBlock));
      expect(onWorkers.map((p) => p.ok)).toEqual([true, true, true, true, false, true, true, false, true]);
      // A second batch on the same workers.
      expect(await pool.prepare(blocks.slice(2, 4))).toEqual(blocks.slice(2, 4).map(prepareBlock));
    } finally {
      await pool.close();
    }
  });

  it('after close, prepares on the main thread', async () => {
    const pool = workerPreparer(createLogger('silent'), async (b) => b.map(prepareBlock));
    await pool.close();
    expect(await pool.prepare(blocks.slice(0, 2))).toEqual(blocks.slice(0, 2).map(prepareBlock));
  });
});
