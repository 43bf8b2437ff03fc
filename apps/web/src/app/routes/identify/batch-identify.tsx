import { PlaceholderPage } from '../../../components/ui/placeholder-page';

export default function BatchIdentifyPage() {
  return (
    <PlaceholderPage
      title="Batch identify"
      summary="Identify many spectra in one run, follow its progress, and export the result table as CSV."
    />
  );
}
