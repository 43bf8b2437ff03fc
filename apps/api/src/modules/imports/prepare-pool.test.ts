import { describe, expect, it } from 'vitest';
import { createLogger } from '../../shared/logger';
import type { UploadedBlock } from '../uploads/spectrum-file';
import { prepareBlock } from './import-block';
import { SLICE_BLOCKS, workerPreparer } from './prepare-pool';

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

  it('several chunks asked at once, each cut into slices shared by the workers, come back whole and in order', async () => {
    const many: UploadedBlock[] = Array.from({ length: 3 * SLICE_BLOCKS + 7 }, (_, i) => ({
      ...blocks[i % blocks.length]!,
      index: i + 1,
      title: `Pool block ${i + 1}`,
    }));
    const notUsed = async (): Promise<never> => {
      throw new Error('the main-thread fallback ran: the workers did not');
    };
    const pool = workerPreparer(createLogger('silent'), notUsed);
    try {
      const chunks = [many.slice(0, 40), many.slice(40, 41), many.slice(41)];
      const prepared = await Promise.all(chunks.map((c) => pool.prepare(c)));
      expect(prepared).toEqual(chunks.map((c) => c.map(prepareBlock)));
    } finally {
      await pool.close();
    }
  });

  it('a chunk that cannot be handed to a worker is prepared on the main thread; the next one goes to the workers', async () => {
    let fallbacks = 0;
    const pool = workerPreparer(createLogger('silent'), async (b) => {
      fallbacks++;
      return b.map(prepareBlock);
    });
    try {
      // A function cannot be copied to another thread; the checks do not read the extra field.
      const odd = [{ ...blocks[0]!, extra: () => 'not data' } as UploadedBlock];
      expect((await pool.prepare(odd)).map((p) => p.ok)).toEqual([true]);
      expect(fallbacks).toBe(1);
      expect(await pool.prepare(blocks.slice(0, 3))).toEqual(blocks.slice(0, 3).map(prepareBlock));
      expect(fallbacks).toBe(1);
    } finally {
      await pool.close();
    }
  });

  it('when closed while chunks are being prepared, they fail instead of being prepared again on the main thread', async () => {
    const pool = workerPreparer(createLogger('silent'), async () => {
      throw new Error('the main-thread fallback ran');
    });
    const pending = pool.prepare(Array.from({ length: 4 * SLICE_BLOCKS }, (_, i) => ({ ...blocks[0]!, index: i + 1 })));
    const outcome = expect(pending).rejects.toThrow('closed');
    await pool.close();
    await outcome;
  });

  it('after close, prepares on the main thread', async () => {
    const pool = workerPreparer(createLogger('silent'), async (b) => b.map(prepareBlock));
    await pool.close();
    expect(await pool.prepare(blocks.slice(0, 2))).toEqual(blocks.slice(0, 2).map(prepareBlock));
  });
});
