import { z } from 'zod';
import { REVISION_STATES } from '@ionfolio/contracts';
import { checkResultSchema } from '../../../components/spectrum/check-result-schema';

const userRefSchema = z.object({ id: z.string(), login: z.string(), displayName: z.string() });
const stateSchema = z.enum(REVISION_STATES);
const worstSchema = z.enum(['pass', 'warn', 'fail']).nullish();

/** `RevisionView` of docs/api-curation.md, as the entry page shows it. */
export const entryRevisionSchema = z.object({
  id: z.string(),
  accession: z.string(),
  number: z.number().int(),
  label: z.string(),
  state: stateSchema,
  name: z.string(),
  synonyms: z.array(z.string()),
  formula: z.string(),
  nominalMass: z.number(),
  monoisotopicMass: z.number(),
  structure: z.string().nullable(),
  structureFormat: z.enum(['smiles', 'molfile']).nullable(),
  casRn: z.string().nullable(),
  peaks: z.array(z.tuple([z.number(), z.number()])),
  basePeakMz: z.number(),
  conditions: z.object({
    ionizationEnergyEv: z.number().nullish(),
    instrumentType: z.string().nullish(),
    inlet: z.string().nullish(),
    sourceTemperatureC: z.number().nullish(),
    column: z.string().nullish(),
    scanRange: z.object({ fromMz: z.number(), toMz: z.number() }).nullish(),
  }),
  retentionIndex: z.object({ value: z.number(), column: z.string() }).nullable(),
  sampleNotes: z.string(),
  changeNote: z.string(),
  simulated: z.boolean(),
  checks: z.array(checkResultSchema),
  checksWorst: worstSchema,
  restoredFrom: z.number().int().nullish(),
  author: userRefSchema.nullable(),
  reviewer: userRefSchema.nullish(),
  createdAt: z.string(),
  submittedAt: z.string().nullish(),
  publishedAt: z.string().nullish(),
});

export type EntryRevision = z.infer<typeof entryRevisionSchema>;

/** `RevisionSummary`: one line of the revision timeline. */
export const timelineItemSchema = z.object({
  id: z.string(),
  number: z.number().int(),
  label: z.string(),
  state: stateSchema,
  changeNote: z.string(),
  author: userRefSchema.nullable(),
  createdAt: z.string(),
  submittedAt: z.string().nullish(),
  publishedAt: z.string().nullish(),
  checksWorst: worstSchema,
});

export type TimelineItem = z.infer<typeof timelineItemSchema>;

/** A frozen edition that holds one of the entry's revisions (newest first, as the API sends them). */
export const entryEditionSchema = z.object({ label: z.string(), revision: z.number().int(), createdAt: z.string() });

export type EntryEdition = z.infer<typeof entryEditionSchema>;

export const entryViewSchema = z.object({
  accession: z.string(),
  createdAt: z.string(),
  withdrawnAt: z.string().nullish(),
  withdrawnReason: z.string().nullish(),
  revision: entryRevisionSchema,
  revisions: z.array(timelineItemSchema),
  // Optional so that the page still opens against an API from before editions were listed here.
  editions: z.array(entryEditionSchema).optional(),
});

export type EntryView = z.infer<typeof entryViewSchema>;
