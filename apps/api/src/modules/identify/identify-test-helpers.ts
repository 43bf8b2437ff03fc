import { simulatedSpectrum, type Peak } from '@ionfolio/chem';
import type TestAgent from 'supertest/lib/agent';
import { chlorobenzeneContent } from '../../testing/fixtures';

export const W = { 'X-Requested-With': 'ionfolio' };

/** A seeded uniform generator (mulberry32), so a failing run can be repeated from its printed seed. */
export function seeded(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** A simulated EI-like spectrum (invented, not a real compound): 30–40 peaks up to m/z ≤ 300. */
export const simulatedPeaks = (random: () => number): Peak[] => simulatedSpectrum(random, { minMz: 30, maxMz: 300, peakCount: 35 });

/**
 * A replicate as the acceptance of issue 5 describes it: every intensity times a factor within ±10 %,
 * two peaks (not the base peak) dropped, two small noise peaks added at free m/z.
 */
export function noisyReplicate(peaks: readonly Peak[], random: () => number): Peak[] {
  const out = peaks.map(([mz, y]) => [mz, y * (0.9 + 0.2 * random())] as Peak);
  for (let dropped = 0; dropped < 2; ) {
    const i = Math.floor(random() * out.length);
    if (out[i]![1] < 90) {
      out.splice(i, 1);
      dropped++;
    }
  }
  const used = new Set(peaks.map(([mz]) => mz));
  for (let added = 0; added < 2; ) {
    const mz = 30 + Math.floor(random() * 270);
    if (!used.has(mz)) {
      used.add(mz);
      out.push([mz, 1 + 4 * random()]);
      added++;
    }
  }
  return out.sort((a, b) => a[0] - b[0]);
}

/** Creates, submits and publishes one entry through the API (author ≠ curator), returning its accession. */
export async function publishEntry(
  author: TestAgent,
  curator: TestAgent,
  content: { name: string; formula: string; peaks: Peak[]; retentionIndex?: { value: number; column: 'non-polar' | 'semi-polar' | 'polar' } | null },
): Promise<string> {
  const body = chlorobenzeneContent({
    name: content.name,
    formula: content.formula,
    peaks: content.peaks.map(([mz, y]) => [mz, y]),
    structure: null,
    structureFormat: null,
    synonyms: [],
    retentionIndex: content.retentionIndex ?? null,
    sampleNotes: 'simulated — test only',
  });
  const created = await author.post('/api/v1/entries').set(W).send(body);
  if (created.status !== 201) throw new Error(`create answered ${created.status}: ${JSON.stringify(created.body)}`);
  const r1 = created.body.revision;
  const sent = await author.post(`/api/v1/revisions/${r1.id}/submit`).set(W).send({ lockVersion: r1.lockVersion }).expect(200);
  await curator
    .post(`/api/v1/revisions/${r1.id}/decision`)
    .set(W)
    .send({ decision: 'publish', comment: '', lockVersion: sent.body.revision.lockVersion })
    .expect(200);
  return r1.accession as string;
}

export async function withdrawAll(curator: TestAgent, accessions: string[]): Promise<void> {
  for (const accession of accessions) {
    await curator.post(`/api/v1/entries/${accession}/withdraw`).set(W).send({ reason: 'test library cleaned up' });
  }
}
