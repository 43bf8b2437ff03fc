import { Link, useLocation, useSearchParams } from 'react-router-dom';
import { PanelErrorBoundary } from '../../../components/errors/error-boundary';
import { ErrorNotice } from '../../../components/errors/error-notice';
import { buttonClasses } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { LoadingState } from '../../../components/ui/loading-state';
import { PageHeader } from '../../../components/ui/page-header';
import { paths } from '../../../config/paths';
import { queueStates, useReviewQueue, type QueueState } from '../../../features/review/api/get-review-queue';
import { QueueFilters } from '../../../features/review/components/queue-filters';
import { QueueTable } from '../../../features/review/components/queue-table';
import { QueueTabs, queueStateLabels } from '../../../features/review/components/queue-tabs';

function stateFrom(value: string | null): QueueState {
  return queueStates.find((state) => state === value) ?? 'in_review';
}

const emptyHints: Record<QueueState, string> = {
  in_review: 'Nothing is waiting for a decision. Revisions appear here when their authors send them for review.',
  needs_changes: 'No revision is back with its author.',
  draft: 'No one has an unsent draft.',
};

export default function ReviewDeskPage() {
  const [params, setParams] = useSearchParams();
  const location = useLocation();
  const notice = (location.state as { notice?: unknown } | null)?.notice;
  const filter = { state: stateFrom(params.get('state')), author: params.get('author') ?? '', q: params.get('q') ?? '' };
  const queue = useReviewQueue(filter);

  const withParams = (changes: Record<string, string>) => {
    const next = new URLSearchParams(params);
    for (const [key, value] of Object.entries(changes)) {
      if (value) next.set(key, value);
      else next.delete(key);
    }
    return next;
  };

  return (
    <section>
      <PageHeader
        title="Review desk"
        description="Revisions waiting for a curator: open one to see it beside the published revision, its checks and comments, and decide."
        actions={
          <>
            <Link to={paths.reviewImport.path} className={buttonClasses('secondary')}>
              Bulk import
            </Link>
            <Link to={paths.adminAudit.path} className={buttonClasses('quiet')}>
              Audit log
            </Link>
          </>
        }
      />
      {typeof notice === 'string' ? (
        <p role="status" className="mb-4 rounded-md border border-rule-faint bg-paper-raised px-4 py-2 text-ink">
          {notice}
        </p>
      ) : null}
      <QueueTabs
        active={filter.state}
        counts={queue.data?.counts}
        hrefFor={(state) => `?${withParams({ state: state === 'in_review' ? '' : state }).toString()}`}
      />
      <QueueFilters
        key={`${filter.author}\u0000${filter.q}`}
        author={filter.author}
        q={filter.q}
        onApply={(filters) => setParams(withParams(filters))}
      />
      <PanelErrorBoundary title="The queue">
        {queue.isPending ? (
          <LoadingState label="Loading the queue…" />
        ) : queue.isError ? (
          <ErrorNotice title="The queue could not be loaded" error={queue.error} onRetry={() => void queue.refetch()} />
        ) : queue.data.items.length === 0 ? (
          <EmptyState title={filter.author || filter.q ? 'Nothing matches these filters' : 'The queue is empty'}>
            {filter.author || filter.q ? 'Clear the filters to see the whole queue.' : emptyHints[filter.state]}
          </EmptyState>
        ) : (
          <div className={queue.isPlaceholderData ? 'opacity-60' : ''} aria-busy={queue.isPlaceholderData}>
            <QueueTable items={queue.data.items} caption={`${queueStateLabels[filter.state]}: open revisions`} />
          </div>
        )}
      </PanelErrorBoundary>
    </section>
  );
}
