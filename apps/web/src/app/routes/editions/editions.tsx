import { PlaceholderPage } from '../../../components/ui/placeholder-page';

export default function EditionsPage() {
  return (
    <PlaceholderPage
      title="Editions"
      summary="Frozen, named snapshots of the published revisions, so that a search can be repeated exactly later."
    />
  );
}
