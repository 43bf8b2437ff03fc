import { PlaceholderPage } from '../../../components/ui/placeholder-page';

export default function LibraryPage() {
  return (
    <PlaceholderPage
      title="Library"
      summary="Every entry of the library in one fast table, with server-side filters and quick find by name, formula and mass."
    />
  );
}
