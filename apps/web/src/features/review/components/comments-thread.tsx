import { useId, useState, type FormEvent } from 'react';
import { ErrorNotice } from '../../../components/errors/error-notice';
import { Button } from '../../../components/ui/button';
import { LoadingState } from '../../../components/ui/loading-state';
import { describeError } from '../../../lib/describe-error';
import { formatDateTime } from '../../../lib/format-date-time';
import { commentAuthorName, useComments, type CommentView } from '../api/get-comments';
import { usePostComment } from '../api/post-comment';
import { textareaClasses } from './table-styles';

type CommentBoxProps = {
  revisionId: string;
  parentId: string | null;
  label: string;
  onDone?: () => void;
};

/** A text box that posts a comment, or a reply to `parentId`. */
function CommentBox({ revisionId, parentId, label, onDone }: CommentBoxProps) {
  const [body, setBody] = useState('');
  const [missing, setMissing] = useState(false);
  const post = usePostComment(revisionId);
  const id = useId();
  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (body.trim() === '') {
      setMissing(true);
      return;
    }
    post.mutate(
      { body, parentId },
      {
        onSuccess: () => {
          setBody('');
          onDone?.();
        },
      },
    );
  };
  return (
    <form onSubmit={submit} className="mt-2 space-y-2">
      <label htmlFor={id} className="block text-xs font-bold text-ink-soft">
        {label}
      </label>
      <textarea
        id={id}
        rows={parentId ? 2 : 3}
        value={body}
        onChange={(event) => {
          setBody(event.target.value);
          setMissing(false);
        }}
        className={textareaClasses}
      />
      {missing ? <p className="text-sm text-copper">Write something first.</p> : null}
      {post.isError ? (
        <p role="alert" className="text-sm text-copper">
          Not sent: {describeError(post.error)}
        </p>
      ) : null}
      <div className="flex gap-2">
        <Button type="submit" variant="secondary" disabled={post.isPending}>
          {post.isPending ? 'Sending…' : parentId ? 'Send reply' : 'Add comment'}
        </Button>
        {onDone ? (
          <Button variant="quiet" onClick={onDone}>
            Cancel
          </Button>
        ) : null}
      </div>
    </form>
  );
}

type ThreadProps = { revisionId: string; comments: CommentView[]; parentId: string | null; canComment: boolean };

function Thread({ revisionId, comments, parentId, canComment }: ThreadProps) {
  const [replyingTo, setReplyingTo] = useState<string | null>(null);
  const here = comments.filter((comment) => comment.parentId === parentId);
  if (here.length === 0) return null;
  return (
    <ul className={parentId ? 'ml-4 mt-2 space-y-2 border-l-2 border-rule-faint pl-4' : 'space-y-3'}>
      {here.map((comment) => (
        <li key={comment.id} data-comment={comment.id}>
          <article className="rounded-md border border-rule-faint bg-paper-raised px-4 py-2.5">
            <header className="flex flex-wrap items-baseline gap-x-2 text-sm">
              <span className="font-bold text-ink">{commentAuthorName(comment.author)}</span>
              {comment.kind === 'decision' ? (
                <span className="rounded border border-ink px-1.5 text-xs font-bold uppercase tracking-wider text-ink">decision</span>
              ) : null}
              <time dateTime={comment.createdAt} className="tabular-nums text-ink-soft">
                {formatDateTime(comment.createdAt)}
              </time>
            </header>
            <p className="mt-1 whitespace-pre-wrap break-words leading-relaxed text-ink">{comment.body}</p>
            {canComment && replyingTo !== comment.id ? (
              <Button variant="quiet" className="-ml-2 mt-1 text-sm" onClick={() => setReplyingTo(comment.id)}>
                Reply
              </Button>
            ) : null}
            {replyingTo === comment.id ? (
              <CommentBox
                revisionId={revisionId}
                parentId={comment.id}
                label={`Reply to ${commentAuthorName(comment.author)}`}
                onDone={() => setReplyingTo(null)}
              />
            ) : null}
          </article>
          <Thread revisionId={revisionId} comments={comments} parentId={comment.id} canComment={canComment} />
        </li>
      ))}
    </ul>
  );
}

/** The comments on a revision, threaded by reply, with a box for a new comment. */
export function CommentsThread({ revisionId, canComment = true }: { revisionId: string; canComment?: boolean }) {
  const comments = useComments(revisionId);
  if (comments.isPending) return <LoadingState label="Loading comments…" />;
  if (comments.isError) {
    return <ErrorNotice title="The comments could not be loaded" error={comments.error} onRetry={() => void comments.refetch()} />;
  }
  // A reply whose parent is not listed is shown at the top level rather than lost.
  const ids = new Set(comments.data.map((comment) => comment.id));
  const rooted = comments.data.map((comment) =>
    comment.parentId !== null && !ids.has(comment.parentId) ? { ...comment, parentId: null } : comment,
  );
  return (
    <div>
      {rooted.length === 0 ? (
        <p className="text-sm text-ink-soft">No comments yet.</p>
      ) : (
        <Thread revisionId={revisionId} comments={rooted} parentId={null} canComment={canComment} />
      )}
      {canComment ? <CommentBox revisionId={revisionId} parentId={null} label="New comment" /> : null}
    </div>
  );
}
