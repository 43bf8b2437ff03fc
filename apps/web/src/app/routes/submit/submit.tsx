import { PlaceholderPage } from '../../../components/ui/placeholder-page';

export default function SubmitPage() {
  return (
    <PlaceholderPage
      title="Submit"
      summary="Record a reference spectrum with its provenance, watch the consistency checks as you fill it in, then save a draft or send it for review."
    />
  );
}
