import { ZodError } from 'zod';
import { ChemError } from '@ionfolio/chem';
import { RevisionContentSchema, type RevisionContent } from '@ionfolio/contracts';
import { AppError } from '../../shared/app-error';
import { toContentColumns, type RevisionContentColumns } from '../entries/revision-content';
import type { UploadedBlock } from '../uploads/spectrum-file';

/** One line of an import job's results, as the bulk import page reads it. */
export interface ImportResult {
  block: number;
  title: string;
  status: 'imported' | 'rejected';
  accession?: string;
  reason?: string;
}

/**
 * A block after the work that needs no database: its content as a contributor would have written
 * it, and the stored columns (Hill formula, masses, normalised peaks, consistency checks), or the
 * reason it cannot become an entry.
 */
export type PreparedBlock =
  | { block: UploadedBlock; ok: true; content: RevisionContent; columns: RevisionContentColumns }
  | { block: UploadedBlock; ok: false; reason: string };

/** What a block of a JCAMP-DX file says, as the content of a new entry's r1. */
export function blockContent(b: UploadedBlock): RevisionContent {
  return RevisionContentSchema.parse({
    name: b.title.trim() || `Block ${b.index}`,
    formula: b.formula ?? '',
    peaks: b.peaks,
    conditions: {
      ionizationEnergyEv: b.ionizationEnergyEv ?? 70,
      ...(b.spectrometerType ? { instrumentType: b.spectrometerType.slice(0, 120) } : {}),
      ...(b.inlet ? { inlet: b.inlet.slice(0, 120) } : {}),
    },
    retentionIndex: b.retentionIndex !== undefined ? { value: b.retentionIndex, column: 'non-polar' } : null,
    casRn: b.casRn ?? null,
    changeNote: 'Bulk import',
  });
}

/** The one-line reason a block was rejected; anything we did not foresee stays generic. */
export function reasonOf(err: unknown): string {
  if (err instanceof ZodError)
    return err.issues.map((i) => `${i.path.join('.') || 'block'}: ${i.message}`).join('; ');
  if (err instanceof AppError || err instanceof ChemError) return err.message;
  return 'could not be stored';
}

/**
 * Validates a block and computes its columns exactly as createEntry does (RevisionContentSchema,
 * then toContentColumns with the consistency checks), without touching the database.
 */
export function prepareBlock(block: UploadedBlock): PreparedBlock {
  try {
    const content = blockContent(block);
    // createEntry parses its input once more; the schema is idempotent on its own output.
    return { block, ok: true, content, columns: toContentColumns(content) };
  } catch (err) {
    return { block, ok: false, reason: reasonOf(err) };
  }
}
