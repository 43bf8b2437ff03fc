import { describe, expect, it, vi } from 'vitest';
import { z } from 'zod';
import { installFakeFetch, json } from '../testing/fake-fetch';
import { apiClient, setUnauthenticatedHandler } from './api-client';
import { ApiError } from './api-error';

const statusSchema = z.object({ status: z.literal('ok') });

async function failureOf(pending: Promise<unknown>): Promise<ApiError> {
  const error: unknown = await pending.then(
    () => null,
    (reason: unknown) => reason,
  );
  if (!(error instanceof ApiError)) throw new Error(`expected an ApiError, got ${String(error)}`);
  return error;
}

describe('apiClient', () => {
  it('when a GET succeeds, sends the cookie, asks for JSON and returns the parsed body', async () => {
    const network = installFakeFetch({ 'GET /api/health': json({ status: 'ok', database: 'up' }) });

    await expect(apiClient.get('/api/health', statusSchema)).resolves.toEqual({ status: 'ok' });
    const [request] = network.made('GET', '/api/health');
    expect(request?.credentials).toBe('include');
    expect(request?.headers.get('Accept')).toBe('application/json');
    expect(request?.headers.get('X-Requested-With')).toBeNull();
  });

  it('when the answer has the error shape, throws ApiError with its status, code, message and details', async () => {
    installFakeFetch({
      'PATCH /api/v1/admin/users/u1': {
        status: 400,
        body: { error: { code: 'VALIDATION', message: 'Bad role.', details: [{ path: ['role'] }] } },
      },
    });

    const error = await failureOf(apiClient.patch('/api/v1/admin/users/u1', statusSchema, { body: { role: 'x' } }));
    expect([error.status, error.code, error.message]).toEqual([400, 'VALIDATION', 'Bad role.']);
    expect(error.details).toEqual([{ path: ['role'] }]);
  });

  it('when an error answer is not JSON, still throws ApiError naming the status', async () => {
    installFakeFetch({ 'GET /api/health': { status: 502 } });

    const error = await failureOf(apiClient.get('/api/health', statusSchema));
    expect([error.status, error.code]).toEqual([502, 'HTTP_ERROR']);
    expect(error.message).toContain('502');
  });

  it('when a 200 body does not match the schema, throws BAD_RESPONSE instead of passing it on', async () => {
    installFakeFetch({ 'GET /api/health': json({ status: 'degraded' }) });

    expect((await failureOf(apiClient.get('/api/health', statusSchema))).code).toBe('BAD_RESPONSE');
  });

  it('when the network fails, throws NETWORK with status 0', async () => {
    const original = globalThis.fetch;
    globalThis.fetch = () => Promise.reject(new TypeError('Failed to fetch'));
    try {
      const error = await failureOf(apiClient.get('/api/health', statusSchema));
      expect([error.status, error.code]).toEqual([0, 'NETWORK']);
    } finally {
      globalThis.fetch = original;
    }
  });

  it('when the answer is 401, calls the sign-in handler once and throws UNAUTHENTICATED', async () => {
    installFakeFetch({ 'GET /api/v1/me': { status: 401, body: { error: { code: 'UNAUTHENTICATED', message: 'Sign in.' } } } });
    const handler = vi.fn();
    const disconnect = setUnauthenticatedHandler(handler);
    try {
      expect((await failureOf(apiClient.get('/api/v1/me', statusSchema))).code).toBe('UNAUTHENTICATED');
      expect(handler).toHaveBeenCalledTimes(1);
    } finally {
      disconnect();
    }
  });
});
