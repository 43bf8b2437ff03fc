// Invented fixtures of the entry page tests (simulated data, no real measurement).
import { meReply } from '../../../testing/factories';
import { json, type RecordedRequest } from '../../../testing/fake-fetch';

export const author = { id: 'u-contrib', login: 'treyes', displayName: 'Tomas Reyes' };
export const curator = { id: 'u-cur', login: 'dokafor', displayName: 'Dana Okafor' };

// An invented, simulated entry: 1-chloro-4-methoxybenzene, C7H7ClO (nominal 142; M+2 about 32 % of M
// for one Cl, SCIENCE.md §1, computed). Peaks are made up for the page, not measured.
export function revision(number: number, state: string, overrides: Record<string, unknown> = {}) {
  return {
    id: `00000000-0000-4000-8000-00000000000${number}`,
    accession: 'IF-000012',
    number,
    label: `IF-000012 r${number}`,
    state,
    lockVersion: 2,
    name: '4-Chloroanisole',
    synonyms: ['1-chloro-4-methoxybenzene'],
    formula: 'C7H7ClO',
    nominalMass: 142,
    monoisotopicMass: 142.0185,
    structure: 'COc1ccc(Cl)cc1',
    structureFormat: 'smiles',
    casRn: null,
    peaks: [
      [99, 38],
      [127, 55],
      [142, 100],
      [143, 8],
      [144, 32],
    ],
    peakCount: 5,
    basePeakMz: 142,
    conditions: { ionizationEnergyEv: 70, inlet: 'GC', sourceTemperatureC: 230 },
    retentionIndex: { value: 1142, column: 'non-polar' },
    sampleNotes: 'Standard lot AR-7731 (invented), GC area 99.2 %.',
    changeNote: number === 1 ? 'First recording.' : `Re-run ${number}.`,
    simulated: true,
    checks: [
      { id: 'isotope-cluster', title: 'Isotope cluster', status: 'pass', reason: 'Cluster agrees with C7H7ClO.', numbers: { m2Observed: 32 } },
    ],
    checksWorst: 'pass',
    contentSha256: 'abc',
    restoredFrom: null,
    author,
    reviewer: curator,
    createdAt: `2026-0${number}-01T08:00:00.000Z`,
    updatedAt: `2026-0${number}-01T08:00:00.000Z`,
    submittedAt: `2026-0${number}-02T08:00:00.000Z`,
    decidedAt: `2026-0${number}-03T08:00:00.000Z`,
    publishedAt: `2026-0${number}-03T08:00:00.000Z`,
    ...overrides,
  };
}

export function summary(r: ReturnType<typeof revision>) {
  const { id, number, label, state, name, formula, changeNote, createdAt, submittedAt, publishedAt, checksWorst, contentSha256 } = r;
  return { id, number, label, state, name, formula, changeNote, author, reviewer: curator, createdAt, submittedAt, publishedAt, checksWorst, contentSha256 };
}

export const r1 = revision(1, 'superseded');
export const r2 = revision(2, 'superseded');
export const r3 = revision(3, 'published');

/** The entry endpoint over `revisions` (default r1–r3): `?revision=N` picks one, otherwise the last. */
export function entryReply(request: RecordedRequest, extra: Record<string, unknown> = {}, revisions: ReturnType<typeof revision>[] = [r1, r2, r3]) {
  const asked = request.url.searchParams.get('revision');
  const shown = revisions.find((r) => String(r.number) === asked) ?? revisions[revisions.length - 1];
  return json({
    entry: {
      accession: 'IF-000012',
      createdAt: r1.createdAt,
      withdrawnAt: null,
      withdrawnReason: null,
      revision: shown,
      revisions: revisions.map(summary),
      editions: [],
      ...extra,
    },
  });
}

export function routes(role: 'reader' | 'contributor' | 'curator', more = {}) {
  const person = role === 'curator' ? curator : role === 'contributor' ? author : { id: 'u-read', login: 'lnakamura', displayName: 'Lena Nakamura' };
  return {
    'GET /api/v1/me': meReply(role, person),
    'GET /api/v1/entries/IF-000012': (request: RecordedRequest) => entryReply(request),
    'GET /api/v1/revisions/00000000-0000-4000-8000-000000000003/comments': json({ comments: [] }),
    'GET /api/v1/revisions/00000000-0000-4000-8000-000000000001/comments': json({
      comments: [{ id: 'c1', parentId: null, author: curator, body: 'Published as recorded.', kind: 'decision', createdAt: '2026-01-03T08:00:00.000Z' }],
    }),
    'POST /api/v1/structures/preview': json({ svg: '<svg xmlns="http://www.w3.org/2000/svg"/>', formula: 'C7H7ClO', nominalMass: 142 }),
    ...more,
  };
}
