import { Router } from 'express';
import type { DataSource } from 'typeorm';
import {
  LockVersionBody,
  NewRevisionBody,
  RevisionContentSchema,
  RevisionPatchSchema,
  RevisionQuery,
  WithdrawBody,
} from '@ionfolio/contracts';
import { writeJcamp } from '@ionfolio/chem';
import { requireRole } from '../../shared/require-role';
import { recordAudit } from '../audit/audit.service';
import { AccessionParams, ListEntriesQuery, RevisionIdParams } from './entries.schemas';
import {
  createEntry,
  getEntry,
  getRevisionById,
  newRevision,
  submitRevision,
  updateRevision,
  withdrawEntry,
} from './entries.service';
import { listEntries } from './entries.list';
import { revisionToJcampInput } from './revision-jcamp';

export function entriesRoutes(ds: DataSource): Router {
  const r = Router();

  r.get('/entries', requireRole('reader', { scope: 'library:read' }), async (req, res) => {
    res.json(await listEntries(ds, ListEntriesQuery.parse(req.query)));
  });

  r.post('/entries', requireRole('contributor', { scope: 'submit' }), async (req, res) => {
    const content = RevisionContentSchema.parse(req.body);
    res.status(201).json({ revision: await createEntry(ds, req.user!, content) });
  });

  r.get('/entries/:accession', requireRole('reader', { scope: 'library:read' }), async (req, res) => {
    const { accession } = AccessionParams.parse(req.params);
    const { revision } = RevisionQuery.parse(req.query);
    res.json({ entry: await getEntry(ds, req.user!, accession, revision) });
  });

  r.get('/entries/:accession/revisions', requireRole('reader', { scope: 'library:read' }), async (req, res) => {
    const { accession } = AccessionParams.parse(req.params);
    const entry = await getEntry(ds, req.user!, accession);
    res.json({ accession, revisions: entry.revisions });
  });

  r.get('/entries/:accession/jcamp', requireRole('reader', { scope: 'library:read' }), async (req, res) => {
    const { accession } = AccessionParams.parse(req.params);
    const { revision } = RevisionQuery.parse(req.query);
    const entry = await getEntry(ds, req.user!, accession, revision);
    const text = writeJcamp(revisionToJcampInput(entry.revision));
    await ds.transaction((m) =>
      recordAudit(m, { actorId: req.user!.id, action: 'export.jcamp', subjectType: 'revision', subjectId: entry.revision.label, data: {} }),
    );
    res
      .type('chemical/x-jcamp-dx')
      .attachment(`${accession}-r${entry.revision.number}.jdx`)
      .send(text);
  });

  r.post('/entries/:accession/revisions', requireRole('contributor'), async (req, res) => {
    const { accession } = AccessionParams.parse(req.params);
    const body = NewRevisionBody.parse(req.body ?? {});
    res.status(201).json({ revision: await newRevision(ds, req.user!, accession, body) });
  });

  r.post('/entries/:accession/withdraw', requireRole('curator'), async (req, res) => {
    const { accession } = AccessionParams.parse(req.params);
    const { reason } = WithdrawBody.parse(req.body);
    res.json({ entry: await withdrawEntry(ds, req.user!, accession, reason) });
  });

  r.get('/revisions/:id', requireRole('reader', { scope: 'library:read' }), async (req, res) => {
    const { id } = RevisionIdParams.parse(req.params);
    res.json({ revision: await getRevisionById(ds, req.user!, id) });
  });

  r.patch('/revisions/:id', requireRole('contributor', { scope: 'submit' }), async (req, res) => {
    const { id } = RevisionIdParams.parse(req.params);
    const patch = RevisionPatchSchema.parse(req.body);
    res.json({ revision: await updateRevision(ds, req.user!, id, patch) });
  });

  r.post('/revisions/:id/submit', requireRole('contributor', { scope: 'submit' }), async (req, res) => {
    const { id } = RevisionIdParams.parse(req.params);
    const { lockVersion } = LockVersionBody.parse(req.body);
    res.json({ revision: await submitRevision(ds, req.user!, id, lockVersion) });
  });

  return r;
}
