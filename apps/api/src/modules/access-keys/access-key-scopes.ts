/**
 * What an access key may be used for. `search`: identify, batch, readings, formula tools;
 * `library:read`: reading entries, revisions, editions and JCAMP-DX exports; `submit`: creating and
 * editing drafts and sending them for review.
 */
export const ACCESS_KEY_SCOPES = ['search', 'library:read', 'submit'] as const;
export type AccessKeyScope = (typeof ACCESS_KEY_SCOPES)[number];

/** Scopes a reader may put on a key; anything else needs at least the contributor role. */
export const READ_SCOPES: readonly AccessKeyScope[] = ['search', 'library:read'];

/** The key that authenticated a request, as the access-key middleware puts it on `req.accessKey`. */
export interface RequestAccessKey {
  id: string;
  scopes: AccessKeyScope[];
}

declare global {
  // Express's request type is a global namespace; augmenting it is the documented way.
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface Request {
      /** Set only for requests authenticated with `Authorization: Bearer ifk_…`. */
      accessKey?: RequestAccessKey;
    }
  }
}
