import { Router } from 'express';
import { buildOpenApiDocument } from './openapi-document';

/** Versioned with the API's CHANGELOG: bump when a tool author would notice a change. */
export const API_VERSION = '1.0.0';

/** Public: tool authors read it before they hold a key. Built once, at start. */
export function openapiRoutes(): Router {
  const r = Router();
  const document = buildOpenApiDocument(API_VERSION);
  r.get('/openapi.json', (_req, res) => {
    res.json(document);
  });
  return r;
}
