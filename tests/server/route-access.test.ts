import type { Router } from 'express';

import { apiRouter } from '@/server/app';
import { ACCESS } from '@/server/middleware/access';

interface Layer {
  route?: { path: string; methods: Record<string, boolean>; stack: { handle: unknown }[] };
  handle: Router & { stack?: Layer[] };
}

/** Every route of the API, with the access its first handler declares. */
function routesOf(router: Router): { route: string; access: unknown }[] {
  const found: { route: string; access: unknown }[] = [];
  for (const layer of (router as unknown as { stack: Layer[] }).stack) {
    if (layer.route) {
      const first = layer.route.stack[0]?.handle as Record<symbol, unknown> | undefined;
      found.push({
        route: `${Object.keys(layer.route.methods).join(',')} ${layer.route.path}`,
        access: first?.[ACCESS],
      });
    } else if (layer.handle.stack) {
      found.push(...routesOf(layer.handle));
    }
  }
  return found;
}

describe('every API route', () => {
  it('declares who may call it with allow(...) as its first handler', () => {
    const routes = routesOf(apiRouter());
    expect(routes.length).toBeGreaterThan(15);
    const undeclared = routes.filter((r) => r.access === undefined).map((r) => r.route);
    expect(undeclared).toEqual([]);
  });
});
