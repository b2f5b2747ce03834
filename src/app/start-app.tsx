/**
 * Starts the app in #root: hydrates the page the server drew when this browser's first render is
 * exactly that page (src/app/page-state.ts), otherwise draws it here, over the server's HTML if any.
 */
import { StrictMode } from 'react';
import { createRoot, hydrateRoot } from 'react-dom/client';
import { hydrate } from '@tanstack/react-query';
import { AppProvider, createQueryClient } from './provider';
import { AppRouter, createAppRouter, loadRoutesFor } from './router';
import { canHydrate } from './can-hydrate';
import type { PageState } from './page-state';

function sessionStore(): Storage | undefined {
  try {
    return window.sessionStorage;
  } catch {
    return undefined;
  }
}

export async function startApp(container: HTMLElement, state: PageState | null) {
  const queryClient = createQueryClient();
  // the session and the reads the server answered: no first request waits for them again
  if (state) hydrate(queryClient, state.queries);
  // The page's own code first, so the first render is the page, not the loading fallback over the server's HTML.
  if (state?.rendered) await loadRoutesFor(window.location.pathname);
  const app = (
    <StrictMode>
      <AppProvider queryClient={queryClient}>
        <AppRouter router={createAppRouter()} />
      </AppProvider>
    </StrictMode>
  );
  if (state && canHydrate(state, sessionStore())) hydrateRoot(container, app);
  else createRoot(container).render(app);
}
