import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { RevisionContent } from '@ionfolio/contracts';
import { apiClient } from '../../../lib/api-client';
import { myRevisionsQueryKey } from './get-my-revisions';
import { revisionQueryKey } from './get-revision';
import { revisionDraftResponseSchema, type RevisionDraft } from './revision-draft';

/** Where a save goes: a new entry (draft r1), or an existing open revision at the lock version seen. */
export type SaveTarget = { kind: 'new' } | { kind: 'existing'; id: string; lockVersion: number };

export type SaveInput = { target: SaveTarget; content: RevisionContent; sendForReview: boolean };

/** `POST /entries` for a new entry, else `PATCH /revisions/:id` with the lock version. */
export async function saveRevision(target: SaveTarget, content: RevisionContent): Promise<RevisionDraft> {
  if (target.kind === 'new') {
    return (await apiClient.post('/api/v1/entries', revisionDraftResponseSchema, { body: content })).revision;
  }
  const body = { lockVersion: target.lockVersion, ...content };
  return (await apiClient.patch(`/api/v1/revisions/${encodeURIComponent(target.id)}`, revisionDraftResponseSchema, { body })).revision;
}

/** `POST /revisions/:id/submit`: the revision goes to the review desk. */
export async function submitRevision(revision: RevisionDraft): Promise<RevisionDraft> {
  const url = `/api/v1/revisions/${encodeURIComponent(revision.id)}/submit`;
  return (await apiClient.post(url, revisionDraftResponseSchema, { body: { lockVersion: revision.lockVersion } })).revision;
}

/**
 * Save draft, or save then send for review. When the save succeeds and sending fails, the saved
 * revision is still in the cache, so a second attempt patches it at its new lock version.
 */
export function useSaveRevision({ onSaved }: { onSaved?: (revision: RevisionDraft, sent: boolean) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ target, content, sendForReview }: SaveInput) => {
      const saved = await saveRevision(target, content);
      queryClient.setQueryData(revisionQueryKey(saved.id), saved);
      if (!sendForReview) return { revision: saved, sent: false };
      return { revision: await submitRevision(saved), sent: true };
    },
    onSuccess: async ({ revision, sent }) => {
      queryClient.setQueryData(revisionQueryKey(revision.id), revision);
      await queryClient.invalidateQueries({ queryKey: myRevisionsQueryKey });
      onSaved?.(revision, sent);
    },
  });
}
