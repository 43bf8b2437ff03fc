import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { z } from 'zod';
import { requireRole } from '../../shared/require-role';

const AuditQuery = z.object({
  action: z.string().max(100).optional(),
  subject: z.string().max(200).optional(),
  cursor: z.coerce.number().int().min(1).optional(),
  limit: z.coerce.number().int().min(1).max(500).default(100),
});

/** The mail outbox (admins) and the audit log (curators and admins); both read-only here. */
export function adminRoutes(ds: DataSource): Router {
  const r = Router();

  r.get('/admin/outbox', requireRole('admin'), async (_req, res) => {
    const rows: Record<string, unknown>[] = await ds.query(
      `SELECT id, created_at AS "createdAt", to_address AS "toAddress", subject, status, attempts,
              last_error AS "lastError", sent_at AS "sentAt"
         FROM mail_messages ORDER BY created_at DESC LIMIT 500`,
    );
    res.json({ messages: rows });
  });

  r.get('/audit', requireRole('curator'), async (req, res) => {
    const q = AuditQuery.parse(req.query);
    const params: unknown[] = [];
    const where: string[] = [];
    if (q.action) {
      params.push(`${q.action}%`);
      where.push(`a.action LIKE $${params.length}`);
    }
    if (q.subject) {
      params.push(`%${q.subject}%`);
      where.push(`a.subject_id ILIKE $${params.length}`);
    }
    if (q.cursor) {
      params.push(q.cursor);
      where.push(`a.id < $${params.length}`);
    }
    params.push(q.limit + 1);
    const rows: { id: string; occurredAt: Date; login: string | null; displayName: string | null; action: string; subjectType: string; subjectId: string; data: unknown }[] =
      await ds.query(
        `SELECT a.id, a.occurred_at AS "occurredAt", u.login, u.display_name AS "displayName", a.action,
                a.subject_type AS "subjectType", a.subject_id AS "subjectId", a.data
           FROM audit_events a LEFT JOIN users u ON u.id = a.actor_id
          ${where.length ? `WHERE ${where.join(' AND ')}` : ''}
          ORDER BY a.id DESC LIMIT $${params.length}`,
        params,
      );
    const page = rows.slice(0, q.limit);
    res.json({
      events: page.map((e) => ({
        id: Number(e.id),
        occurredAt: new Date(e.occurredAt).toISOString(),
        actor: e.login ? { login: e.login, displayName: e.displayName } : null,
        action: e.action,
        subjectType: e.subjectType,
        subjectId: e.subjectId,
        data: e.data,
      })),
      nextCursor: rows.length > q.limit ? Number(page.at(-1)!.id) : null,
    });
  });

  r.get('/my/revisions', requireRole('contributor'), async (req, res) => {
    const items = await ds.query(
      `SELECT r.id AS "revisionId", e.accession, r.number, e.accession || ' r' || r.number AS label, r.state, r.name, r.formula,
              r.checks_worst AS "checksWorst", u.display_name AS author, u.login AS "authorLogin", r.submitted_at AS "submittedAt", r.updated_at AS "updatedAt",
              EXISTS (SELECT 1 FROM revisions p WHERE p.entry_id = r.entry_id AND p.state = 'published') AS "hasPublished", r.simulated
         FROM revisions r JOIN entries e ON e.id = r.entry_id JOIN users u ON u.id = r.author_id
        WHERE r.author_id = $1 AND r.state IN ('draft', 'in_review', 'needs_changes')
        ORDER BY r.updated_at DESC`,
      [req.user!.id],
    );
    res.json({ items });
  });

  return r;
}
