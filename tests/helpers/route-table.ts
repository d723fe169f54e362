import type { Express } from 'express';

export interface RouteEntry {
  method: string;
  /** As declared, e.g. /api/designs/:id/versions/:number. */
  path: string;
}

interface Layer {
  rawPath?: string | string[];
  route?: { path: string | string[]; methods: Record<string, boolean> };
  handle?: { stack?: Layer[] };
}

/**
 * Every route the app declares, read from its router stack (Express 5's router keeps each
 * layer's declared path), so a new route is listed without anyone editing a list.
 */
export function routeTable(app: Express): RouteEntry[] {
  const routes: RouteEntry[] = [];
  const walk = (stack: Layer[], prefix: string) => {
    for (const layer of stack) {
      const paths = [layer.route?.path ?? layer.rawPath ?? ''].flat();
      for (const path of paths) {
        const at = prefix + (path === '/' && !layer.route ? '' : path);
        if (layer.route) for (const method of Object.keys(layer.route.methods)) routes.push({ method: method.toUpperCase(), path: at.replace(/(.)\/$/, '$1') });
        else if (layer.handle?.stack) walk(layer.handle.stack, at);
      }
    }
  };
  walk((app as unknown as { router: { stack: Layer[] } }).router.stack, '');
  return routes;
}
