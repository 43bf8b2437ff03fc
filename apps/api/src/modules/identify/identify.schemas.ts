import { z } from 'zod';
import { COLUMN_CLASSES, PeakSchema } from '@ionfolio/contracts';
import { FILTER_ELEMENTS } from './element-mask';

/** The similarity methods a tool may ask for (PRODUCT.md "REST contract"). */
export const IDENTIFY_METHODS = ['composite', 'cosine', 'weighted', 'entropy'] as const;
export type IdentifyMethod = (typeof IDENTIFY_METHODS)[number];

/** Centroided EI spectra hold tens to a few hundred peaks; 5000 leaves room for profile-like exports. */
export const MAX_QUERY_PEAKS = 5000;

export const QueryPeaksSchema = z
  .array(PeakSchema)
  .min(1, 'the spectrum holds no peaks')
  .max(MAX_QUERY_PEAKS, `at most ${MAX_QUERY_PEAKS} peaks per spectrum`)
  .refine((p) => p.some(([, i]) => i > 0), 'at least one peak must have a positive intensity');

const EditionLabel = z
  .string()
  .regex(/^[0-9A-Za-z][0-9A-Za-z._-]{0,31}$/, 'an edition label looks like 2026.12')
  .describe('Label of a frozen edition; omit to search the current published library');

/** Options shared by single and batch identify. */
export const searchOptionFields = {
  method: z.enum(IDENTIFY_METHODS).default('composite'),
  reverse: z.boolean().default(false).describe('Rank by reverse similarity: only query peaks present in the candidate count'),
  edition: EditionLabel.optional(),
  minMass: z.number().int().min(0).max(5000).optional().describe('Keep candidates with nominal mass ≥ minMass (Da)'),
  maxMass: z.number().int().min(0).max(5000).optional().describe('Keep candidates with nominal mass ≤ maxMass (Da)'),
  elements: z
    .strictObject({
      required: z.array(z.enum(FILTER_ELEMENTS)).max(FILTER_ELEMENTS.length).default([]),
      forbidden: z.array(z.enum(FILTER_ELEMENTS)).max(FILTER_ELEMENTS.length).default([]),
    })
    .optional()
    .describe('Keep candidates whose formula has every required and no forbidden element'),
};

const massOrder = (o: { minMass?: number | undefined; maxMass?: number | undefined }) =>
  o.minMass === undefined || o.maxMass === undefined || o.minMass <= o.maxMass;

export const RetentionIndexWindowSchema = z.strictObject({
  value: z.number().min(0).max(10000),
  column: z.enum(COLUMN_CLASSES),
  tolerance: z.number().min(0).max(1000).describe('Half-width of the window, in index units'),
});

export const IdentifyBody = z
  .strictObject({
    peaks: QueryPeaksSchema.describe('The unknown spectrum: [[mz, intensity], ...] on any intensity scale'),
    ...searchOptionFields,
    limit: z.number().int().min(1).max(100).default(10),
    retentionIndex: RetentionIndexWindowSchema.optional().describe(
      'Keep candidates whose retention index on this column class lies within value ± tolerance',
    ),
  })
  .refine(massOrder, { message: 'minMass must not exceed maxMass', path: ['maxMass'] });
export type IdentifyRequest = z.infer<typeof IdentifyBody>;
export type SearchOptions = Omit<IdentifyRequest, 'peaks' | 'limit' | 'retentionIndex'>;

export const MatchedPeakSchema = z.object({ mz: z.number(), queryRelIntensity: z.number(), libraryRelIntensity: z.number() });

export const CandidateSchema = z.object({
  accession: z.string(),
  revision: z.number().int(),
  name: z.string(),
  formula: z.string(),
  nominalMass: z.number().int(),
  similarity: z.number().min(0).max(100).describe('0–100, one decimal, by the method named in the answer'),
  reverseSimilarity: z.number().min(0).max(100).optional().describe('Present in reverse mode'),
  matchedPeaks: z.array(MatchedPeakSchema),
});
export type Candidate = z.infer<typeof CandidateSchema>;

/** The molecular-ion check as packages/chem reads it; documented loosely, the fields named. */
export const ReadingSchema = z
  .looseObject({
    molecularIonMz: z.number().nullable(),
    likelyAbsent: z.boolean(),
    cluster: z.array(z.object({ mz: z.number(), relIntensity: z.number() })),
    chlorine: z.number(),
    bromine: z.number(),
    sulfurLikely: z.boolean(),
    siliconLikely: z.boolean(),
    carbonRange: z.looseObject({}).nullable(),
    nitrogenParity: z.enum(['even', 'odd']).nullable(),
    evidence: z.array(z.object({ label: z.string(), value: z.string() })),
    suggestions: z.array(z.looseObject({ formula: z.string(), nominalMass: z.number(), rdbe: z.number() })),
    notes: z.array(z.string()),
  })
  .nullable()
  .describe('The molecular-ion check of the query; null when no cluster could be read');

export const IdentifyResponseSchema = z.object({
  candidates: z.array(CandidateSchema),
  reading: ReadingSchema,
  method: z.enum(IDENTIFY_METHODS),
  edition: z.string().describe("The edition searched, or 'current'"),
  tookMs: z.number(),
  caution: z.string(),
});
