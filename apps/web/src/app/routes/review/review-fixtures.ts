/** Invented (simulated) revisions and queue rows for the review desk tests. */
export function makeRevision(overrides: Record<string, unknown> = {}) {
  return {
    id: '5b0c1b52-6f1e-4c3a-9d7e-0a1b2c3d4e01',
    accession: 'IF-000042',
    number: 2,
    label: 'IF-000042 r2',
    state: 'in_review',
    lockVersion: 3,
    name: 'Methyl 4-chlorobenzoate',
    synonyms: [],
    formula: 'C8H7ClO2',
    nominalMass: 170,
    monoisotopicMass: 170.0135,
    structure: 'COC(=O)c1ccc(Cl)cc1',
    structureFormat: 'smiles',
    casRn: null,
    peaks: [
      [75, 12],
      [111, 38],
      [139, 100],
      [170, 33],
    ],
    peakCount: 4,
    basePeakMz: 139,
    conditions: { ionizationEnergyEv: 70, inlet: 'GC' },
    retentionIndex: { value: 1290, column: 'non-polar' },
    sampleNotes: 'Lot QX-17, 99.2 % by GC-FID',
    changeNote: 'Re-run on the new source',
    simulated: true,
    checks: [
      {
        id: 'molecular-ion-mass',
        title: 'Formula mass vs cluster',
        status: 'warn',
        reason: 'M+2 lower than one chlorine predicts',
        numbers: { observedPct: 22, expectedPct: 32 },
      },
    ],
    checksWorst: 'warn',
    contentSha256: 'ab'.repeat(32),
    restoredFrom: null,
    author: { id: 'u-contrib', login: 'plindqvist', displayName: 'Pia Lindqvist' },
    reviewer: null,
    createdAt: '2026-03-02T09:00:00.000Z',
    updatedAt: '2026-03-02T10:00:00.000Z',
    submittedAt: '2026-03-02T10:00:00.000Z',
    decidedAt: null,
    publishedAt: null,
    ...overrides,
  };
}

export const publishedRevision = makeRevision({
  id: '5b0c1b52-6f1e-4c3a-9d7e-0a1b2c3d4e00',
  number: 1,
  label: 'IF-000042 r1',
  state: 'published',
  formula: 'C8H7BrO2',
  peaks: [
    [111, 38],
    [139, 100],
    [170, 31],
    [172, 10],
  ],
  checks: [],
  checksWorst: 'pass',
  publishedAt: '2026-01-20T12:00:00.000Z',
});

export function makeEntry(revision: Record<string, unknown>, revisions: Array<Record<string, unknown>>) {
  return {
    entry: {
      accession: 'IF-000042',
      createdAt: '2026-01-10T12:00:00.000Z',
      withdrawnAt: null,
      withdrawnReason: null,
      revision,
      revisions: revisions.map(({ id, number, label, state }) => ({ id, number, label, state })),
    },
  };
}

export function makeQueueItem(overrides: Record<string, unknown> = {}) {
  return {
    revisionId: '5b0c1b52-6f1e-4c3a-9d7e-0a1b2c3d4e01',
    accession: 'IF-000042',
    number: 2,
    label: 'IF-000042 r2',
    state: 'in_review',
    name: 'Methyl 4-chlorobenzoate',
    formula: 'C8H7ClO2',
    checksWorst: 'warn',
    author: 'Pia Lindqvist',
    submittedAt: '2026-03-02T10:00:00.000Z',
    updatedAt: '2026-03-02T10:00:00.000Z',
    hasPublished: true,
    simulated: true,
    ...overrides,
  };
}
