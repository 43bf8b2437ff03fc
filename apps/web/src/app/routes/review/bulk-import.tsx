import { Link, useSearchParams } from 'react-router-dom';
import { PanelErrorBoundary } from '../../../components/errors/error-boundary';
import { PageHeader } from '../../../components/ui/page-header';
import { paths } from '../../../config/paths';
import { ImportForm } from '../../../features/review/components/import-form';
import { ImportProgress } from '../../../features/review/components/import-progress';

export default function BulkImportPage() {
  const [params, setParams] = useSearchParams();
  // The job lives in the address, so a reload picks the same import up again.
  const jobId = params.get('job');
  return (
    <section className="space-y-6">
      <Link to={paths.review.path} className="text-sm text-ink-soft underline decoration-rule underline-offset-4 hover:text-ink">
        ← Back to the queue
      </Link>
      <PageHeader
        title="Bulk import"
        description="Many spectra at once from one multi-block JCAMP-DX file. A bad block is rejected with its reason; the others go on."
        actions={
          jobId ? (
            <Link to={paths.reviewImport.path} className="text-sm underline decoration-rule underline-offset-4">
              Import another file
            </Link>
          ) : null
        }
      />
      <PanelErrorBoundary title="The import">
        {jobId ? <ImportProgress jobId={jobId} /> : <ImportForm onStarted={(id) => setParams({ job: id })} />}
      </PanelErrorBoundary>
    </section>
  );
}
