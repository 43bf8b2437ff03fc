// Identification quality on replicate queries: where each query's known source lands in the ranking.
import type { PeakList, SimilarityMethod, SpectrumIndex } from '@ionfolio/chem';

export interface QualityRow {
  method: SimilarityMethod;
  reverse: boolean;
  top1: number;
  top5: number;
  /** Mean rank of the source, a source outside the first `depth` counted as depth + 1. */
  meanRank: number;
  misses: number;
  medianMs: number;
}

export const QUALITY_METHODS: readonly SimilarityMethod[] = ['cosine', 'weighted', 'composite', 'entropy'];

/** Ranks every query against the index with each method, forward and reverse. */
export function replicateQuality(
  index: SpectrumIndex,
  queries: readonly { sourceId: number; peaks: PeakList }[],
  depth = 100,
): QualityRow[] {
  const rows: QualityRow[] = [];
  for (const method of QUALITY_METHODS) {
    for (const reverse of [false, true]) {
      let top1 = 0;
      let top5 = 0;
      let rankSum = 0;
      let misses = 0;
      const times: number[] = [];
      for (const q of queries) {
        const t = performance.now();
        const hits = index.search(q.peaks, { method, reverse, k: depth });
        times.push(performance.now() - t);
        const at = hits.findIndex((h) => h.id === q.sourceId);
        const rank = at < 0 ? depth + 1 : at + 1;
        if (at < 0) misses++;
        if (rank === 1) top1++;
        if (rank <= 5) top5++;
        rankSum += rank;
      }
      times.sort((a, b) => a - b);
      rows.push({
        method,
        reverse,
        top1,
        top5,
        meanRank: rankSum / queries.length,
        misses,
        medianMs: times[Math.floor(times.length / 2)] ?? 0,
      });
    }
  }
  return rows;
}

/** The table as Markdown, shares of `total` queries in percent. */
export function qualityTable(rows: readonly QualityRow[], total: number): string {
  const pct = (n: number) => `${((100 * n) / total).toFixed(1)} %`;
  return [
    '| method | direction | top-1 | top-5 | mean rank | not in top 100 | median ms/query (in-process) |',
    '|---|---|---|---|---|---|---|',
    ...rows.map(
      (r) =>
        `| ${r.method} | ${r.reverse ? 'reverse' : 'forward'} | ${pct(r.top1)} | ${pct(r.top5)} | ${r.meanRank.toFixed(2)} | ${r.misses} | ${r.medianMs.toFixed(1)} |`,
    ),
  ].join('\n');
}
