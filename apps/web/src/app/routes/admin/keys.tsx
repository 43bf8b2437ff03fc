import { PanelErrorBoundary } from '../../../components/errors/error-boundary';
import { PageHeader } from '../../../components/ui/page-header';
import { KeysTable } from '../../../features/access-keys/components/keys-table';

export default function AdminAccessKeysPage() {
  return (
    <section>
      <PageHeader
        title="Access keys"
        description="Every access key with its owner, scopes and last use. Revoking one stops the tool using it at its next call."
      />
      <PanelErrorBoundary title="All access keys">
        <KeysTable all />
      </PanelErrorBoundary>
    </section>
  );
}
