import { useQueryClient } from '@tanstack/react-query';
import { useId, useState } from 'react';
import { Button } from '../../../components/ui/button';
import { isApiError } from '../../../lib/api-error';
import { describeError } from '../../../lib/describe-error';
import { useDecideRevision, type DecisionInput } from '../api/decide-revision';
import { commentsQueryKey } from '../api/get-comments';
import { revisionQueryKey } from '../api/get-revision';
import type { RevisionView } from '../api/revision-view';
import { textareaClasses } from './table-styles';

type DecisionPanelProps = {
  revision: Pick<RevisionView, 'id' | 'number' | 'label' | 'lockVersion' | 'state'>;
  onDecided: (decision: DecisionInput['decision']) => void;
};

function refusal(error: unknown): { title: string; text: string } {
  if (isApiError(error) && error.code === 'STALE_REVISION') {
    return {
      title: 'Someone decided or changed it first — reload',
      text: 'The revision has been reloaded below. Look at it again before deciding.',
    };
  }
  if (isApiError(error) && error.code === 'SELF_REVIEW') {
    return {
      title: 'You cannot decide your own revision',
      text: `${error.message} Another curator must publish or return it.`,
    };
  }
  return { title: 'The decision was not saved', text: describeError(error) };
}

/** Publish, or return to the author with a comment; sent with the lock version the curator saw. */
export function DecisionPanel({ revision, onDecided }: DecisionPanelProps) {
  const [comment, setComment] = useState('');
  const [commentMissing, setCommentMissing] = useState(false);
  const decide = useDecideRevision(revision.id);
  const queryClient = useQueryClient();
  const commentId = useId();
  const hintId = useId();

  const send = (decision: DecisionInput['decision']) => {
    if (decision === 'needs_changes' && comment.trim() === '') {
      setCommentMissing(true);
      return;
    }
    decide.mutate(
      { decision, comment: comment.trim(), lockVersion: revision.lockVersion },
      {
        onSuccess: () => onDecided(decision),
        onError: (error) => {
          if (isApiError(error) && error.code === 'STALE_REVISION') {
            void queryClient.invalidateQueries({ queryKey: revisionQueryKey(revision.id) });
            void queryClient.invalidateQueries({ queryKey: commentsQueryKey(revision.id) });
          }
        },
      },
    );
  };

  const failure = decide.isError ? refusal(decide.error) : null;
  const failureNotice = failure ? (
    <div role="alert" className="rounded-md border border-copper/60 bg-copper-soft px-4 py-3 text-ink">
      <p className="font-bold">{failure.title}</p>
      <p className="mt-1 text-sm leading-relaxed">{failure.text}</p>
    </div>
  ) : null;

  if (revision.state !== 'in_review') {
    // After a stale decision the reloaded revision may no longer be in review; the notice stays.
    return (
      <div className="space-y-3">
        {failureNotice}
        <p className="text-sm leading-relaxed text-ink-soft">
          Only a revision in review can be published or returned; this one is{' '}
          {revision.state === 'needs_changes' ? 'back with its author' : revision.state.replace('_', ' ')}.
        </p>
      </div>
    );
  }

  return (
    <div className="space-y-3">
      <div>
        <label htmlFor={commentId} className="block text-sm font-bold text-ink">
          Comment to the author
        </label>
        <p id={hintId} className="text-xs text-ink-soft">
          Optional when publishing; required when returning it.
        </p>
        <textarea
          id={commentId}
          aria-describedby={hintId}
          aria-invalid={commentMissing}
          rows={4}
          value={comment}
          onChange={(event) => {
            setComment(event.target.value);
            setCommentMissing(false);
          }}
          className={`${textareaClasses} mt-1`}
        />
        {commentMissing ? (
          <p role="alert" className="mt-1 text-sm font-bold text-copper">
            Say what needs to change before returning the revision.
          </p>
        ) : null}
      </div>
      <div className="flex flex-wrap gap-2">
        <Button onClick={() => send('publish')} disabled={decide.isPending}>
          {decide.isPending && decide.variables.decision === 'publish' ? 'Publishing…' : `Publish r${revision.number}`}
        </Button>
        <Button variant="secondary" onClick={() => send('needs_changes')} disabled={decide.isPending}>
          {decide.isPending && decide.variables.decision === 'needs_changes' ? 'Returning…' : 'Return with comment'}
        </Button>
      </div>
      {failureNotice}
      <p className="text-xs text-ink-soft">
        Deciding on {revision.label} as seen at lock version {revision.lockVersion}.
      </p>
    </div>
  );
}
