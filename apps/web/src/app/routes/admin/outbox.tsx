import { PlaceholderPage } from '../../../components/ui/placeholder-page';

export default function OutboxPage() {
  return (
    <PlaceholderPage
      title="Outbox"
      summary="The e-mails Ionfolio has sent or queued, so notifications can be checked without a mail client."
    />
  );
}
