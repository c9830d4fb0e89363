import type { Express } from 'express';

interface Layer {
  rawPath?: string | string[];
  route?: { path: string; methods: Record<string, boolean> };
  handle: { stack?: Layer[] };
}

/**
 * Every route the app answers, as 'METHOD /api/path/:param', read from Express's own router
 * (router 2 keeps each layer's path as `rawPath`). The access matrix and the fuzz run check
 * against it, so that a route added without a case in them fails the tests.
 */
export function routeList(app: Express): string[] {
  const found = new Set<string>();
  const walk = (stack: Layer[], prefix: string) => {
    for (const layer of stack) {
      const path = typeof layer.rawPath === 'string' ? layer.rawPath : '';
      if (layer.route) {
        for (const [method, on] of Object.entries(layer.route.methods)) {
          if (on && method !== '_all') found.add(`${method.toUpperCase()} ${`${prefix}${layer.route.path}`.replace(/\/$/, '') || '/'}`);
        }
      } else if (layer.handle.stack) {
        walk(layer.handle.stack, `${prefix}${path === '/' ? '' : path}`);
      }
    }
  };
  walk((app as unknown as { router: { stack: Layer[] } }).router.stack, '');
  return [...found].sort();
}
