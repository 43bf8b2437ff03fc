import { PanelErrorBoundary } from '../../../components/errors/error-boundary';
import { PageHeader } from '../../../components/ui/page-header';
import { OutboxTable } from '../../../features/admin-outbox/components/outbox-table';

export default function OutboxPage() {
  return (
    <section>
      <PageHeader
        title="Outbox"
        description="The e-mails Ionfolio has sent or queued, so notifications can be checked without a mail client. Failed sends are retried."
      />
      <PanelErrorBoundary title="The outbox">
        <OutboxTable />
      </PanelErrorBoundary>
    </section>
  );
}
