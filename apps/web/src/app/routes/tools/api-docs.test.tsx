import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { meReply } from '../../../testing/factories';
import { installFakeFetch, json } from '../../../testing/fake-fetch';
import { renderApp } from '../../../testing/render-app';

const openapi = {
  openapi: '3.1.0',
  info: { title: 'Ionfolio REST API', version: '1.0.0' },
  components: {
    securitySchemes: { accessKey: { type: 'http', scheme: 'bearer' }, session: { type: 'apiKey', in: 'cookie', name: 'ionfolio.sid' } },
    schemas: {
      Peaks: { type: 'array', items: { type: 'array', prefixItems: [{ type: 'number' }, { type: 'number' }] }, minItems: 1 },
      IdentifyBody: { type: 'object', required: ['peaks'], properties: { peaks: { $ref: '#/components/schemas/Peaks' }, limit: { type: 'integer', default: 10 } } },
    },
  },
  paths: {
    '/api/v1/identify': {
      post: {
        summary: 'Identify an unknown spectrum',
        security: [{ accessKey: ['search'] }, { session: [] }],
        requestBody: { content: { 'application/json': { schema: { $ref: '#/components/schemas/IdentifyBody' } } } },
      },
    },
    '/api/v1/entries/{accession}': {
      get: {
        summary: 'One entry',
        security: [{ accessKey: ['library:read'] }, { session: [] }],
        parameters: [{ name: 'accession', in: 'path', required: true, schema: { type: 'string' } }],
      },
    },
    '/api/v1/access-keys': { get: { summary: 'Own keys', security: [{ session: [] }] } },
  },
};

describe('tools · API docs', () => {
  it('lists each route with method, path, scope, body schema and a curl example against this origin', async () => {
    installFakeFetch({ 'GET /api/v1/me': meReply('reader'), 'GET /api/v1/openapi.json': json(openapi) });
    renderApp('/tools/api');
    const identify = await screen.findByRole('article', { name: 'POST /api/v1/identify' });
    expect(within(identify).getByTestId('scope').textContent).toBe('access key with scope search');
    // The $ref is resolved for display.
    expect(identify.textContent).toContain('"prefixItems"');
    const curl = within(identify).getByTestId('curl').textContent ?? '';
    expect(curl).toContain(`curl -sS -X POST "${window.location.origin}/api/v1/identify"`);
    expect(curl).toContain('-H "Authorization: Bearer $IONFOLIO_KEY"');
    expect(curl).toContain('-H "Content-Type: application/json"');
    const body = JSON.parse(/-d '(.*)'$/s.exec(curl)?.[1] ?? 'null') as { peaks: number[][] };
    expect(body.peaks.some(([, intensity]) => (intensity ?? 0) > 0)).toBe(true);

    const entry = screen.getByRole('article', { name: 'GET /api/v1/entries/{accession}' });
    expect(within(entry).getByTestId('curl').textContent).toContain(`"${window.location.origin}/api/v1/entries/IF-000001"`);
    expect(within(entry).getByTestId('scope').textContent).toBe('access key with scope library:read');

    const keys = screen.getByRole('article', { name: 'GET /api/v1/access-keys' });
    expect(within(keys).getByTestId('scope').textContent).toContain('browser session only');
    expect(within(keys).queryByTestId('curl')).toBeNull();
  });
});
