import { z } from 'zod';
import {
  CommentBody,
  DecisionBody,
  EditionBody,
  LockVersionBody,
  NewRevisionBody,
  ReviewQueueQuery,
  RevisionContentSchema,
  RevisionPatchSchema,
  RevisionQuery,
  WithdrawBody,
} from '@ionfolio/contracts';
import type { RouteAccess } from '../../shared/require-role';
import { CreateAccessKeyBody, CreatedAccessKeySchema, AccessKeyViewSchema, ListAccessKeysQuery } from '../access-keys/access-keys.schemas';
import { ListEntriesQuery } from '../entries/entries.schemas';
import { FormulaAnswerSchema, ReadingBody } from '../formulas/formulas.schemas';
import { IdentifyBody, IdentifyResponseSchema, ReadingSchema } from '../identify/identify.schemas';
import { BatchJobAnswerSchema, BatchJobSchema, batchBody } from '../identify/batch.schemas';
import { ChangeRoleBody } from '../users/users.schemas';

/** One route of the app as the OpenAPI document describes it. */
export interface RouteSpec {
  method: 'GET' | 'POST' | 'PATCH' | 'DELETE';
  /** Express path from the root (`:param` segments). */
  path: string;
  summary: string;
  tag: string;
  /** `public`, `session` (the sign-in flow, no role), or what requireRole asks. */
  access: 'public' | 'session' | RouteAccess;
  query?: z.ZodType;
  body?: z.ZodType;
  /** `multipart` bodies carry a `file` field beside the body schema's fields. */
  bodyType?: 'json' | 'multipart';
  response: { status: number; description: string; schema?: z.ZodType; contentType?: string };
}

const reader = (scope?: RouteAccess['scope']): RouteAccess => ({ role: 'reader', scope });
const contributor = (scope?: RouteAccess['scope']): RouteAccess => ({ role: 'contributor', scope });
const curator: RouteAccess = { role: 'curator' };
const admin: RouteAccess = { role: 'admin' };
const file = (description: string) => ({ status: 200, description, contentType: 'application/octet-stream' });
const json = (description: string, schema?: z.ZodType, status = 200) => ({ status, description, ...(schema ? { schema } : {}) });

/**
 * Every route of the API, in one place: the OpenAPI document is generated from this list and the
 * zod schemas it names, and a test checks that it matches the routes mounted in the app.
 */
export const ROUTES: RouteSpec[] = [
  { method: 'GET', path: '/api/health', tag: 'system', summary: 'Whether the API and its database answer', access: 'public', response: json('`{ status, database }`; 503 when the database is down') },
  { method: 'GET', path: '/api/v1/openapi.json', tag: 'system', summary: 'This document', access: 'public', response: json('OpenAPI 3.1 document') },
  { method: 'GET', path: '/api/auth/config', tag: 'auth', summary: 'Sign-in provider settings for the web app', access: 'public', response: json('`{ provider, localStandIn }`') },
  { method: 'GET', path: '/auth/github', tag: 'auth', summary: 'Starts browser sign-in (redirect to the provider)', access: 'session', response: { status: 302, description: 'Redirect to the provider' } },
  { method: 'GET', path: '/auth/github/callback', tag: 'auth', summary: 'Browser sign-in callback', access: 'session', response: { status: 302, description: 'Redirect back into the app' } },
  { method: 'POST', path: '/auth/sign-out', tag: 'auth', summary: 'Ends the browser session', access: 'session', response: { status: 204, description: 'Signed out' } },
  { method: 'GET', path: '/api/v1/me', tag: 'users', summary: 'The signed-in user', access: reader(), response: json('`{ user }`') },
  { method: 'GET', path: '/api/v1/admin/users', tag: 'admin', summary: 'All users and their roles', access: admin, response: json('`{ users }`') },
  { method: 'PATCH', path: '/api/v1/admin/users/:id', tag: 'admin', summary: "Changes a user's role", access: admin, body: ChangeRoleBody, response: json('`{ user }`') },

  { method: 'POST', path: '/api/v1/identify', tag: 'identify', summary: 'Candidates for an unknown spectrum, with the molecular-ion check', access: reader('search'), body: IdentifyBody, response: json('Candidates ranked by similarity (0–100)', IdentifyResponseSchema) },
  { method: 'POST', path: '/api/v1/identify/batch', tag: 'identify', summary: 'Starts a batch identify job (JSON spectra, or a multipart `file`: multi-block JCAMP-DX or CSV with one spectrum per block)', access: reader('search'), body: batchBody(1000), response: json('`{ job }`, processed in the background', z.object({ job: BatchJobSchema }), 202) },
  { method: 'GET', path: '/api/v1/identify/batch', tag: 'identify', summary: "The caller's recent batch jobs", access: reader('search'), response: json('`{ jobs }`', z.object({ jobs: z.array(BatchJobSchema) })) },
  { method: 'GET', path: '/api/v1/identify/batch/:id', tag: 'identify', summary: 'Status and results of a batch job (best candidate and top 5 per unknown)', access: reader('search'), response: json('`{ job, results }`', BatchJobAnswerSchema) },
  { method: 'GET', path: '/api/v1/identify/batch/:id/csv', tag: 'identify', summary: 'Batch results as CSV, one row per unknown and rank', access: reader('search'), response: { status: 200, description: 'CSV file', contentType: 'text/csv' } },
  { method: 'GET', path: '/api/v1/formulas/:formula', tag: 'formulas', summary: 'Masses, RDBE and isotope cluster of a formula', access: reader('search'), response: json('Formula facts', FormulaAnswerSchema) },
  { method: 'POST', path: '/api/v1/readings', tag: 'formulas', summary: 'Molecular-ion check of a spectrum', access: reader('search'), body: ReadingBody, response: json('`{ reading }`', z.object({ reading: ReadingSchema })) },

  { method: 'POST', path: '/api/v1/access-keys', tag: 'access keys', summary: 'Creates an access key (shown once)', access: reader(), body: CreateAccessKeyBody, response: json('The key and its secret', CreatedAccessKeySchema, 201) },
  { method: 'GET', path: '/api/v1/access-keys', tag: 'access keys', summary: "The caller's keys; admins: ?all=true", access: reader(), query: ListAccessKeysQuery, response: json('`{ keys }`', z.object({ keys: z.array(AccessKeyViewSchema) })) },
  { method: 'DELETE', path: '/api/v1/access-keys/:id', tag: 'access keys', summary: 'Revokes a key (owner or admin)', access: reader(), response: json('`{ key }`', z.object({ key: AccessKeyViewSchema })) },

  { method: 'GET', path: '/api/v1/entries', tag: 'library', summary: 'Lists entries with filters and cursor paging', access: reader('library:read'), query: ListEntriesQuery, response: json('`{ entries, nextCursor }`') },
  { method: 'POST', path: '/api/v1/entries', tag: 'curation', summary: 'Creates an entry with a draft r1', access: contributor('submit'), body: RevisionContentSchema, response: json('`{ revision }`', undefined, 201) },
  { method: 'GET', path: '/api/v1/entries.csv', tag: 'library', summary: 'The entry list as CSV', access: reader(), query: ListEntriesQuery, response: { status: 200, description: 'CSV file', contentType: 'text/csv' } },
  { method: 'GET', path: '/api/v1/entries/:accession', tag: 'library', summary: 'An entry with its current (or ?revision=N) revision', access: reader('library:read'), query: RevisionQuery, response: json('`{ entry }`') },
  { method: 'GET', path: '/api/v1/entries/:accession/revisions', tag: 'library', summary: "An entry's revisions", access: reader('library:read'), response: json('`{ accession, revisions }`') },
  { method: 'GET', path: '/api/v1/entries/:accession/jcamp', tag: 'library', summary: 'A revision as JCAMP-DX', access: reader('library:read'), query: RevisionQuery, response: file('JCAMP-DX file') },
  { method: 'POST', path: '/api/v1/entries/:accession/revisions', tag: 'curation', summary: 'Starts a new draft revision', access: contributor(), body: NewRevisionBody, response: json('`{ revision }`', undefined, 201) },
  { method: 'POST', path: '/api/v1/entries/:accession/withdraw', tag: 'curation', summary: 'Withdraws (retires) an entry', access: curator, body: WithdrawBody, response: json('`{ entry }`') },
  { method: 'GET', path: '/api/v1/revisions/:id', tag: 'library', summary: 'One revision', access: reader('library:read'), response: json('`{ revision }`') },
  { method: 'PATCH', path: '/api/v1/revisions/:id', tag: 'curation', summary: 'Edits a draft (author)', access: contributor('submit'), body: RevisionPatchSchema, response: json('`{ revision }`') },
  { method: 'POST', path: '/api/v1/revisions/:id/submit', tag: 'curation', summary: 'Sends a draft for review', access: contributor('submit'), body: LockVersionBody, response: json('`{ revision }`') },
  { method: 'POST', path: '/api/v1/revisions/:id/decision', tag: 'curation', summary: 'Publishes or returns a revision in review', access: curator, body: DecisionBody, response: json('`{ revision }`') },
  { method: 'GET', path: '/api/v1/revisions/:id/comments', tag: 'curation', summary: 'Review comments of a revision', access: reader(), response: json('`{ comments }`') },
  { method: 'POST', path: '/api/v1/revisions/:id/comments', tag: 'curation', summary: 'Adds a review comment', access: contributor(), body: CommentBody, response: json('`{ comment }`', undefined, 201) },
  { method: 'GET', path: '/api/v1/review-queue', tag: 'curation', summary: 'The review desk queue', access: curator, query: ReviewQueueQuery, response: json('`{ items, counts }`') },
  { method: 'GET', path: '/api/v1/my/revisions', tag: 'curation', summary: "The caller's open revisions", access: contributor(), response: json('`{ items }`') },
  { method: 'POST', path: '/api/v1/structure-search', tag: 'library', summary: 'Entries by substructure', access: reader(), response: json('Matching entries') },
  { method: 'GET', path: '/api/v1/overview', tag: 'library', summary: 'Figures of the library for the overview charts', access: reader(), response: json('Overview figures') },
  { method: 'GET', path: '/api/v1/editions', tag: 'editions', summary: 'Frozen editions, newest first', access: reader('library:read'), response: json('`{ editions }`') },
  { method: 'POST', path: '/api/v1/editions', tag: 'editions', summary: 'Freezes a new edition', access: curator, body: EditionBody, response: json('`{ edition }`', undefined, 201) },
  { method: 'GET', path: '/api/v1/editions/:label', tag: 'editions', summary: 'An edition and its difference from the previous one', access: reader('library:read'), response: json('`{ edition, previous, diff }`') },
  { method: 'GET', path: '/api/v1/editions/:label/jcamp', tag: 'editions', summary: 'An edition as multi-block JCAMP-DX', access: reader('library:read'), response: file('JCAMP-DX file') },
  { method: 'GET', path: '/api/v1/editions/:label/csv', tag: 'editions', summary: 'An edition as CSV', access: reader('library:read'), response: { status: 200, description: 'CSV file', contentType: 'text/csv' } },
  { method: 'POST', path: '/api/v1/uploads/spectra', tag: 'curation', summary: 'Reads an uploaded spectrum file (multipart `file`)', access: contributor(), bodyType: 'multipart', response: json('`{ fileName, format, blocks }`') },
  { method: 'POST', path: '/api/v1/structures/preview', tag: 'curation', summary: 'Depicts a structure and gives its formula', access: reader(), response: json('`{ svg, formula, nominalMass }`') },
  { method: 'POST', path: '/api/v1/imports', tag: 'curation', summary: 'Imports a multi-block JCAMP-DX file (multipart `file`)', access: curator, bodyType: 'multipart', response: json('`{ job }`', undefined, 202) },
  { method: 'GET', path: '/api/v1/imports/:id', tag: 'curation', summary: 'An import job and its results', access: curator, response: json('`{ job, results }`') },
  { method: 'GET', path: '/api/v1/admin/outbox', tag: 'admin', summary: 'The mail outbox', access: admin, response: json('`{ messages }`') },
  { method: 'GET', path: '/api/v1/audit', tag: 'admin', summary: 'The audit log', access: curator, response: json('`{ events, nextCursor }`') },
];
