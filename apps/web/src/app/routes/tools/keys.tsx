import { PanelErrorBoundary } from '../../../components/errors/error-boundary';
import { PageHeader } from '../../../components/ui/page-header';
import { readerScopes, accessKeyScopes } from '../../../features/access-keys/api/access-key-schema';
import { CreateKeyForm } from '../../../features/access-keys/components/create-key-form';
import { KeysTable } from '../../../features/access-keys/components/keys-table';
import { useMe } from '../../../features/auth/api/get-me';
import { hasRole } from '../../../lib/roles';

export default function AccessKeysToolPage() {
  const me = useMe();
  // Readers may give their keys read scopes only (PRODUCT.md roles); the API enforces the same.
  const allowed = me.data && hasRole(me.data.role, 'contributor') ? accessKeyScopes : readerScopes;
  return (
    <section className="space-y-6">
      <PageHeader
        title="Access keys"
        description="Keys for instrument data systems, LIMS and scripts to call the REST API as you, within the scopes you give them. Revoke a key the moment it is no longer needed."
      />
      <PanelErrorBoundary title="The new key form">
        <CreateKeyForm allowedScopes={allowed} />
      </PanelErrorBoundary>
      <PanelErrorBoundary title="Your keys">
        <h2 className="text-lg font-bold text-ink">Your keys</h2>
        <KeysTable />
      </PanelErrorBoundary>
    </section>
  );
}
