import { PlaceholderPage } from '../../../components/ui/placeholder-page';

export default function AuditLogPage() {
  return (
    <PlaceholderPage
      title="Audit log"
      summary="The append-only record of who did what to which entry, revision, edition or user, and when."
    />
  );
}
