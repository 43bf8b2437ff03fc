import type { PeakList } from '@ionfolio/chem';
import type { ColumnClass, IdentifyMethod } from '../api/identify-schemas';

/** The search options as the form holds them (text fields stay text until sent). */
export type SearchOptions = {
  method: IdentifyMethod;
  reverse: boolean;
  limit: string;
  /** '' searches the current published library. */
  edition: string;
  riValue: string;
  riColumn: ColumnClass;
  riTolerance: string;
  minMassDa: string;
  maxMassDa: string;
};

/**
 * Defaults: composite (the API's default), 10 candidates, and a ±20 index-unit window when a retention
 * index is given — SCIENCE.md §4: windows of about 15–22 units helped on non-polar columns.
 */
export const defaultSearchOptions: SearchOptions = {
  method: 'composite',
  reverse: false,
  limit: '10',
  edition: '',
  riValue: '',
  riColumn: 'non-polar',
  riTolerance: '20',
  minMassDa: '',
  maxMassDa: '',
};

/** The option part of an identify or batch body; only what differs from the API's defaults is omitted. */
export type SearchOptionsBody = {
  method: IdentifyMethod;
  reverse: boolean;
  limit: number;
  edition?: string;
  retentionIndex?: { value: number; column: ColumnClass; tolerance: number };
  minMass?: number;
  maxMass?: number;
};

export type IdentifyBody = SearchOptionsBody & { peaks: [number, number][] };

type Built<T> = { ok: true; value: T } | { ok: false; errors: string[] };

function wholeNumber(text: string, name: string, min: number, max: number, errors: string[]): number | undefined {
  if (text.trim() === '') return undefined;
  const value = Number(text);
  if (!Number.isInteger(value) || value < min || value > max) {
    errors.push(`${name} must be a whole number from ${min} to ${max}.`);
    return undefined;
  }
  return value;
}

/** Checks the form's options and turns them into the JSON the API takes (limits as in the API schema). */
export function buildSearchOptions(options: SearchOptions): Built<SearchOptionsBody> {
  const errors: string[] = [];
  const limit = wholeNumber(options.limit, 'The number of candidates', 1, 100, errors) ?? 10;
  const body: SearchOptionsBody = { method: options.method, reverse: options.reverse, limit };
  if (options.edition !== '') body.edition = options.edition;
  const minMass = wholeNumber(options.minMassDa, 'The lowest nominal mass', 0, 5000, errors);
  const maxMass = wholeNumber(options.maxMassDa, 'The highest nominal mass', 0, 5000, errors);
  if (minMass !== undefined && maxMass !== undefined && minMass > maxMass) {
    errors.push('The lowest nominal mass must not exceed the highest.');
  }
  if (minMass !== undefined) body.minMass = minMass;
  if (maxMass !== undefined) body.maxMass = maxMass;
  if (options.riValue.trim() !== '') {
    const value = Number(options.riValue);
    const tolerance = Number(options.riTolerance);
    if (!Number.isFinite(value) || value < 0 || value > 10000) errors.push('The retention index must be a number from 0 to 10000.');
    if (options.riTolerance.trim() === '' || !Number.isFinite(tolerance) || tolerance < 0 || tolerance > 1000) {
      errors.push('The retention-index tolerance must be a number from 0 to 1000 index units.');
    }
    body.retentionIndex = { value, column: options.riColumn, tolerance };
  }
  return errors.length > 0 ? { ok: false, errors } : { ok: true, value: body };
}

/** The whole identify body for one spectrum. */
export function buildIdentifyBody(peaks: PeakList, options: SearchOptions): Built<IdentifyBody> {
  const built = buildSearchOptions(options);
  if (!built.ok) return built;
  return { ok: true, value: { peaks: peaks.map(([mz, intensity]) => [mz, intensity]), ...built.value } };
}
