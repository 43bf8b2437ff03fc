import { ErrorNotice } from '../../../components/errors/error-notice';
import { CommentList } from '../../../components/spectrum/comment-list';
import { LoadingState } from '../../../components/ui/loading-state';
import { useEntryComments } from '../api/get-comments';

/** The review comments and decisions of the revision shown. */
export function EntryComments({ revisionId }: { revisionId: string }) {
  const comments = useEntryComments(revisionId);
  if (comments.isPending) return <LoadingState label="Loading comments…" />;
  if (comments.isError) return <ErrorNotice title="The comments could not be loaded" error={comments.error} onRetry={() => void comments.refetch()} />;
  if (comments.data.length === 0) return <p className="text-ink-soft">No comments on this revision.</p>;
  return <CommentList comments={comments.data} />;
}
