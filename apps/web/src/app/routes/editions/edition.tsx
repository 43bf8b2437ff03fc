import { Link, useParams } from 'react-router-dom';
import { PanelErrorBoundary } from '../../../components/errors/error-boundary';
import { ErrorNotice } from '../../../components/errors/error-notice';
import { buttonClasses } from '../../../components/ui/button';
import { LoadingState } from '../../../components/ui/loading-state';
import { PageHeader } from '../../../components/ui/page-header';
import { editionHref, paths } from '../../../config/paths';
import { editionAuthorName } from '../../../features/editions/api/edition-schema';
import { editionFileHref, useEdition } from '../../../features/editions/api/get-edition';
import { EditionDiffTable } from '../../../features/editions/components/edition-diff-table';
import { formatDateTime } from '../../../lib/format-date-time';

export default function EditionPage() {
  const { label = '' } = useParams();
  const edition = useEdition(label);
  const back = (
    <Link to={paths.editions.path} className="text-sm text-ink-soft underline decoration-rule underline-offset-4 hover:text-ink">
      ← All editions
    </Link>
  );
  if (edition.isPending) return <LoadingState label={`Loading edition ${label}…`} />;
  if (edition.isError) {
    return (
      <section className="space-y-4">
        {back}
        <ErrorNotice title={`Edition ${label} could not be loaded`} error={edition.error} onRetry={() => void edition.refetch()} />
      </section>
    );
  }
  const { edition: current, previous, diff } = edition.data;
  return (
    <section className="space-y-6">
      {back}
      <PageHeader
        title={`Edition ${current.label}`}
        description={
          <>
            <span className="tabular-nums">{current.revisionCount}</span> published revisions, frozen{' '}
            {formatDateTime(current.createdAt)} by {editionAuthorName(current.createdBy)}.
          </>
        }
        actions={
          <>
            {/* Files: plain links, so the browser downloads them with the session cookie. */}
            <a href={editionFileHref(current.label, 'jcamp')} className={buttonClasses('secondary')} download>
              JCAMP-DX
            </a>
            <a href={editionFileHref(current.label, 'csv')} className={buttonClasses('secondary')} download>
              CSV
            </a>
          </>
        }
      />
      {current.notes ? <p className="max-w-3xl whitespace-pre-wrap leading-relaxed text-ink">{current.notes}</p> : null}
      <p className="text-ink" data-testid="previous-edition">
        {previous ? (
          <>
            Differences from the previous edition,{' '}
            <Link to={editionHref(previous)} className="font-bold underline decoration-rule underline-offset-4">
              {previous}
            </Link>
            :
          </>
        ) : (
          'The first edition: every revision in it is new.'
        )}
      </p>
      <PanelErrorBoundary title="The differences">
        <div className="space-y-6">
          <EditionDiffTable title="Added" items={diff.added} showPrevious={false} emptyNote="No entry was added." />
          <EditionDiffTable title="Changed" items={diff.changed} showPrevious emptyNote="No entry has a newer revision." />
          <EditionDiffTable title="Withdrawn" items={diff.withdrawn} showPrevious={false} emptyNote="No entry was withdrawn." />
        </div>
      </PanelErrorBoundary>
    </section>
  );
}
