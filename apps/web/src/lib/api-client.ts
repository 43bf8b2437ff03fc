import type { z } from 'zod';
import { ApiError, apiErrorBodySchema } from './api-error';
import { signInHref } from '../config/paths';

type UnauthenticatedHandler = () => void;

function goToSignInPage(): void {
  const here = `${window.location.pathname}${window.location.search}`;
  window.location.assign(signInHref(here));
}

let unauthenticatedHandler: UnauthenticatedHandler = goToSignInPage;

/**
 * Replaces what happens on a 401 (the router installs a client-side navigation); returns a function
 * that puts the full-page redirect back.
 */
export function setUnauthenticatedHandler(handler: UnauthenticatedHandler): () => void {
  unauthenticatedHandler = handler;
  return () => {
    if (unauthenticatedHandler === handler) unauthenticatedHandler = goToSignInPage;
  };
}

type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';

type RequestOptions = {
  body?: unknown;
  /** A multipart body (file uploads); the browser sets its Content-Type with the boundary. */
  form?: FormData;
  signal?: AbortSignal | undefined;
};

async function readJson(response: Response): Promise<unknown> {
  const text = await response.text();
  if (text === '') return undefined;
  try {
    return JSON.parse(text) as unknown;
  } catch {
    return undefined;
  }
}

function errorFrom(response: Response, body: unknown): ApiError {
  const parsed = apiErrorBodySchema.safeParse(body);
  if (parsed.success) {
    const { code, message, details } = parsed.data.error;
    return new ApiError(response.status, code, message, details);
  }
  return new ApiError(
    response.status,
    'HTTP_ERROR',
    `The server answered ${response.status}${response.statusText ? ` ${response.statusText}` : ''}.`,
  );
}

async function request(method: Method, url: string, options: RequestOptions): Promise<unknown> {
  const headers: Record<string, string> = { Accept: 'application/json' };
  if (method !== 'GET') {
    // The API requires X-Requested-With on cookie-authenticated writes (a CSRF guard): a cross-site form
    // cannot set it. JSON writes also name their type; a multipart body must leave it to the browser.
    if (options.form === undefined) headers['Content-Type'] = 'application/json';
    headers['X-Requested-With'] = 'ionfolio';
  }
  let response: Response;
  try {
    response = await fetch(url, {
      method,
      headers,
      credentials: 'include',
      body: options.form ?? (options.body === undefined ? null : JSON.stringify(options.body)),
      signal: options.signal ?? null,
    });
  } catch (cause) {
    if (cause instanceof DOMException && cause.name === 'AbortError') throw cause;
    throw new ApiError(0, 'NETWORK', 'Could not reach the Ionfolio server. Check the connection and try again.');
  }
  const body = await readJson(response);
  if (response.status === 401) {
    unauthenticatedHandler();
  }
  if (!response.ok) throw errorFrom(response, body);
  return body;
}

async function parsed<S extends z.ZodType>(schema: S, pending: Promise<unknown>): Promise<z.infer<S>> {
  const body = await pending;
  const result = schema.safeParse(body);
  if (!result.success) {
    throw new ApiError(200, 'BAD_RESPONSE', 'The server sent an answer this page does not understand.', result.error.issues);
  }
  return result.data;
}

/**
 * The one HTTP client of the web app: JSON in and out, the session cookie always sent, error bodies
 * turned into {@link ApiError}, every answer checked against a zod schema, and a 401 sending the person
 * to the sign-in page.
 */
export const apiClient = {
  get<S extends z.ZodType>(url: string, schema: S, options: Omit<RequestOptions, 'body'> = {}) {
    return parsed(schema, request('GET', url, options));
  },
  post<S extends z.ZodType>(url: string, schema: S, options: RequestOptions = {}) {
    return parsed(schema, request('POST', url, options));
  },
  patch<S extends z.ZodType>(url: string, schema: S, options: RequestOptions = {}) {
    return parsed(schema, request('PATCH', url, options));
  },
  /** A multipart POST (a file upload), answered with JSON. */
  postForm<S extends z.ZodType>(url: string, schema: S, form: FormData, options: Omit<RequestOptions, 'body' | 'form'> = {}) {
    return parsed(schema, request('POST', url, { ...options, form }));
  },
  /** A write whose answer has no body (204). */
  async send(method: Exclude<Method, 'GET'>, url: string, options: RequestOptions = {}): Promise<void> {
    await request(method, url, options);
  },
};
