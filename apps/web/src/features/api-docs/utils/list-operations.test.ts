import { describe, expect, it } from 'vitest';
import type { OpenApiDocument } from '../api/get-openapi';
import { curlFor, listOperations } from './list-operations';

const document: OpenApiDocument = {
  openapi: '3.1.0',
  info: { title: 'Ionfolio', version: '1' },
  components: { securitySchemes: { bearer: { type: 'http', scheme: 'bearer' } } },
  paths: {
    '/api/v1/identify/batch/{id}': { get: { security: [{ bearer: ['search'] }] } },
    '/api/v1/notes': {
      post: {
        requestBody: {
          content: {
            'application/json': {
              schema: { type: 'object', required: ['text', 'count'], properties: { text: { type: 'string', example: "it's" }, count: { type: 'integer', minimum: 3 }, extra: { type: 'string' } } },
            },
          },
        },
      },
    },
    '/api/v1/health': { get: { security: [] } },
  },
};

describe('listOperations', () => {
  it('turns unknown path values into shell variables inside a double-quoted URL', () => {
    const batch = listOperations(document, 'https://lab.example.test').find((op) => op.path === '/api/v1/identify/batch/{id}');
    expect(batch?.curl).toBe('curl -sS "https://lab.example.test/api/v1/identify/batch/$ID" \\\n  -H "Authorization: Bearer $IONFOLIO_KEY"');
    expect(batch?.scopes).toEqual(['search']);
  });

  it('builds a body from required properties only and quotes a single quote for the shell', () => {
    const notes = listOperations(document, 'http://x').find((op) => op.path === '/api/v1/notes');
    expect(notes?.curl).toContain(`-d '{"text":"it'\\''s","count":3}'`);
  });

  it('marks a route without security requirements as public', () => {
    expect(listOperations(document, 'http://x').find((op) => op.path === '/api/v1/health')?.access).toBe('public');
  });

  it('sends a multipart body as a file field', () => {
    expect(curlFor({ method: 'POST', bodyType: 'multipart' }, 'http://x/a', null)).toContain('-F "file=@unknowns.jdx"');
  });
});
