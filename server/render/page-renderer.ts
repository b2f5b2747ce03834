/**
 * Pages drawn on the server: loads the server-render bundle (src/entry-server.tsx, built by Vite into
 * dist/render) and answers its reads with the same services as the API. Without the bundle (no build
 * yet, or a test's client folder) every page is the plain index.html, drawn in the browser.
 */
import { existsSync } from 'node:fs';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import type { PageReads, RenderedPage, RenderPage } from '../../shared/page-render';
import { listRecipes } from '../services/recipes';
import type { User } from '../services/users';

export const RENDER_ENTRY = 'entry-server.js';

/** As the API would answer: dates as ISO strings, undefined left out. */
function asJson<T>(value: T): T {
  return JSON.parse(JSON.stringify(value)) as T;
}

function readsFor(user: User | null): PageReads {
  return {
    recipes: async (q, sort) => {
      if (!user) throw new Error('the recipe book needs a signed-in cook');
      return asJson({ recipes: await listRecipes(user, { q, sort }) });
    },
  };
}

export function createPageRenderer(renderDir: string | null) {
  const entry = renderDir ? path.join(renderDir, RENDER_ENTRY) : null;
  let loading: Promise<RenderPage> | null = null;
  return {
    available: entry !== null && existsSync(entry),
    /** The page for `url` as `user` sees it; throws when the bundle is missing or the render fails. */
    render(url: string, user: User | null): Promise<RenderedPage> {
      if (!entry) throw new Error('no server-render bundle configured');
      loading ??= import(pathToFileURL(entry).href).then((m: { renderPage: RenderPage }) => m.renderPage);
      return loading.then((renderPage) => renderPage({ url, user: user?.toPublic() ?? null, reads: readsFor(user) }));
    },
  };
}
