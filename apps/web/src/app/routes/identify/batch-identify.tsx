import { useState } from 'react';
import { Link, useSearchParams } from 'react-router-dom';
import { ErrorNotice } from '../../../components/errors/error-notice';
import { PanelErrorBoundary } from '../../../components/errors/error-boundary';
import { Button } from '../../../components/ui/button';
import { PageHeader } from '../../../components/ui/page-header';
import { identifyHref, paths } from '../../../config/paths';
import { describeErrorDetails } from '../../../lib/describe-error';
import { useStartBatch, type BatchSpectrum } from '../../../features/batch/api/start-batch';
import { BatchProgress } from '../../../features/batch/components/batch-progress';
import { BatchUpload } from '../../../features/batch/components/batch-upload';
import { recallBatchSpectra, rememberBatchSpectra } from '../../../features/batch/utils/batch-spectra-store';
import { useEditionLabels } from '../../../features/identify/api/get-edition-labels';
import { CautionNote } from '../../../features/identify/components/caution-note';
import { SearchOptionsFields } from '../../../features/identify/components/search-options-fields';
import { peaksParam } from '../../../features/identify/utils/peaks-param';
import { readSpectraText } from '../../../features/identify/utils/read-spectra-text';
import { buildSearchOptions, defaultSearchOptions, type SearchOptions } from '../../../features/identify/utils/search-options';

function readBatch(text: string, fileName: string): BatchSpectrum[] {
  return readSpectraText(text, fileName).map((s) => ({ name: s.name, peaks: s.peaks.map(([mz, i]) => [mz, i] as [number, number]) }));
}

export default function BatchIdentifyPage() {
  const [params, setParams] = useSearchParams();
  // The job lives in the address, so a reload picks the same run up again.
  const jobId = params.get('job');
  const [spectra, setSpectra] = useState<BatchSpectrum[] | null>(null);
  const [options, setOptions] = useState<SearchOptions>({ ...defaultSearchOptions, limit: '5' });
  const [problems, setProblems] = useState<string[]>([]);
  const editions = useEditionLabels();
  const start = useStartBatch();

  const drillHref = (index: number, name: string) => {
    const spectrum = jobId ? recallBatchSpectra(jobId)?.[index] : undefined;
    return spectrum ? identifyHref({ peaks: peaksParam(spectrum.peaks), name }) : null;
  };

  return (
    <section className="space-y-6">
      <PageHeader
        title="Batch identify"
        description="Many unknowns in one run: the best candidates for each, with progress as it goes and the results as CSV."
        actions={
          jobId ? (
            <Link to={paths.batchIdentify.path} className="text-sm underline decoration-rule underline-offset-4">
              Start another batch
            </Link>
          ) : null
        }
      />
      {jobId ? (
        <PanelErrorBoundary title="The batch">
          <BatchProgress jobId={jobId} drillHref={drillHref} />
        </PanelErrorBoundary>
      ) : (
        <form
          className="grid gap-4 lg:grid-cols-2"
          onSubmit={(e) => {
            e.preventDefault();
            if (!spectra || spectra.length === 0) return setProblems(['Choose a file with at least one spectrum first.']);
            const built = buildSearchOptions(options);
            if (!built.ok) return setProblems(built.errors);
            setProblems([]);
            // The API keeps a fixed number of candidates per unknown and refuses a `limit`.
            const { method, reverse, edition } = built.value;
            start.mutate(
              { spectra, method, reverse, ...(edition ? { edition } : {}) },
              {
                onSuccess: ({ job }) => {
                  rememberBatchSpectra(job.id, spectra);
                  setParams({ job: job.id });
                },
              },
            );
          }}
        >
          <div className="grid content-start gap-4">
            <BatchUpload readSpectra={readBatch} spectra={spectra} onSpectra={(found) => setSpectra(found)} disabled={start.isPending} />
            {problems.length > 0 ? (
              <ul role="alert" className="grid gap-1 text-sm font-bold text-copper">
                {problems.map((problem) => (
                  <li key={problem}>{problem}</li>
                ))}
              </ul>
            ) : null}
            {start.isError ? (
              <div>
                <ErrorNotice title="The batch could not be started" error={start.error} />
                {describeErrorDetails(start.error).map((line) => (
                  <p key={line} className="mt-1 text-sm text-copper">{line}</p>
                ))}
              </div>
            ) : null}
            <Button type="submit" className="justify-self-start" disabled={start.isPending}>
              {start.isPending ? 'Starting…' : 'Start the batch'}
            </Button>
          </div>
          <SearchOptionsFields value={options} onChange={setOptions} editions={editions.data ?? []} compact />
        </form>
      )}
      <CautionNote />
    </section>
  );
}
