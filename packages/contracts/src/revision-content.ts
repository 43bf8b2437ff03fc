import { z } from 'zod';
import { ChemError, parseFormula } from '@ionfolio/chem';

/** CAS Registry Numbers carry a check digit: the sum of the other digits, each times its position from the right, mod 10 (common practice). */
export function casCheckDigitOk(casRn: string): boolean {
  const digits = casRn.replace(/-/g, '');
  const check = Number(digits.at(-1));
  const body = digits.slice(0, -1).split('').reverse();
  const sum = body.reduce((acc, d, i) => acc + Number(d) * (i + 1), 0);
  return sum % 10 === check;
}

export const COLUMN_CLASSES = ['non-polar', 'semi-polar', 'polar'] as const;

export const PeakSchema = z.tuple([
  z.number().finite().gt(0, 'm/z must be above 0').max(5000, 'm/z above 5000 is not an EI spectrum'),
  z.number().finite().min(0, 'intensity cannot be negative'),
]);

export const ConditionsSchema = z.strictObject({
  ionizationEnergyEv: z.number().min(5).max(200).default(70),
  instrumentType: z.string().trim().max(120).optional(),
  inlet: z.string().trim().max(120).optional(),
  sourceTemperatureC: z.number().min(0).max(500).optional(),
  column: z.string().trim().max(200).optional(),
  scanRange: z
    .strictObject({ fromMz: z.number().min(1).max(5000), toMz: z.number().min(1).max(5000) })
    .refine((r) => r.fromMz < r.toMz, { message: 'fromMz must be below toMz', path: ['toMz'] })
    .optional(),
});
export type Conditions = z.infer<typeof ConditionsSchema>;

export const RetentionIndexSchema = z.strictObject({
  value: z.number().min(0).max(10000),
  column: z.enum(COLUMN_CLASSES),
});

const formulaField = z
  .string()
  .trim()
  .min(1, 'a formula is required')
  .max(100)
  .superRefine((text, ctx) => {
    try {
      parseFormula(text);
    } catch (err) {
      if (err instanceof ChemError) {
        ctx.addIssue({ code: 'custom', message: err.message });
      } else throw err;
    }
  });

const revisionFields = {
  name: z.string().trim().min(1, 'a name is required').max(200),
  synonyms: z.array(z.string().trim().min(1).max(200)).max(50),
  formula: formulaField,
  structure: z.string().max(200_000).nullable(),
  structureFormat: z.enum(['smiles', 'molfile']).nullable(),
  casRn: z
    .string()
    .trim()
    .regex(/^\d{2,7}-\d{2}-\d$/, 'a CAS RN looks like 64-17-5')
    .refine(casCheckDigitOk, 'the CAS RN check digit does not match')
    .nullable(),
  peaks: z
    .array(PeakSchema)
    .min(1, 'a spectrum needs at least one peak')
    .max(5000, 'more than 5000 peaks is not a centroided EI spectrum')
    .refine((p) => p.some(([, i]) => i > 0), 'at least one peak must have a positive intensity'),
  conditions: ConditionsSchema,
  retentionIndex: RetentionIndexSchema.nullable(),
  sampleNotes: z.string().max(5000),
  changeNote: z.string().max(2000),
};

/** What a contributor writes for a revision: the body of `POST /api/v1/entries`. */
export const RevisionContentSchema = z
  .strictObject({
    ...revisionFields,
    synonyms: revisionFields.synonyms.default([]),
    structure: revisionFields.structure.default(null),
    structureFormat: revisionFields.structureFormat.default(null),
    casRn: revisionFields.casRn.default(null),
    conditions: ConditionsSchema.default({ ionizationEnergyEv: 70 }),
    retentionIndex: revisionFields.retentionIndex.default(null),
    sampleNotes: revisionFields.sampleNotes.default(''),
    changeNote: revisionFields.changeNote.default(''),
  })
  .refine((r) => (r.structure === null) === (r.structureFormat === null), {
    message: 'give structureFormat (smiles or molfile) together with structure',
    path: ['structureFormat'],
  });
export type RevisionContent = z.infer<typeof RevisionContentSchema>;

/** `PATCH /api/v1/revisions/:id`: any content fields, plus the lock version the editor saw. */
export const RevisionPatchSchema = z.strictObject({
  lockVersion: z.number().int().min(1),
  ...Object.fromEntries(Object.entries(revisionFields).map(([k, v]) => [k, v.optional()])),
}) as unknown as z.ZodType<{ lockVersion: number } & Partial<RevisionContent>>;
export type RevisionPatch = { lockVersion: number } & Partial<RevisionContent>;
