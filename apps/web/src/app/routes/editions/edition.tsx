import { PlaceholderPage } from '../../../components/ui/placeholder-page';

export default function Page() {
  return <PlaceholderPage title="Being built" summary="This page is being built." />;
}
