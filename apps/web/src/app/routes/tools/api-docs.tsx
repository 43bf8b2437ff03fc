import { PanelErrorBoundary } from '../../../components/errors/error-boundary';
import { PageHeader } from '../../../components/ui/page-header';
import { ApiReference } from '../../../features/api-docs/components/api-reference';

export default function ApiDocsPage() {
  return (
    <section>
      <PageHeader
        title="API for tools"
        description="Every route of the REST API v1 with its method, path, the access-key scope it needs, its request body and a curl example."
      />
      <PanelErrorBoundary title="The API reference">
        <ApiReference origin={window.location.origin} />
      </PanelErrorBoundary>
    </section>
  );
}
