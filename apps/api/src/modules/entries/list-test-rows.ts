import { randomBytes } from 'node:crypto';
import type { RevisionContent } from '@ionfolio/contracts';
import { chlorobenzeneContent } from '../../testing/fixtures';

/** A tag no other test run uses; put it in names and filter on it, since the test database is shared. */
export const uniqueTag = () => `t${randomBytes(4).toString('hex')}`;

/**
 * Test content for one compound of the library tests. The spectrum is made up: the molecular ion
 * at the nominal mass (integer masses C 12, H 1, O 16, Cl 35, Br 79 — common practice) as the
 * base peak, and one fragment.
 */
export function libraryContent(
  name: string,
  formula: string,
  nominalMassDa: number,
  smiles: string | null,
  overrides: Partial<RevisionContent> = {},
): RevisionContent {
  return chlorobenzeneContent({
    name,
    synonyms: [],
    formula,
    structure: smiles,
    structureFormat: smiles === null ? null : 'smiles',
    peaks: [
      [Math.round(nominalMassDa / 2), 35],
      [nominalMassDa, 100],
    ],
    retentionIndex: null,
    ...overrides,
  });
}
