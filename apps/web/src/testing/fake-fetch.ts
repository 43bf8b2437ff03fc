import { onTestFinished } from 'vitest';

/** One request as the fake network saw it. */
export type RecordedRequest = {
  method: string;
  path: string;
  url: URL;
  headers: Headers;
  credentials: RequestCredentials | undefined;
  body: unknown;
};

export type FakeReply = { status: number; body?: unknown };

type Responder = FakeReply | ((request: RecordedRequest) => FakeReply | Promise<FakeReply>);

/** Replies keyed by `"METHOD /path"` (query string ignored). */
export type FakeRoutes = Record<string, Responder>;

export function json(body: unknown, status = 200): FakeReply {
  return { status, body };
}

export function apiError(status: number, code: string, message: string, details?: unknown): FakeReply {
  return { status, body: { error: { code, message, ...(details === undefined ? {} : { details }) } } };
}

/**
 * Replaces `globalThis.fetch` for one test with a tiny server that answers per method and path, and
 * records every request. Anything not listed gets a JSON 404, so a surprise call is visible.
 */
export function installFakeFetch(routes: FakeRoutes) {
  const requests: RecordedRequest[] = [];
  const original = globalThis.fetch;

  globalThis.fetch = async (input: RequestInfo | URL, init?: RequestInit) => {
    const url = new URL(typeof input === 'string' ? input : input instanceof URL ? input.href : input.url, 'http://localhost');
    const method = (init?.method ?? 'GET').toUpperCase();
    const rawBody = typeof init?.body === 'string' ? init.body : undefined;
    const request: RecordedRequest = {
      method,
      path: url.pathname,
      url,
      headers: new Headers(init?.headers),
      credentials: init?.credentials,
      body: rawBody === undefined ? undefined : (JSON.parse(rawBody) as unknown),
    };
    requests.push(request);
    const responder = routes[`${method} ${url.pathname}`];
    const reply =
      responder === undefined
        ? apiError(404, 'NOT_FOUND', `No fake for ${method} ${url.pathname}`)
        : typeof responder === 'function'
          ? await responder(request)
          : responder;
    const hasBody = reply.body !== undefined && reply.status !== 204;
    return new Response(hasBody ? JSON.stringify(reply.body) : null, {
      status: reply.status,
      headers: hasBody ? { 'Content-Type': 'application/json' } : {},
    });
  };

  onTestFinished(() => {
    globalThis.fetch = original;
  });

  return {
    requests,
    /** The requests made to one method and path, in order. */
    made(method: string, path: string): RecordedRequest[] {
      return requests.filter((request) => request.method === method && request.path === path);
    },
  };
}
