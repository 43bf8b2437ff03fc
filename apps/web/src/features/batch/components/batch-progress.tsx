import { Link } from 'react-router-dom';
import { ErrorNotice } from '../../../components/errors/error-notice';
import { LoadingState } from '../../../components/ui/loading-state';
import { entryRevisionHref } from '../../../config/paths';
import { formatDateTime } from '../../../lib/format-date-time';
import { batchJobPath, useBatchJob } from '../api/get-batch-job';
import { ProgressBar } from '../../../components/ui/progress-bar';

const headCell = 'px-3 py-2 text-left text-xs font-bold uppercase tracking-wider text-ink-soft';
const cell = 'px-3 py-1.5 align-top';
const link = 'underline decoration-rule underline-offset-4 hover:decoration-ink';
const statusText = {
  queued: 'Waiting to start…',
  running: 'Identifying…',
  done: 'Done',
  failed: 'Failed',
} as const;

type BatchProgressProps = {
  jobId: string;
  /** Where "open in Identify" goes for one unknown, or null when its peaks are not known here. */
  drillHref: (index: number, name: string) => string | null;
};

/** A running or finished batch: a progress bar of unknowns done, then the best candidate per unknown. */
export function BatchProgress({ jobId, drillHref }: BatchProgressProps) {
  const query = useBatchJob(jobId);
  if (query.isPending) return <LoadingState label="Loading the batch…" />;
  if (query.isError)
    return (
      <ErrorNotice
        title="The batch could not be followed"
        error={query.error}
        onRetry={() => void query.refetch()}
      />
    );
  const { job, results } = query.data;
  const percent =
    job.total > 0
      ? Math.round((job.done / job.total) * 100)
      : job.status === 'running' || job.status === 'queued'
        ? 0
        : 100;
  return (
    <section aria-label="Batch run" className="grid gap-4">
      <div className="rounded-lg border border-rule-faint bg-paper-raised p-5">
        <p className="text-sm text-ink-soft">
          Job <code>{job.id}</code>
          {job.createdAt ? ` · started ${formatDateTime(job.createdAt)}` : ''}
        </p>
        <ProgressBar
          label="Unknowns identified"
          unit="unknowns"
          done={job.done}
          total={job.total}
          percent={percent}
          countTestId="batch-count"
        />
        <p role="status" className="mt-2 text-sm">
          <span className={`font-bold ${job.status === 'failed' ? 'text-copper' : 'text-ink'}`}>
            {statusText[job.status]}
          </span>
          {job.error ? ` · ${job.error}` : ''}
        </p>
        {job.status === 'done' ? (
          <a
            href={`${batchJobPath(job.id)}/csv`}
            download
            className={`mt-2 inline-block text-sm font-bold ${link}`}
          >
            Download the results as CSV
          </a>
        ) : null}
      </div>
      {results.length === 0 ? (
        <p className="text-sm text-ink-soft">No unknown has been identified yet.</p>
      ) : (
        <div className="overflow-x-auto rounded-lg border border-rule-faint bg-paper-raised">
          <table className="w-full border-collapse text-sm leading-7">
            <caption className="sr-only">Best candidate per unknown</caption>
            <thead className="border-b border-rule bg-paper-sunk">
              <tr>
                <th scope="col" className={headCell}>
                  #
                </th>
                <th scope="col" className={headCell}>
                  Unknown
                </th>
                <th scope="col" className={headCell}>
                  Best candidate
                </th>
                <th scope="col" className={`${headCell} text-right`}>
                  Similarity
                </th>
                <th scope="col" className={headCell}>
                  Next candidates
                </th>
                <th scope="col" className={headCell}>
                  <span className="sr-only">Drill in</span>
                </th>
              </tr>
            </thead>
            <tbody>
              {results.map((result) => {
                // The API counts unknowns from 1; the spectra kept in this tab are an array from 0.
                const name = result.name ?? `Unknown ${result.index}`;
                const href = drillHref(result.index - 1, name);
                return (
                  <tr key={result.index} className="border-b border-rule-faint last:border-b-0">
                    <td className={`${cell} tabular-nums text-ink-soft`}>{result.index}</td>
                    <th scope="row" className={`${cell} text-left font-bold text-ink`}>
                      {name}
                    </th>
                    <td className={cell}>
                      {result.best ? (
                        <>
                          <Link
                            to={entryRevisionHref(result.best.accession, result.best.revision)}
                            className={link}
                          >
                            {result.best.accession} r{result.best.revision}
                          </Link>{' '}
                          {result.best.name}
                        </>
                      ) : (
                        <span className="text-copper">{result.error ?? 'no candidate'}</span>
                      )}
                    </td>
                    <td
                      className={`${cell} text-right font-bold tabular-nums`}
                      data-testid="batch-similarity"
                    >
                      {result.best ? result.best.similarity.toFixed(1) : '—'}
                    </td>
                    <td className={`${cell} text-ink-soft`}>
                      {result.candidates
                        .slice(1, 5)
                        .map((c) => `${c.accession} r${c.revision} ${c.similarity.toFixed(1)}`)
                        .join(' · ') || '—'}
                    </td>
                    <td className={cell}>
                      {href ? (
                        <Link to={href} className={link} aria-label={`Open ${name} in Identify`}>
                          Open in Identify
                        </Link>
                      ) : (
                        <span
                          className="text-xs text-ink-soft"
                          title="The peaks were read in another browser tab"
                        >
                          —
                        </span>
                      )}
                    </td>
                  </tr>
                );
              })}
            </tbody>
          </table>
        </div>
      )}
    </section>
  );
}
