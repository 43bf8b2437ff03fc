import type { Express } from 'express';
import type { RouteAccess } from '../../shared/require-role';

export interface MountedRoute {
  method: string;
  /** Express path from the root, e.g. `/api/v1/entries/:accession`. */
  path: string;
  /** What requireRole on this route asks, when the route uses it. */
  access: RouteAccess | undefined;
}

interface Layer {
  rawPath?: unknown;
  handle: { stack?: Layer[]; access?: RouteAccess };
  route?: { path: unknown; methods: Record<string, boolean>; stack: Layer[] };
}

const join = (prefix: string, path: string) => (prefix + (path === '/' ? '' : path)).replace(/\/+/g, '/') || '/';

/** Every route the Express app answers, found by walking its router stack (Express 5 / router 2 layers). */
export function mountedRoutes(app: Express): MountedRoute[] {
  const out: MountedRoute[] = [];
  const walk = (stack: Layer[], prefix: string) => {
    for (const layer of stack) {
      if (layer.route) {
        if (typeof layer.route.path !== 'string') continue;
        const access = layer.route.stack.map((l) => l.handle.access).find((a) => a !== undefined);
        for (const method of Object.keys(layer.route.methods)) {
          if (method === '_all') continue;
          out.push({ method: method.toUpperCase(), path: join(prefix, layer.route.path), access });
        }
      } else if (layer.handle.stack) {
        const mount = typeof layer.rawPath === 'string' ? layer.rawPath : '';
        walk(layer.handle.stack, join(prefix, mount));
      }
    }
  };
  walk((app as unknown as { router: { stack: Layer[] } }).router.stack, '');
  return out;
}
