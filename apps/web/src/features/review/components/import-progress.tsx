import { Link } from 'react-router-dom';
import { ErrorNotice } from '../../../components/errors/error-notice';
import { LoadingState } from '../../../components/ui/loading-state';
import { entryHref } from '../../../config/paths';
import { formatDateTime } from '../../../lib/format-date-time';
import { useImportJob } from '../api/get-import-job';
import { bodyCell, headCell, rowBase, tableBase, tableFrame } from './table-styles';
import { ProgressBar } from '../../../components/ui/progress-bar';

const statusText = { running: 'Importing…', done: 'Done', failed: 'Failed' } as const;

/** A running or finished import: a progress bar of blocks done, then one result row per block. */
export function ImportProgress({ jobId }: { jobId: string }) {
  const query = useImportJob(jobId);
  if (query.isPending) return <LoadingState label="Loading the import…" />;
  if (query.isError) {
    return (
      <ErrorNotice
        title="The import could not be followed"
        error={query.error}
        onRetry={() => void query.refetch()}
      />
    );
  }
  const { job, results } = query.data;
  const percent =
    job.total > 0 ? Math.round((job.done / job.total) * 100) : job.status === 'running' ? 0 : 100;
  return (
    <section aria-labelledby="import-title" className="space-y-4">
      <div className="rounded-lg border border-rule-faint bg-paper-raised p-5">
        <h2 id="import-title" className="text-lg font-bold text-ink">
          {job.fileName}
        </h2>
        <p className="text-sm text-ink-soft">Started {formatDateTime(job.createdAt)}</p>
        <ProgressBar
          label="Blocks processed"
          unit="blocks"
          done={job.done}
          total={job.total}
          percent={percent}
          countTestId="import-count"
        />
        <p role="status" className="mt-2 text-sm text-ink">
          <span className={job.status === 'failed' ? 'font-bold text-copper' : 'font-bold'}>
            {statusText[job.status]}
          </span>
          {' · '}
          {job.imported} imported · {job.rejected} rejected
        </p>
      </div>
      {results.length === 0 ? (
        <p className="text-sm text-ink-soft">No block has been processed yet.</p>
      ) : (
        <div className={tableFrame}>
          <table className={tableBase}>
            <caption className="sr-only">Result per block</caption>
            <thead className="border-b border-rule bg-paper-sunk">
              <tr>
                <th scope="col" className={headCell}>
                  Block
                </th>
                <th scope="col" className={headCell}>
                  Title
                </th>
                <th scope="col" className={headCell}>
                  Result
                </th>
                <th scope="col" className={headCell}>
                  Entry or reason
                </th>
              </tr>
            </thead>
            <tbody>
              {results.map((result) => (
                <tr key={result.block} data-status={result.status} className={rowBase}>
                  <th scope="row" className={`${bodyCell} text-left tabular-nums`}>
                    {result.block}
                  </th>
                  <td className={bodyCell}>{result.title}</td>
                  <td
                    className={`${bodyCell} ${result.status === 'rejected' ? 'font-bold text-copper' : 'text-ink'}`}
                  >
                    {result.status}
                  </td>
                  <td className={bodyCell}>
                    {result.status === 'imported' && result.accession ? (
                      <Link
                        to={entryHref(result.accession)}
                        className="underline decoration-rule underline-offset-4 hover:decoration-ink"
                      >
                        {result.accession}
                      </Link>
                    ) : (
                      <span className="text-ink">{result.reason ?? '—'}</span>
                    )}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </section>
  );
}
