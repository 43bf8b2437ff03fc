import { Link, useLocation, useNavigate, useParams } from 'react-router-dom';
import { PanelErrorBoundary } from '../../../components/errors/error-boundary';
import { ErrorNotice } from '../../../components/errors/error-notice';
import { RevisionStateBadge } from '../../../components/spectrum/revision-state-badge';
import { LoadingState } from '../../../components/ui/loading-state';
import { PageHeader } from '../../../components/ui/page-header';
import { entryRevisionHref, paths } from '../../../config/paths';
import { useRevision } from '../../../features/submit/api/get-revision';
import { isEditable } from '../../../features/submit/api/revision-draft';
import { ReviewThread } from '../../../features/submit/components/review-thread';
import { SubmitRevisionForm } from '../../../features/submit/components/submit-form';

const notices: Record<string, string> = {
  saved: 'Draft saved.',
  sent: 'Sent for review. A curator will publish it or return it with comments.',
};

export default function SubmitRevisionPage() {
  const { revisionId = '' } = useParams();
  const location = useLocation();
  const navigate = useNavigate();
  const revision = useRevision(revisionId);
  const noticeKey = (location.state as { notice?: string } | null)?.notice;

  if (revision.isPending) return <LoadingState label="Loading the revision…" />;
  if (revision.isError) {
    return <ErrorNotice title="This revision could not be loaded" error={revision.error} onRetry={() => void revision.refetch()} />;
  }
  const r = revision.data;
  return (
    <section className="grid gap-8">
      <PageHeader
        title={`${r.label} · ${r.name}`}
        description={
          <span className="inline-flex flex-wrap items-center gap-2">
            <RevisionStateBadge state={r.state} />
            {isEditable(r.state) ? 'Edit and save; send it for review when it is ready.' : 'This revision is no longer open for editing.'}
            <Link className="underline" to={entryRevisionHref(r.accession, r.number)}>
              Entry page
            </Link>
            <Link className="underline" to={paths.submit.path}>
              My revisions
            </Link>
          </span>
        }
      />
      {noticeKey && notices[noticeKey] ? (
        <p role="status" className="rounded-md border border-rule-faint bg-paper-raised px-4 py-2">
          {notices[noticeKey]}
        </p>
      ) : null}
      {r.state === 'needs_changes' || r.state === 'in_review' ? (
        <PanelErrorBoundary title="The review comments">
          <ReviewThread revisionId={r.id} canReply />
        </PanelErrorBoundary>
      ) : null}
      <PanelErrorBoundary title="The submit form">
        <SubmitRevisionForm
          // A new lock version (a save here or elsewhere) starts the form from the saved content.
          key={`${r.id}:${r.lockVersion}`}
          revision={r}
          onReload={() => void revision.refetch()}
          onSaved={(_saved, sent) => navigate('.', { replace: true, state: { notice: sent ? 'sent' : 'saved' } })}
        />
      </PanelErrorBoundary>
    </section>
  );
}
