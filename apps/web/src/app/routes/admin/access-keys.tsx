import { PlaceholderPage } from '../../../components/ui/placeholder-page';

export default function AccessKeysPage() {
  return (
    <PlaceholderPage
      title="Access keys"
      summary="Every access key for instrument data systems, LIMS and scripts: its owner, scopes, last use, and revocation."
    />
  );
}
