import type { Role } from '../lib/roles';

/** One screen: where it lives, what the navigation calls it and the lowest role that may open it. */
export type Screen = {
  path: string;
  label: string;
  minRole: Role;
};

export const paths = {
  identify: { path: '/identify', label: 'Identify', minRole: 'reader' },
  batchIdentify: { path: '/identify/batch', label: 'Batch', minRole: 'reader' },
  library: { path: '/library', label: 'Library', minRole: 'reader' },
  entry: { path: '/entries/:accession', label: 'Entry', minRole: 'reader' },
  submit: { path: '/submit', label: 'Submit', minRole: 'contributor' },
  submitRevision: { path: '/submit/:revisionId', label: 'Edit revision', minRole: 'contributor' },
  review: { path: '/review', label: 'Review desk', minRole: 'curator' },
  reviewImport: { path: '/review/import', label: 'Bulk import', minRole: 'curator' },
  reviewRevision: { path: '/review/:revisionId', label: 'Revision under review', minRole: 'curator' },
  editions: { path: '/editions', label: 'Editions', minRole: 'reader' },
  edition: { path: '/editions/:label', label: 'Edition', minRole: 'reader' },
  overview: { path: '/overview', label: 'Overview', minRole: 'reader' },
  adminUsers: { path: '/admin/users', label: 'Users', minRole: 'admin' },
  adminKeys: { path: '/admin/keys', label: 'Access keys', minRole: 'admin' },
  adminOutbox: { path: '/admin/outbox', label: 'Outbox', minRole: 'admin' },
  adminAudit: { path: '/admin/audit', label: 'Audit log', minRole: 'curator' },
  signIn: { path: '/sign-in', label: 'Sign in', minRole: 'reader' },
  tools: { path: '/tools', label: 'Tools', minRole: 'reader' },
  toolsKeys: { path: '/tools/keys', label: 'Access keys', minRole: 'reader' },
  toolsIsotopes: { path: '/tools/isotopes', label: 'Isotope calculator', minRole: 'reader' },
  toolsApi: { path: '/tools/api', label: 'API for tools', minRole: 'reader' },
} as const satisfies Record<string, Screen>;

/** The header navigation, in order; `Admin` opens the users page, the admin pages link to each other. */
export const mainNavigation: readonly Screen[] = [
  paths.identify,
  paths.batchIdentify,
  paths.library,
  paths.editions,
  paths.overview,
  paths.submit,
  paths.review,
  paths.tools,
  { ...paths.adminUsers, label: 'Admin' },
];

/** The tabs of the Tools section, open to every signed-in role. */
export const toolsNavigation: readonly Screen[] = [paths.toolsKeys, paths.toolsIsotopes, paths.toolsApi];

/**
 * The identify page set up with a query: `from` loads that entry's published spectrum, `exclude` leaves
 * an accession out of the candidates, `peaks` (m/z:intensity pairs) and `name` carry an unknown over.
 */
export function identifyHref(query: { from?: string; exclude?: string; peaks?: string; name?: string }): string {
  const params = new URLSearchParams();
  for (const key of ['from', 'exclude', 'peaks', 'name'] as const) {
    const value = query[key];
    if (value) params.set(key, value);
  }
  const text = params.toString();
  return text ? `${paths.identify.path}?${text}` : paths.identify.path;
}

export const adminNavigation: readonly Screen[] = [
  paths.adminUsers,
  paths.adminKeys,
  paths.adminOutbox,
  paths.adminAudit,
];

/** The page an entry lives on, e.g. `/entries/IF-000123`. */
export function entryHref(accession: string): string {
  return `/entries/${encodeURIComponent(accession)}`;
}

/** One past or current revision of an entry, e.g. `/entries/IF-000123?revision=2`. */
export function entryRevisionHref(accession: string, revision: number): string {
  return `${entryHref(accession)}?revision=${revision}`;
}

/** The submit form for one of one's own open revisions. */
export function submitRevisionHref(revisionId: string): string {
  return `/submit/${encodeURIComponent(revisionId)}`;
}

/** A revision on the review desk. */
export function reviewRevisionHref(revisionId: string): string {
  return `/review/${encodeURIComponent(revisionId)}`;
}

/** One edition's page, e.g. `/editions/2026.12`. */
export function editionHref(label: string): string {
  return `/editions/${encodeURIComponent(label)}`;
}

/** The sign-in page, remembering where to come back to (only same-site paths are kept). */
export function signInHref(returnTo?: string, error?: string): string {
  const params = new URLSearchParams();
  if (returnTo && isSafeReturnTo(returnTo) && !returnTo.startsWith(paths.signIn.path)) {
    params.set('returnTo', returnTo);
  }
  if (error) params.set('error', error);
  const query = params.toString();
  return query ? `${paths.signIn.path}?${query}` : paths.signIn.path;
}

/** The GitHub sign-in start; a full-page navigation, since the provider redirects back to the API. */
export function githubSignInHref(returnTo: string | null): string {
  const safe = returnTo && isSafeReturnTo(returnTo) ? returnTo : paths.identify.path;
  return `/auth/github?returnTo=${encodeURIComponent(safe)}`;
}

/** A return path must stay on this site: one leading slash, no protocol-relative `//host`. */
export function isSafeReturnTo(value: string): boolean {
  return value.startsWith('/') && !value.startsWith('//') && !value.startsWith('/\\');
}
