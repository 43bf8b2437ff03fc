import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';

const revisionSpectrumSchema = z.looseObject({
  accession: z.string().optional(),
  number: z.number().int().optional(),
  label: z.string().optional(),
  name: z.string(),
  formula: z.string(),
  peaks: z.array(z.tuple([z.number(), z.number()])),
  simulated: z.boolean().optional(),
});

const entryResponseSchema = z.object({ entry: z.looseObject({ revision: revisionSpectrumSchema }) });

export type EntrySpectrum = {
  accession: string;
  revision: number | null;
  label: string;
  name: string;
  formula: string;
  peaks: [number, number][];
  simulated: boolean;
};

/** One revision's spectrum (the published one when `revision` is null). */
export async function getEntrySpectrum(accession: string, revision: number | null, signal?: AbortSignal): Promise<EntrySpectrum> {
  const query = revision === null ? '' : `?revision=${revision}`;
  const { entry } = await apiClient.get(`/api/v1/entries/${encodeURIComponent(accession)}${query}`, entryResponseSchema, { signal });
  const r = entry.revision;
  const number = r.number ?? revision;
  return {
    accession,
    revision: number,
    label: r.label ?? (number === null ? accession : `${accession} r${number}`),
    name: r.name,
    formula: r.formula,
    peaks: r.peaks,
    simulated: r.simulated ?? false,
  };
}

/** A revision's spectrum for the mirror view or for a search started from an entry page. */
export function useEntrySpectrum(accession: string | null, revision: number | null) {
  return useQuery({
    queryKey: ['entries', accession, 'spectrum', revision],
    queryFn: ({ signal }) => getEntrySpectrum(accession ?? '', revision, signal),
    enabled: accession !== null,
    // A revision never changes once written.
    staleTime: revision === null ? 60_000 : Number.POSITIVE_INFINITY,
  });
}
