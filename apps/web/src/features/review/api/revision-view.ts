import { z } from 'zod';
import { checkResultSchema } from '../../../components/spectrum/check-result-schema';

const peakSchema = z.tuple([z.number(), z.number()]);

export const userRefSchema = z.object({ id: z.string(), login: z.string(), displayName: z.string() });

export const checkStatusSchema = z.enum(['pass', 'warn', 'fail']);

export type CheckStatus = z.infer<typeof checkStatusSchema>;

export const revisionStateSchema = z.enum(['draft', 'in_review', 'needs_changes', 'published', 'superseded', 'withdrawn']);

export type RevisionState = z.infer<typeof revisionStateSchema>;

/** `RevisionView` of docs/api-curation.md: the fields the review desk shows or compares. */
export const revisionViewSchema = z.object({
  id: z.string(),
  accession: z.string(),
  number: z.number().int(),
  label: z.string(),
  state: revisionStateSchema,
  lockVersion: z.number().int(),
  name: z.string(),
  synonyms: z.array(z.string()).default([]),
  formula: z.string(),
  nominalMass: z.number().nullable().optional(),
  structure: z.string().nullable(),
  structureFormat: z.enum(['smiles', 'molfile']).nullable(),
  casRn: z.string().nullable(),
  peaks: z.array(peakSchema),
  conditions: z
    .object({
      ionizationEnergyEv: z.number().optional(),
      instrumentType: z.string().optional(),
      inlet: z.string().optional(),
      sourceTemperatureC: z.number().optional(),
      column: z.string().optional(),
      scanRange: z.object({ fromMz: z.number(), toMz: z.number() }).optional(),
    })
    .default({}),
  retentionIndex: z.object({ value: z.number(), column: z.string() }).nullable(),
  sampleNotes: z.string().default(''),
  changeNote: z.string().default(''),
  simulated: z.boolean().default(false),
  checks: z.array(checkResultSchema).default([]),
  checksWorst: checkStatusSchema.nullable().optional(),
  author: userRefSchema.nullable(),
  reviewer: userRefSchema.nullable().optional(),
  createdAt: z.string(),
  submittedAt: z.string().nullable().optional(),
  publishedAt: z.string().nullable().optional(),
});

export type RevisionView = z.infer<typeof revisionViewSchema>;

export const revisionSummarySchema = z.object({
  id: z.string(),
  number: z.number().int(),
  label: z.string(),
  state: revisionStateSchema,
});

/** `EntryView`: the entry with the revision asked for (by default the current one) and its history. */
export const entryViewSchema = z.object({
  accession: z.string(),
  withdrawnAt: z.string().nullable().optional(),
  withdrawnReason: z.string().nullable().optional(),
  revision: revisionViewSchema,
  revisions: z.array(revisionSummarySchema).default([]),
});

export type EntryView = z.infer<typeof entryViewSchema>;
