import { useNavigate } from 'react-router-dom';
import { PanelErrorBoundary } from '../../../components/errors/error-boundary';
import { PageHeader } from '../../../components/ui/page-header';
import { editionHref } from '../../../config/paths';
import { useMe } from '../../../features/auth/api/get-me';
import { EditionsTable } from '../../../features/editions/components/editions-table';
import { FreezeEditionForm } from '../../../features/editions/components/freeze-edition-form';
import { hasRole } from '../../../lib/roles';

export default function EditionsPage() {
  const me = useMe();
  const navigate = useNavigate();
  const canFreeze = me.data !== undefined && hasRole(me.data.role, 'curator');
  return (
    <section>
      <PageHeader
        title="Editions"
        description="Frozen, named snapshots of the published revisions, so that a search can be repeated exactly later."
      />
      <div className={canFreeze ? 'grid items-start gap-6 lg:grid-cols-[minmax(0,1fr)_20rem]' : ''}>
        <PanelErrorBoundary title="The editions list">
          <EditionsTable />
        </PanelErrorBoundary>
        {canFreeze ? (
          <PanelErrorBoundary title="The freeze form">
            <FreezeEditionForm onFrozen={(label) => navigate(editionHref(label))} />
          </PanelErrorBoundary>
        ) : null}
      </div>
    </section>
  );
}
