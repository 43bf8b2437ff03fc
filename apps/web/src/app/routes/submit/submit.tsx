import { useNavigate } from 'react-router-dom';
import { PanelErrorBoundary } from '../../../components/errors/error-boundary';
import { PageHeader } from '../../../components/ui/page-header';
import { submitRevisionHref } from '../../../config/paths';
import { MyRevisions } from '../../../features/submit/components/my-revisions';
import { SubmitRevisionForm } from '../../../features/submit/components/submit-form';

export default function SubmitPage() {
  const navigate = useNavigate();
  return (
    <section className="grid gap-10">
      <div>
        <PageHeader
          title="Submit"
          description="Record a reference spectrum with its provenance, watch the consistency checks as you fill it in, then save a draft or send it for review."
        />
        <PanelErrorBoundary title="The submit form">
          <SubmitRevisionForm
            onSaved={(revision, sent) =>
              navigate(submitRevisionHref(revision.id), { state: { notice: sent ? 'sent' : 'saved' } })
            }
          />
        </PanelErrorBoundary>
      </div>
      <div>
        <h2 className="mb-3 text-xl font-bold">My revisions</h2>
        <PanelErrorBoundary title="My revisions">
          <MyRevisions />
        </PanelErrorBoundary>
      </div>
    </section>
  );
}
