/**
 * The server-render bundle (Vite builds it into dist/render; server/render/ loads it): draws the
 * first screen of the pages in SERVER_PAGES as HTML, so a first visit shows content before the
 * JavaScript has run, and hands the browser the state to hydrate from (src/main.tsx). Every page
 * gets the session in that state, so no first visit waits for `GET /api/auth/session`.
 */
import { StrictMode, type ReactNode } from 'react';
import { renderToPipeableStream } from 'react-dom/server';
import { createStaticHandler, createStaticRouter, matchRoutes, StaticRouterProvider } from 'react-router';
import { dehydrate, type QueryClient } from '@tanstack/react-query';
import { Writable } from 'node:stream';
import type { PageReads, RenderPage } from '../shared/page-render';
import { meQuery } from './lib/api/auth';
import { recipeListQuery } from './lib/api/recipes';
import { isRecipeSort } from './features/recipes/api/list-recipes';
import type { User, UserRole } from './lib/user';
import { hasRole, PAGE_ROLES } from './app/access';
import { AppProvider, createQueryClient } from './app/provider';
import { pageStateJson, localTimeZone } from './app/page-state';
import { routes } from './app/router';

interface ServerPage {
  /** who sees the page itself (others get a redirect or a refusal, drawn in the browser) */
  roles: readonly UserRole[] | null;
  /** the reads the page's first screen shows, put in the query cache as the browser would ask them */
  prefetch?: (client: QueryClient, search: URLSearchParams, reads: PageReads) => Promise<void>;
}

/** The pages drawn on the server, by route id (src/app/router.tsx); every other page is drawn in the browser. */
const SERVER_PAGES: Record<string, ServerPage> = {
  kitchen: { roles: null },
  'recipe-book': {
    roles: PAGE_ROLES.recipeBook,
    // as RecipeBookPage reads its address: the search as typed (trimmed by the query), the sort when known
    prefetch: async (client, search, reads) => {
      const q = (search.get('q') ?? '').trim();
      const sortParam = search.get('sort');
      const sort = isRecipeSort(sortParam) ? sortParam : 'updated';
      const { queryKey } = recipeListQuery(q, sort);
      client.setQueryData(queryKey, await reads.recipes(q, sort));
    },
  },
};

const RENDER_TIMEOUT_MS = 3000;

/** A signed-out page is the same for every visitor: drawn once per address (the state is still made per request). */
const signedOutPages = new Map<string, string>();
const SIGNED_OUT_PAGES_KEPT = 100;

function serverPageFor(pathname: string, user: User | null): string | null {
  const leaf = matchRoutes(routes, pathname)?.at(-1)?.route.id;
  const page = leaf ? SERVER_PAGES[leaf] : undefined;
  if (!leaf || !page) return null;
  if (page.roles && !hasRole(user, page.roles)) return null;
  return leaf;
}

/** The whole tree, Suspense boundaries included (the rewrite panel loads lazily), as one string; any error rejects. */
function renderToHtml(element: ReactNode): Promise<string> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    let failure: unknown = null;
    const sink = new Writable({
      write(chunk: Buffer | string, _encoding, done) {
        chunks.push(Buffer.from(chunk));
        done();
      },
    });
    sink.on('finish', () => {
      clearTimeout(timer);
      if (failure) reject(failure instanceof Error ? failure : new Error(String(failure)));
      else resolve(Buffer.concat(chunks).toString('utf8'));
    });
    const stream = renderToPipeableStream(element, {
      onAllReady: () => stream.pipe(sink),
      onShellError: reject,
      // an error inside a Suspense boundary would leave it to the browser: refuse the whole page instead
      onError: (error) => {
        failure ??= error;
      },
    });
    const timer = setTimeout(() => stream.abort(new Error(`server render took over ${RENDER_TIMEOUT_MS} ms`)), RENDER_TIMEOUT_MS);
  });
}

async function drawPage(address: URL, client: QueryClient): Promise<string> {
  const handler = createStaticHandler(routes);
  const context = await handler.query(new Request(address));
  if (context instanceof Response) throw new Error(`the static handler answered ${context.status} for ${address.pathname}`);
  const router = createStaticRouter(handler.dataRoutes, context);
  return renderToHtml(
    <StrictMode>
      <AppProvider queryClient={client}>
        <StaticRouterProvider router={router} context={context} hydrate={false} />
      </AppProvider>
    </StrictMode>,
  );
}

export const renderPage: RenderPage = async ({ url, user, reads }) => {
  const client = createQueryClient();
  client.setQueryData(meQuery.queryKey, user);
  const address = new URL(url, 'http://localhost');
  const rendered = serverPageFor(address.pathname, user);
  let html: string | null = null;
  if (rendered) {
    const page = SERVER_PAGES[rendered];
    const key = `${address.pathname}${address.search}`;
    const reusable = user === null && !page.prefetch;
    html = (reusable && signedOutPages.get(key)) || null;
    if (html === null) {
      await page.prefetch?.(client, address.searchParams, reads);
      html = await drawPage(address, client);
      if (reusable && signedOutPages.size < SIGNED_OUT_PAGES_KEPT) signedOutPages.set(key, html);
    }
  }
  const state = pageStateJson({ rendered: html === null ? null : rendered, timeZone: localTimeZone(), queries: dehydrate(client) });
  return { html, state };
};
