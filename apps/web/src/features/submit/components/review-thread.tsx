import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { ErrorNotice } from '../../../components/errors/error-notice';
import { CommentList } from '../../../components/spectrum/comment-list';
import { LoadingState } from '../../../components/ui/loading-state';
import { describeError } from '../../../lib/describe-error';
import { usePostComment, useRevisionComments } from '../api/revision-comments';
import { inputClass } from './form-field';

/** The curators' comments on one's revision, and a box to answer them. */
export function ReviewThread({ revisionId, canReply }: { revisionId: string; canReply: boolean }) {
  const comments = useRevisionComments(revisionId);
  const post = usePostComment(revisionId);
  const [body, setBody] = useState('');
  if (comments.isPending) return <LoadingState label="Loading the review comments…" />;
  if (comments.isError) return <ErrorNotice title="The review comments could not be loaded" error={comments.error} onRetry={() => void comments.refetch()} />;
  const lastDecision = [...comments.data].reverse().find((c) => c.kind === 'decision');
  return (
    <section aria-label="Review comments" className="rounded-lg border border-rule-faint bg-paper-raised px-5 py-4">
      <h2 className="text-lg font-bold">Review comments</h2>
      {comments.data.length === 0 ? (
        <p className="mt-1 text-ink-soft">No comments on this revision yet.</p>
      ) : (
        <div className="mt-2">
          <CommentList comments={comments.data} />
        </div>
      )}
      {canReply ? (
        <form
          className="mt-4 grid gap-2"
          onSubmit={(e) => {
            e.preventDefault();
            if (body.trim() === '') return;
            post.mutate({ body: body.trim(), parentId: lastDecision?.id ?? null }, { onSuccess: () => setBody('') });
          }}
        >
          <label htmlFor="reply-body" className="text-sm font-bold">
            Reply
          </label>
          <textarea id="reply-body" rows={3} className={inputClass} value={body} onChange={(e) => setBody(e.target.value)} />
          {post.isError ? (
            <p role="alert" className="text-sm text-copper">
              Not sent: {describeError(post.error)}
            </p>
          ) : null}
          <div>
            <Button type="submit" variant="secondary" disabled={post.isPending || body.trim() === ''}>
              Send reply
            </Button>
          </div>
        </form>
      ) : null}
    </section>
  );
}
