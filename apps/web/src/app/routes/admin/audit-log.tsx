import { useSearchParams } from 'react-router-dom';
import { PanelErrorBoundary } from '../../../components/errors/error-boundary';
import { PageHeader } from '../../../components/ui/page-header';
import { AuditFilters } from '../../../features/audit/components/audit-filters';
import { AuditTable } from '../../../features/audit/components/audit-table';

export default function AuditLogPage() {
  const [params, setParams] = useSearchParams();
  const filter = { action: params.get('action') ?? '', subject: params.get('subject') ?? '' };
  return (
    <section>
      <PageHeader
        title="Audit log"
        description="The append-only record of who did what to which entry, revision, edition, user or access key, and when."
      />
      <AuditFilters
        key={`${filter.action}\u0000${filter.subject}`}
        filter={filter}
        onApply={(next) => {
          const search = new URLSearchParams();
          if (next.action.trim()) search.set('action', next.action.trim());
          if (next.subject.trim()) search.set('subject', next.subject.trim());
          setParams(search);
        }}
      />
      <PanelErrorBoundary title="The audit log">
        <AuditTable filter={filter} />
      </PanelErrorBoundary>
    </section>
  );
}
