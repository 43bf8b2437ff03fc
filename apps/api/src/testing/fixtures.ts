import type { RevisionContent } from '@ionfolio/contracts';

/**
 * Chlorobenzene-like test content. The peaks are made up for tests: a molecular ion at m/z 112
 * with its 37Cl partner at 114 (about 32 % of M — SCIENCE.md §1, from the NIST isotope table) and
 * a phenyl fragment at 77.
 */
export function chlorobenzeneContent(overrides: Partial<RevisionContent> = {}): RevisionContent {
  return {
    name: 'Chlorobenzene (test)',
    synonyms: ['phenyl chloride'],
    formula: 'C6H5Cl',
    structure: 'Clc1ccccc1',
    structureFormat: 'smiles',
    casRn: null,
    peaks: [
      [50, 12],
      [51, 14],
      [77, 62],
      [112, 100],
      [113, 6.6],
      [114, 32.5],
      [115, 2.1],
    ],
    conditions: { ionizationEnergyEv: 70, instrumentType: 'single quadrupole GC–MS', inlet: 'GC' },
    retentionIndex: { value: 846, column: 'non-polar' },
    sampleNotes: 'Test standard, invented lot T-0001',
    changeNote: 'First recording',
    ...overrides,
  };
}
