import type { PeakList } from '@ionfolio/chem';
import { ErrorNotice } from '../../../components/errors/error-notice';
import { MirrorPlot } from '../../../components/spectrum/mirror-plot';
import { LoadingState } from '../../../components/ui/loading-state';
import { useEntrySpectrum } from '../api/get-entry-spectrum';
import type { Candidate } from '../api/identify-schemas';

/** What the query is called above the axis of every mirror view. */
export const queryLabel = 'Unknown (query)';

type CandidateMirrorProps = {
  queryPeaks: PeakList;
  queryMolecularIonMz: number | null;
  candidate: Candidate;
};

/** The mirror view of the query against one candidate revision (its peaks fetched from the library). */
export function CandidateMirror({ queryPeaks, queryMolecularIonMz, candidate }: CandidateMirrorProps) {
  const spectrum = useEntrySpectrum(candidate.accession, candidate.revision);
  if (spectrum.isPending) return <LoadingState label={`Loading ${candidate.accession} r${candidate.revision}…`} />;
  if (spectrum.isError) {
    return <ErrorNotice title="The candidate's spectrum could not be loaded" error={spectrum.error} onRetry={() => void spectrum.refetch()} />;
  }
  const label = `${spectrum.data.label} · ${spectrum.data.name}${spectrum.data.simulated ? ' (simulated — demo only)' : ''}`;
  return (
    <MirrorPlot
      top={{ label: queryLabel, peaks: queryPeaks, molecularIonMz: queryMolecularIonMz }}
      bottom={{ label, peaks: spectrum.data.peaks, molecularIonMz: candidate.nominalMass }}
      heightPx={380}
    />
  );
}
