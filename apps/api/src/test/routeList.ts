import type { Express } from 'express';

interface Layer {
  rawPath?: string | string[];
  method?: string;
  route?: { path: string; methods: Record<string, boolean>; stack: Layer[] };
  handle: { stack?: Layer[] };
}

/** Each route as 'METHOD /api/path/:param', with the functions that answer it, in router order. */
function routeHandlers(app: Express): Map<string, Array<(...args: never[]) => unknown>> {
  const found = new Map<string, Array<(...args: never[]) => unknown>>();
  const walk = (stack: Layer[], prefix: string) => {
    for (const layer of stack) {
      const path = typeof layer.rawPath === 'string' ? layer.rawPath : '';
      if (layer.route) {
        for (const [method, on] of Object.entries(layer.route.methods)) {
          if (!on || method === '_all') continue;
          const name = `${method.toUpperCase()} ${`${prefix}${layer.route.path}`.replace(/\/$/, '') || '/'}`;
          const handlers = layer.route.stack
            .filter((l) => l.method === undefined || l.method === method)
            .map((l) => l.handle as never);
          found.set(name, [...(found.get(name) ?? []), ...handlers]);
        }
      } else if (layer.handle.stack) {
        walk(layer.handle.stack, `${prefix}${path === '/' ? '' : path}`);
      }
    }
  };
  walk((app as unknown as { router: { stack: Layer[] } }).router.stack, '');
  return found;
}

/**
 * Every route the app answers, as 'METHOD /api/path/:param', read from Express's own router
 * (router 2 keeps each layer's path as `rawPath`). The access matrix and the fuzz run check
 * against it, so that a route added without a case in them fails the tests.
 */
export function routeList(app: Express): string[] {
  return [...routeHandlers(app).keys()].sort();
}

/**
 * The routes whose handlers read `req.query`, found in the handlers' own source text, so that a
 * new filter is fuzzed without anyone remembering to add it. (A handler that destructures
 * `{ query }` from its request would be missed: read it as `req.query`.)
 */
export function routesReadingQuery(app: Express): string[] {
  return [...routeHandlers(app)]
    .filter(([, handlers]) => handlers.some((h) => /\breq\.query\b/.test(String(h))))
    .map(([name]) => name)
    .sort();
}
