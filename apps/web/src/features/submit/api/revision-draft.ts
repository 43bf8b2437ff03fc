import { z } from 'zod';
import { REVISION_STATES } from '@ionfolio/contracts';

const optionalText = z.string().nullish().transform((v) => v ?? undefined);
const optionalNumber = z.number().nullish().transform((v) => v ?? undefined);

/** The part of `RevisionView` (docs/api-curation.md) that the submit form loads and edits. */
export const revisionDraftSchema = z.object({
  id: z.string(),
  accession: z.string(),
  number: z.number().int(),
  label: z.string(),
  state: z.enum(REVISION_STATES),
  lockVersion: z.number().int(),
  name: z.string(),
  synonyms: z.array(z.string()),
  formula: z.string(),
  structure: z.string().nullable(),
  structureFormat: z.enum(['smiles', 'molfile']).nullable(),
  casRn: z.string().nullable(),
  peaks: z.array(z.tuple([z.number(), z.number()])),
  conditions: z.object({
    ionizationEnergyEv: optionalNumber,
    instrumentType: optionalText,
    inlet: optionalText,
    sourceTemperatureC: optionalNumber,
    column: optionalText,
    scanRange: z.object({ fromMz: z.number(), toMz: z.number() }).nullish(),
  }),
  retentionIndex: z.object({ value: z.number(), column: z.string() }).nullable(),
  sampleNotes: z.string(),
  changeNote: z.string(),
});

export type RevisionDraft = z.infer<typeof revisionDraftSchema>;

export const revisionDraftResponseSchema = z.object({ revision: revisionDraftSchema });

/** Open for editing by its author: a draft, or a revision the curators returned. */
export function isEditable(state: RevisionDraft['state']): boolean {
  return state === 'draft' || state === 'needs_changes';
}
