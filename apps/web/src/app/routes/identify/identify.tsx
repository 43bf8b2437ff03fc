import { PlaceholderPage } from '../../../components/ui/placeholder-page';

export default function IdentifyPage() {
  return (
    <PlaceholderPage
      title="Identify"
      summary="Paste a peak list or drop a JCAMP-DX or CSV file to get ranked candidates with their similarity, the mirror view and the molecular-ion check."
    />
  );
}
