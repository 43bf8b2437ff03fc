import type { Candidate, IdentifyResponse, Reading } from '../api/identify-schemas';
import { formulaDisagreements } from './formula-disagreement';

/** One CSV field: quoted when it holds a separator, a quote or a line break (RFC 4180). */
export function csvField(value: string | number | null | undefined): string {
  if (value === null || value === undefined) return '';
  const text = String(value);
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

export function csvLine(values: readonly (string | number | null | undefined)[]): string {
  return values.map(csvField).join(',');
}

const header = [
  'rank',
  'accession',
  'revision',
  'name',
  'formula',
  'nominal_mass',
  'similarity_0_100',
  'reverse_similarity_0_100',
  'matched_peaks',
  'formula_disagrees',
  'method',
  'edition',
  'searched_at',
];

/**
 * The candidates as CSV, one row each, every row citing accession, revision, method, edition and the
 * time of the search, so a pasted row still says exactly what it matched.
 */
export function candidatesCsv(result: Pick<IdentifyResponse, 'method' | 'edition'>, candidates: readonly Candidate[], reading: Reading | null, searchedAt: Date): string {
  const rows = candidates.map((candidate, index) =>
    csvLine([
      index + 1,
      candidate.accession,
      candidate.revision,
      candidate.name,
      candidate.formula,
      candidate.nominalMass,
      candidate.similarity.toFixed(1),
      candidate.reverseSimilarity === undefined ? '' : candidate.reverseSimilarity.toFixed(1),
      candidate.matchedPeaks.length,
      formulaDisagreements(candidate, reading).join('; '),
      result.method,
      result.edition,
      searchedAt.toISOString(),
    ]),
  );
  return [csvLine(header), ...rows].join('\r\n') + '\r\n';
}

/** Hands a text to the browser as a file download. */
export function downloadText(text: string, fileName: string, type = 'text/csv;charset=utf-8'): void {
  const url = URL.createObjectURL(new Blob([text], { type }));
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  document.body.append(link);
  link.click();
  link.remove();
  URL.revokeObjectURL(url);
}
