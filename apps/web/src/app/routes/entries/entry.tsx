import { useParams } from 'react-router-dom';
import { PlaceholderPage } from '../../../components/ui/placeholder-page';

export default function EntryPage() {
  const { accession = '' } = useParams();
  return (
    <PlaceholderPage
      title={`Entry ${accession}`}
      summary="This entry's stick plot, peak table, structure, conditions, consistency checks and revision timeline, with JCAMP-DX export."
    />
  );
}
