import { useNavigate, useParams, useSearchParams } from 'react-router-dom';
import { ErrorNotice } from '../../../components/errors/error-notice';
import { NotFound } from '../../../components/errors/not-found';
import { LoadingState } from '../../../components/ui/loading-state';
import { submitRevisionHref } from '../../../config/paths';
import { useMe } from '../../../features/auth/api/get-me';
import { useEntryView } from '../../../features/entry/api/get-entry';
import { EntryDetails } from '../../../features/entry/components/entry-details';
import { isApiError } from '../../../lib/api-error';

/** `?revision=N` as a revision number, or undefined for the current revision. */
function revisionParam(value: string | null): number | undefined {
  if (value === null) return undefined;
  const n = Number(value);
  return Number.isInteger(n) && n >= 1 ? n : undefined;
}

export default function EntryPage() {
  const { accession = '' } = useParams();
  const [search] = useSearchParams();
  const navigate = useNavigate();
  const me = useMe();
  const entry = useEntryView(accession, revisionParam(search.get('revision')));

  if (entry.isPending || !me.data) return <LoadingState label={`Loading ${accession}…`} />;
  if (entry.isError) {
    if (isApiError(entry.error) && entry.error.status === 404) return <NotFound />;
    return <ErrorNotice title={`${accession} could not be loaded`} error={entry.error} onRetry={() => void entry.refetch()} />;
  }
  return <EntryDetails entry={entry.data} role={me.data.role} onDraftCreated={(id) => navigate(submitRevisionHref(id))} />;
}
