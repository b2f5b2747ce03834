import { useEffect, useRef } from 'react';
import { Outlet, ScrollRestoration, useLocation, useNavigation } from 'react-router';
import { Alert } from '../../components/ui/alert';
import { Button } from '../../components/ui/button';
import { errorMessage } from '../../lib/api-client';
import { useAuth } from '../auth-context';
import { AppFooter } from './app-footer';
import { AppHeader } from './app-header';

function NavigationProgress() {
  const navigation = useNavigation();
  if (navigation.state === 'idle') return null;
  return (
    <div role="progressbar" aria-label="Loading page" className="fixed inset-x-0 top-0 z-50 h-1 overflow-hidden bg-ember-100">
      <div className="h-full w-1/3 animate-pulse rounded-pill bg-accent" />
    </div>
  );
}

/** Shown when the session can't be checked at all (server down, network gone). */
function SessionProblem() {
  const auth = useAuth();
  if (auth.status !== 'unknown') return null;
  return (
    <div className="mx-auto w-full max-w-shell px-gutter pt-4">
      <Alert
        tone="caution"
        title="Your sign-in couldn't be checked"
        action={
          <Button variant="secondary" size="sm" onClick={auth.recheck} loading={auth.rechecking} loadingLabel="Checking…">
            Try again
          </Button>
        }
      >
        {errorMessage(auth.error)}
      </Alert>
    </div>
  );
}

export function RootLayout() {
  const location = useLocation();
  const auth = useAuth();
  const { signedOutFrom, noteSignOut, status } = auth;

  // Once a signed-out person has left the page they signed out on, forget it: coming back
  // to a members-only page later should ask them to sign in again.
  useEffect(() => {
    if (signedOutFrom && status === 'signed-out' && location.pathname !== signedOutFrom) noteSignOut(null);
  }, [signedOutFrom, status, location.pathname, noteSignOut]);
  const mainRef = useRef<HTMLElement>(null);
  const firstPath = useRef(location.pathname);

  // After moving to another page, start keyboard and screen-reader users at its content.
  useEffect(() => {
    if (location.pathname === firstPath.current) return;
    firstPath.current = '';
    mainRef.current?.focus({ preventScroll: true });
  }, [location.pathname]);

  return (
    <div className="flex min-h-dvh flex-col">
      <a
        href="#main"
        className="sr-only z-50 rounded-pill bg-ink px-4 py-2 font-bold text-canvas focus:not-sr-only focus:fixed focus:top-2 focus:left-2 focus:shadow-pop"
      >
        Skip to main content
      </a>
      <NavigationProgress />
      <AppHeader />
      <SessionProblem />
      <main id="main" ref={mainRef} tabIndex={-1} className="mx-auto w-full max-w-shell flex-1 px-gutter py-section focus:outline-none">
        <Outlet />
      </main>
      <AppFooter />
      <ScrollRestoration />
    </div>
  );
}
