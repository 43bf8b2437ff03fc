import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { CommentBody, DecisionBody, ReviewQueueQuery } from '@ionfolio/contracts';
import { requireRole } from '../../shared/require-role';
import { RevisionIdParams } from '../entries/entries.schemas';
import { addComment, decide, listComments, reviewQueue } from './reviews.service';

export function reviewsRoutes(ds: DataSource): Router {
  const r = Router();

  r.get('/review-queue', requireRole('curator'), async (req, res) => {
    res.json(await reviewQueue(ds, ReviewQueueQuery.parse(req.query)));
  });

  r.post('/revisions/:id/decision', requireRole('curator'), async (req, res) => {
    const { id } = RevisionIdParams.parse(req.params);
    const decision = DecisionBody.parse(req.body);
    res.json({ revision: await decide(ds, req.user!, id, decision) });
  });

  r.get('/revisions/:id/comments', requireRole('reader'), async (req, res) => {
    const { id } = RevisionIdParams.parse(req.params);
    res.json({ comments: await listComments(ds, req.user!, id) });
  });

  r.post('/revisions/:id/comments', requireRole('contributor'), async (req, res) => {
    const { id } = RevisionIdParams.parse(req.params);
    const body = CommentBody.parse(req.body);
    res.status(201).json({ comment: await addComment(ds, req.user!, id, body) });
  });

  return r;
}
