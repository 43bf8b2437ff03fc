import { z } from 'zod';

/** The similarity methods of `POST /api/v1/identify`; composite is the API's default. */
export const identifyMethods = ['composite', 'cosine', 'weighted', 'entropy'] as const;
export type IdentifyMethod = (typeof identifyMethods)[number];

/** Column classes a retention index is stated for (packages/contracts COLUMN_CLASSES). */
export const columnClasses = ['non-polar', 'semi-polar', 'polar'] as const;
export type ColumnClass = (typeof columnClasses)[number];

export const matchedPeakSchema = z.object({
  mz: z.number(),
  queryRelIntensity: z.number(),
  libraryRelIntensity: z.number(),
});

export const candidateSchema = z.object({
  accession: z.string(),
  revision: z.number().int(),
  name: z.string(),
  formula: z.string(),
  nominalMass: z.number(),
  similarity: z.number(),
  reverseSimilarity: z.number().optional(),
  matchedPeaks: z.array(matchedPeakSchema),
});

export type Candidate = z.infer<typeof candidateSchema>;

const suggestionSchema = z.looseObject({
  formula: z.string(),
  nominalMass: z.number(),
  monoisotopicMass: z.number().optional(),
  rdbe: z.number(),
  agreement: z.number().nullable().optional(),
  rulesPassed: z.array(z.string()).optional(),
});

/** The molecular-ion check of the query (packages/chem MolecularIonReading, as JSON). */
export const readingSchema = z.looseObject({
  molecularIonMz: z.number().nullable(),
  clusterStartMz: z.number().optional(),
  likelyAbsent: z.boolean(),
  cluster: z.array(z.object({ mz: z.number(), relIntensity: z.number() })),
  chlorine: z.number(),
  bromine: z.number(),
  sulfurLikely: z.boolean(),
  siliconLikely: z.boolean(),
  carbonRange: z.object({ min: z.number(), max: z.number(), estimate: z.number() }).nullable(),
  nitrogenParity: z.enum(['even', 'odd']).nullable(),
  evidence: z.array(z.object({ label: z.string(), value: z.string() })),
  suggestions: z.array(suggestionSchema),
  notes: z.array(z.string()).default([]),
});

export type Reading = z.infer<typeof readingSchema>;

export const identifyResponseSchema = z.object({
  candidates: z.array(candidateSchema),
  reading: readingSchema.nullable(),
  method: z.enum(identifyMethods),
  edition: z.string(),
  tookMs: z.number(),
  caution: z.string().optional(),
});

export type IdentifyResponse = z.infer<typeof identifyResponseSchema>;
