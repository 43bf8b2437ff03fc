import type { ReactNode } from 'react';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { PanelErrorBoundary } from '../../../components/errors/error-boundary';
import { ErrorNotice } from '../../../components/errors/error-notice';
import { LoadingState } from '../../../components/ui/loading-state';
import { PageHeader } from '../../../components/ui/page-header';
import { CheckList } from '../../../components/spectrum/check-list';
import { RevisionStateBadge } from '../../../components/spectrum/revision-state-badge';
import { entryHref, paths } from '../../../config/paths';
import { useMe } from '../../../features/auth/api/get-me';
import { useEntryWithPublished } from '../../../features/review/api/get-published-revision';
import { useRevision } from '../../../features/review/api/get-revision';
import { CommentsThread } from '../../../features/review/components/comments-thread';
import { DecisionPanel } from '../../../features/review/components/decision-panel';
import { RevisionComparison } from '../../../features/review/components/revision-comparison';
import { WithdrawPanel } from '../../../features/review/components/withdraw-panel';
import { formatDateTime } from '../../../lib/format-date-time';

function Panel({ title, children }: { title: string; children: ReactNode }) {
  const id = `panel-${title.toLowerCase().replace(/[^a-z]+/g, '-')}`;
  return (
    <section aria-labelledby={id} className="rounded-lg border border-rule-faint bg-paper-raised/60 p-4">
      <h2 id={id} className="mb-3 text-lg font-bold text-ink">
        {title}
      </h2>
      <PanelErrorBoundary title={title}>{children}</PanelErrorBoundary>
    </section>
  );
}

export default function ReviewRevisionPage() {
  const { revisionId = '' } = useParams();
  const navigate = useNavigate();
  const me = useMe();
  const revision = useRevision(revisionId);
  const side = useEntryWithPublished(revision.data?.accession);
  const backToQueue = (notice: string) => navigate(paths.review.path, { state: { notice } });

  const back = (
    <Link to={paths.review.path} className="text-sm text-ink-soft underline decoration-rule underline-offset-4 hover:text-ink">
      ← Back to the queue
    </Link>
  );
  if (revision.isPending) return <LoadingState label="Loading the revision…" />;
  if (revision.isError) {
    return (
      <section className="space-y-4">
        {back}
        <ErrorNotice title="The revision could not be loaded" error={revision.error} onRetry={() => void revision.refetch()} />
      </section>
    );
  }
  const current = revision.data;
  const published = side.data?.published && side.data.published.id !== current.id ? side.data.published : null;
  const entryPublished = side.data?.published ?? null;
  const withdrawn = Boolean(side.data?.entry.withdrawnAt);
  const isOwn = me.data !== undefined && current.author?.id === me.data.id;

  return (
    <section className="space-y-6">
      {back}
      <PageHeader
        title={`${current.label} · ${current.name}`}
        description={
          <span className="flex flex-wrap items-center gap-x-3 gap-y-1">
            <RevisionStateBadge state={current.state} />
            <span>by {current.author?.displayName ?? 'someone no longer listed'}</span>
            {current.submittedAt ? <span>sent {formatDateTime(current.submittedAt)}</span> : null}
            {current.simulated ? <span className="font-bold text-copper">simulated — demo only</span> : null}
            <Link to={entryHref(current.accession)} className="underline decoration-rule underline-offset-4 hover:text-ink">
              Entry page
            </Link>
          </span>
        }
      />
      {current.changeNote ? (
        <p className="-mt-2 max-w-3xl whitespace-pre-wrap leading-relaxed text-ink">
          <span className="font-bold">Change note: </span>
          {current.changeNote}
        </p>
      ) : null}
      <div className="grid items-start gap-6 xl:grid-cols-[minmax(0,1fr)_22rem]">
        <div className="min-w-0 space-y-6">
          {side.isPending ? (
            <LoadingState label="Loading the published revision…" />
          ) : side.isError ? (
            <ErrorNotice title="The published revision could not be loaded" error={side.error} onRetry={() => void side.refetch()} />
          ) : (
            <PanelErrorBoundary title="The comparison">
              <RevisionComparison revision={current} published={published} />
            </PanelErrorBoundary>
          )}
          <Panel title="Consistency checks">
            <CheckList checks={current.checks} emptyNote="No checks were recorded for this revision." />
          </Panel>
        </div>
        <div className="space-y-6">
          <Panel title="Decision">
            {isOwn ? (
              <p className="mb-3 text-sm font-bold text-copper">You wrote this revision: another curator must decide it.</p>
            ) : null}
            <DecisionPanel
              revision={current}
              onDecided={(decision) =>
                backToQueue(decision === 'publish' ? `${current.label} is published.` : `${current.label} went back to its author.`)
              }
            />
          </Panel>
          {entryPublished && !withdrawn ? (
            <Panel title="Withdraw the entry">
              <WithdrawPanel accession={current.accession} onWithdrawn={() => backToQueue(`${current.accession} is withdrawn.`)} />
            </Panel>
          ) : null}
          <Panel title="Comments">
            <CommentsThread revisionId={current.id} />
          </Panel>
        </div>
      </div>
    </section>
  );
}
