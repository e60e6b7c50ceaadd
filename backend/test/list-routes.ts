import type { Express } from 'express';

interface Layer {
  rawPath?: unknown;
  route?: { path: string; methods: Record<string, boolean> };
  handle?: { stack?: Layer[] };
}

/**
 * Every route registered on the app, as "METHOD /full/path". Walks Express 5's router stack itself:
 * express-list-endpoints loses the mount paths of nested routers under Express 5.
 */
export function listRoutes(app: Express): string[] {
  const out = new Set<string>();
  const walk = (stack: Layer[], prefix: string) => {
    for (const layer of stack) {
      if (layer.route) {
        for (const [method, on] of Object.entries(layer.route.methods)) {
          if (on && method !== '_all') out.add(`${method.toUpperCase()} ${(prefix + layer.route.path).replace(/\/$/, '') || '/'}`);
        }
      } else if (layer.handle?.stack) {
        const mount = typeof layer.rawPath === 'string' && layer.rawPath !== '/' ? layer.rawPath : '';
        walk(layer.handle.stack, prefix + mount);
      }
    }
  };
  walk((app as unknown as { router: { stack: Layer[] } }).router.stack, '');
  // The SPA fallback serves the front end, not the API.
  return [...out].filter((r) => r.includes(' /api')).sort();
}
