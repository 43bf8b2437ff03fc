// Benchmark of the exact search index on a simulated library (invented spectra, seeded).
// Usage: npm run bench -w packages/chem -- [--entries 300000] [--queries 200] [--naive-queries 5]
//        [--reference-queries 200] [--seed 1]
import { argv, cpuMs, heapUsedBytes, now, numberArg, print, quantile, runtimeVersion } from './bench-host';
import { seededRandom } from '../src/isotopes/seeded-random';
import type { SpectrumHit } from '../src/search-index/search-options';
import { SpectrumIndex } from '../src/search-index/spectrum-index';
import { simulatedLibrary, simulatedReplicate, simulatedSpectra } from '../src/search-index/synthetic-library';
import { compareSpectra } from '../src/similarity/compare-spectra';
import { scoreSpectrumViews } from '../src/similarity/score-spectrum-views';
import type { SimilarityMethod } from '../src/similarity/similarity-method';
import { prepareSpectrum, type SpectrumView } from '../src/similarity/spectrum-view';
import type { Peak, PeakList } from '../src/types';

const args = argv();
const entries = numberArg(args, 'entries', 300_000);
const queryCount = numberArg(args, 'queries', 200);
const naiveQueries = numberArg(args, 'naive-queries', 5);
const referenceQueries = numberArg(args, 'reference-queries', queryCount);
const seed = numberArg(args, 'seed', 1);
const k = 10;

interface Hit {
  id: number;
  score: number;
}

function topK(scored: Hit[]): Hit[] {
  return scored.filter((h) => h.score > 0).sort((a, b) => b.score - a.score || a.id - b.id).slice(0, k);
}

function sameRanking(a: Hit[], b: Hit[]): boolean {
  return a.length === b.length && a.every((hit, i) => hit.id === b[i]?.id && hit.score === b[i]?.score);
}

function timeSearches(index: SpectrumIndex, queries: PeakList[], method: SimilarityMethod, reverse = false) {
  const times: number[] = [];
  const cpuTimes: number[] = [];
  const results: SpectrumHit[][] = [];
  for (const query of queries) {
    const cpuStart = cpuMs();
    const start = now();
    results.push(index.search(query, { method, reverse, k }));
    times.push(now() - start);
    cpuTimes.push(cpuMs() - cpuStart);
  }
  return { results, median: quantile(times, 0.5), p95: quantile(times, 0.95), cpuMedian: quantile(cpuTimes, 0.5) };
}

const fmt = (ms: number) => ms.toFixed(2);

print(`# packages/chem search kernel benchmark`);
print(`runtime ${runtimeVersion()}; entries ${entries}; queries ${queryCount}; seed ${seed}; k ${k}`);

// Build: spectra stream from the generator into the index, as a server loading its library from the
// database in batches would see them; only the time inside add() and pack() counts.
let start: number;
const heapBefore = heapUsedBytes();
const index = new SpectrumIndex({ reserve: { spectra: entries, peaks: entries * 50 } });
let addMs = 0;
let id = 0;
for (const peaks of simulatedSpectra(entries, seed)) {
  start = now();
  index.add(id++, peaks);
  addMs += now() - start;
}
start = now();
index.pack();
const packMs = now() - start;
const memory = index.memory();
const heapAfter = heapUsedBytes();
print(`build: ${fmt(addMs + packMs)} ms (add ${entries} spectra ${fmt(addMs)} ms + pack ${fmt(packMs)} ms)`);
print(
  `index memory: ${(memory.indexBytes / 2 ** 20).toFixed(1)} MiB in typed arrays = ${(memory.indexBytes / memory.peakCount).toFixed(2)} bytes/peak` +
    ` (${memory.peakCount} stored peaks); JS heap grew ${((heapAfter - heapBefore) / memory.peakCount).toFixed(2)} bytes/peak` +
    ` (mostly the id map)`,
);

start = now();
const library = simulatedLibrary(entries, seed);
const peakTotal = library.reduce((sum, peaks) => sum + peaks.length, 0);
print(`simulated library: ${entries} spectra, ${peakTotal} peaks (${(peakTotal / entries).toFixed(1)} per spectrum), made again for the reference in ${fmt(now() - start)} ms`);

const random = seededRandom(seed + 1000);
const sources: number[] = [];
const queries: Peak[][] = [];
for (let i = 0; i < queryCount; i++) {
  const source = Math.floor(random() * entries);
  sources.push(source);
  queries.push(simulatedReplicate(library[source] as Peak[], random));
}

const composite = timeSearches(index, queries, 'composite');
print(`composite top-${k}: median ${fmt(composite.median)} ms, p95 ${fmt(composite.p95)} ms, median CPU ${fmt(composite.cpuMedian)} ms over ${queryCount} queries`);
print(`scratch after searching: ${(index.memory().scratchBytes / 2 ** 20).toFixed(1)} MiB`);
const top1 = composite.results.filter((hits, i) => hits[0]?.id === sources[i]).length;
print(`replicate's source ranked first: ${top1}/${queryCount}`);

for (const [method, reverse] of [['cosine', false], ['weighted', false], ['entropy', false], ['entropy-unweighted', false], ['composite', true]] as const) {
  const timing = timeSearches(index, queries, method, reverse);
  print(`${method}${reverse ? ' reverse' : ''} top-${k}: median ${fmt(timing.median)} ms, p95 ${fmt(timing.p95)} ms, median CPU ${fmt(timing.cpuMedian)} ms`);
}

// Reference: every library spectrum scored one by one by the compareSpectra kernel (library prepared once).
start = now();
const prepared: SpectrumView[] = library.map((peaks) => prepareSpectrum(peaks));
print(`reference: library prepared in ${fmt(now() - start)} ms`);
let identical = 0;
const referenceTimes: number[] = [];
for (let i = 0; i < Math.min(referenceQueries, queryCount); i++) {
  const queryView = prepareSpectrum(queries[i] as Peak[], 'query');
  start = now();
  const scored = prepared.map((view, id) => ({ id, score: scoreSpectrumViews(queryView, view, 'composite', false) }));
  const reference = topK(scored);
  referenceTimes.push(now() - start);
  if (sameRanking(reference, composite.results[i] as Hit[])) identical++;
}
print(
  `composite rankings identical to the one-by-one reference: ${identical}/${Math.min(referenceQueries, queryCount)}` +
    ` (reference median ${fmt(quantile(referenceTimes, 0.5))} ms per query)`,
);

// Naive: an array of objects, each scored with compareSpectra (normalising both spectra every time).
const objects = library.map((peaks, id) => ({ id, peaks }));
const naiveTimes: number[] = [];
let naiveIdentical = 0;
for (let i = 0; i < Math.min(naiveQueries, queryCount); i++) {
  const query = queries[i] as Peak[];
  start = now();
  const ranking = topK(objects.map((entry) => ({ id: entry.id, score: compareSpectra(query, entry.peaks).score })));
  naiveTimes.push(now() - start);
  if (sameRanking(ranking, composite.results[i] as Hit[])) naiveIdentical++;
}
const naiveMedian = quantile(naiveTimes, 0.5);
print(
  `naive (array of objects, compareSpectra one by one): median ${fmt(naiveMedian)} ms per query over ${naiveTimes.length} queries,` +
    ` same ranking ${naiveIdentical}/${naiveTimes.length}; index is ${(naiveMedian / composite.median).toFixed(0)}× faster`,
);
