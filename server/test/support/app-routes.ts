import type { INestApplication } from '@nestjs/common';

type RouterLayer = { route?: { path: string | string[]; methods: Record<string, boolean> } };

/** `/api/orders/:orderId/releases` and `/api/orders/:id/releases` are the same route. */
export function normalisePath(path: string): string {
  return path.replace(/:[A-Za-z_][A-Za-z0-9_]*/g, ':param');
}

/** `POST /api/orders/:param/verify`. */
export const routeKey = (method: string, path: string): string => `${method.toUpperCase()} ${normalisePath(path)}`;

/**
 * Every route the running app answers, read from the Express 5 router Nest registered them on
 * (so routes added in any controller show up without anyone listing them by hand).
 */
export function appRoutes(app: INestApplication): string[] {
  const express = app.getHttpAdapter().getInstance() as { router: { stack: RouterLayer[] } };
  const keys = new Set<string>();
  for (const layer of express.router.stack) {
    if (!layer.route) continue;
    const paths = Array.isArray(layer.route.path) ? layer.route.path : [layer.route.path];
    for (const method of Object.keys(layer.route.methods)) {
      if (method === '_all') continue;
      for (const path of paths) keys.add(routeKey(method, path));
    }
  }
  return [...keys].sort();
}
