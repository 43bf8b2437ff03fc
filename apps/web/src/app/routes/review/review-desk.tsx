import { PlaceholderPage } from '../../../components/ui/placeholder-page';

export default function ReviewDeskPage() {
  return (
    <PlaceholderPage
      title="Review desk"
      summary="The revisions waiting for a curator's decision, each with its consistency checks and the comments so far."
    />
  );
}
