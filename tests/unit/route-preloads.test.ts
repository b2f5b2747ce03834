import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { ROUTE_MODULES, routeModuleFor } from '../../server/lib/client-shell';

/** `path: 'x', lazy: () => import('./routes/y')` pairs as src/app/router.tsx writes them, nesting resolved. */
function routerRoutes(): [string, string][] {
  const source = readFileSync('src/app/router.tsx', 'utf8');
  const found: [string, string][] = [];
  const re = /(?:\{\s*(index: true)|path: '([^']+)')[^{}]*?lazy: \(\) => import\('\.\/routes\/([a-z-]+)'\)/g;
  for (const m of source.matchAll(re)) found.push([m[1] ? '' : m[2], m[3]]);
  return found;
}

describe('page preloads', () => {
  it('lists every lazy route of the client router', () => {
    const routes = routerRoutes();
    expect(routes.length).toBeGreaterThan(15);
    const listed = new Set(ROUTE_MODULES.map(([, module]) => module));
    for (const [, module] of routes) expect(listed, module).toContain(module);
    for (const module of listed)
      expect(
        routes.map(([, m]) => m),
        module,
      ).toContain(module);
  });

  it('matches page paths to route modules, most specific shape first', () => {
    expect(routeModuleFor('/')).toBe('kitchen');
    expect(routeModuleFor('/recipes')).toBe('recipe-book');
    expect(routeModuleFor('/recipes/12')).toBe('recipe-detail');
    expect(routeModuleFor('/recipes/12/compare')).toBe('recipe-compare');
    expect(routeModuleFor('/recipes/12/versions/3/prep')).toBe('prep');
    expect(routeModuleFor('/clients/4/versions/9/2')).toBe('client-version');
    expect(routeModuleFor('/admin/outbox')).toBe('outbox');
    expect(routeModuleFor('/nowhere/at/all')).toBeNull();
  });
});
