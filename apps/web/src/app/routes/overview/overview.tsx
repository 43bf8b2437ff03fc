import { PlaceholderPage } from '../../../components/ui/placeholder-page';

export default function OverviewPage() {
  return (
    <PlaceholderPage
      title="Overview"
      summary="Charts of the library: entries by state, by nominal mass and by element, and how the library has grown."
    />
  );
}
