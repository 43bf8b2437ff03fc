import { z } from 'zod';
import { formatDateTime } from '../../lib/format-date-time';

/** A comment on a revision (`CommentView`), its author reduced to the name this list shows. */
export const revisionCommentSchema = z.object({
  id: z.string(),
  parentId: z.string().nullable(),
  author: z.union([z.string(), z.object({ displayName: z.string() }).transform((a) => a.displayName)]).nullable(),
  body: z.string(),
  kind: z.enum(['comment', 'decision']),
  createdAt: z.string(),
});

export type RevisionComment = z.infer<typeof revisionCommentSchema>;

/** The review thread of a revision: decisions marked in copper, replies indented under their parent. */
export function CommentList({ comments }: { comments: readonly RevisionComment[] }) {
  return (
    <ol className="grid gap-3">
      {comments.map((c) => (
        <li key={c.id} className={`border-l-2 pl-3 ${c.kind === 'decision' ? 'border-copper' : 'border-rule-faint'} ${c.parentId ? 'ml-6' : ''}`}>
          <p className="text-sm text-ink-soft">
            <span className="font-bold text-ink">{c.author ?? 'someone no longer listed'}</span>
            {c.kind === 'decision' ? ' · review decision' : ''} · <time dateTime={c.createdAt}>{formatDateTime(c.createdAt)}</time>
          </p>
          <p className="whitespace-pre-wrap leading-relaxed">{c.body}</p>
        </li>
      ))}
    </ol>
  );
}
