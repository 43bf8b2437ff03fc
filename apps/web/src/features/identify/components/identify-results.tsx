import type { PeakList } from '@ionfolio/chem';
import { useState, type ReactNode } from 'react';
import { PanelErrorBoundary } from '../../../components/errors/error-boundary';
import { Button } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import type { IdentifyResponse } from '../api/identify-schemas';
import { candidatesCsv, downloadText } from '../utils/candidates-csv';
import { CandidateMirror } from './candidate-mirror';
import { CandidatesTable } from './candidates-table';
import { CautionNote } from './caution-note';
import { ClusterComparison } from './cluster-comparison';
import { FragmentNotesList } from './fragment-notes-list';
import { MolecularIonPanel } from './molecular-ion-panel';
import { PrintReportHeader } from './print-report-header';

type IdentifyResultsProps = {
  result: IdentifyResponse;
  queryPeaks: PeakList;
  queryName: string;
  searchedAt: Date;
  /** An accession left out of the candidates (the entry a search was started from). */
  excludeAccession?: string | null | undefined;
  /** The number of candidates asked for; a search that excludes an entry asks for one more. */
  limit: number;
};

function Panel({ title, children }: { title: string; children: ReactNode }) {
  return (
    <section aria-label={title} className="rounded-lg border border-rule-faint bg-paper p-4" data-print="keep">
      <h3 className="mb-3 text-base font-bold text-ink">{title}</h3>
      <PanelErrorBoundary title={title}>{children}</PanelErrorBoundary>
    </section>
  );
}

function fileStamp(date: Date): string {
  return date.toISOString().slice(0, 16).replace(/[:T]/g, '-');
}

/** Everything an identify answer shows: caution, candidates, mirror view, molecular-ion check, fragment notes, export. */
export function IdentifyResults({ result, queryPeaks, queryName, searchedAt, excludeAccession, limit }: IdentifyResultsProps) {
  const candidates = result.candidates.filter((c) => c.accession !== excludeAccession).slice(0, limit);
  const [selectedIndex, setSelectedIndex] = useState<number | null>(candidates.length > 0 ? 0 : null);
  const selected = selectedIndex === null ? undefined : candidates[selectedIndex];
  const reading = result.reading;
  const queryM = reading && !reading.likelyAbsent ? reading.molecularIonMz : null;
  const edition = result.edition;

  return (
    <section aria-label="Results" className="grid gap-5">
      <PrintReportHeader queryName={queryName} method={result.method} edition={edition} searchedAt={searchedAt} candidateCount={candidates.length} />
      <CautionNote text={result.caution} />
      <div className="flex flex-wrap items-center justify-between gap-3">
        <p className="text-sm text-ink-soft" role="status">
          {candidates.length} candidates · method <span className="font-bold text-ink">{result.method}</span> · edition{' '}
          <span className="font-bold text-ink">{edition}</span> · similarity 0–100 · {Math.round(result.tookMs)} ms
          {excludeAccession ? ` · ${excludeAccession} left out` : ''}
        </p>
        <div className="flex gap-2" data-print="hide">
          <Button
            variant="secondary"
            disabled={candidates.length === 0}
            onClick={() => downloadText(candidatesCsv(result, candidates, reading, searchedAt), `ionfolio-candidates-${fileStamp(searchedAt)}.csv`)}
          >
            Download CSV
          </Button>
          <Button variant="secondary" onClick={() => window.print()}>
            Print report
          </Button>
        </div>
      </div>
      {candidates.length === 0 ? (
        <EmptyState title="No candidates">
          Nothing in {edition === 'current' ? 'the published library' : `edition ${edition}`} passed the filters. Widen the mass range or
          the retention-index window, or try reverse search.
        </EmptyState>
      ) : (
        <CandidatesTable
          candidates={candidates}
          reading={reading}
          selectedIndex={selectedIndex}
          onSelect={setSelectedIndex}
          showReverse={candidates.some((c) => c.reverseSimilarity !== undefined)}
        />
      )}
      {selected ? (
        <Panel title={`Mirror view: ${selected.accession} r${selected.revision} ${selected.name}`}>
          <CandidateMirror key={`${selected.accession}-${selected.revision}`} queryPeaks={queryPeaks} queryMolecularIonMz={queryM} candidate={selected} />
        </Panel>
      ) : null}
      <div className="grid gap-5 lg:grid-cols-2">
        <Panel title="Molecular-ion check">
          <MolecularIonPanel reading={reading} />
        </Panel>
        <div className="grid content-start gap-5">
          {selected ? (
            <Panel title="Isotope cluster against the candidate">
              <ClusterComparison reading={reading} formula={selected.formula} label={`${selected.accession} r${selected.revision}`} />
            </Panel>
          ) : null}
          <Panel title="Fragment notes">
            <FragmentNotesList peaks={queryPeaks} molecularIonMz={queryM} formula={selected?.formula} />
          </Panel>
        </div>
      </div>
    </section>
  );
}
