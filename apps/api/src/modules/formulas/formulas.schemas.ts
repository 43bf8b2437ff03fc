import { z } from 'zod';
import { QueryPeaksSchema } from '../identify/identify.schemas';

export const FormulaParams = z.object({ formula: z.string().trim().min(1, 'a formula is required').max(100) });

export const ReadingBody = z.strictObject({ peaks: QueryPeaksSchema });

export const FormulaAnswerSchema = z.object({
  formula: z.string().describe('Hill order'),
  nominalMass: z.number().int().describe('Da, lightest isotopes'),
  monoisotopicMass: z.number().describe('Da'),
  cluster: z.array(z.object({ mz: z.number().int(), relativeIntensity: z.number() })).describe('Nominal-mass isotope cluster, most intense = 100'),
  rdbe: z.number().describe('Rings plus double bonds'),
});
export type FormulaAnswer = z.infer<typeof FormulaAnswerSchema>;
