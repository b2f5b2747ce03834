import type { ReactNode } from 'react';
import { Link, Navigate, Outlet, useLocation } from 'react-router';
import { buttonClasses } from '../components/ui/button';
import { Page } from '../components/ui/page';
import { LoadingState } from '../components/ui/spinner';
import { signInPathFor } from '../lib/safe-redirect';
import type { UserRole } from '../lib/user';
import { hasRole } from './access';
import { useAuth } from './auth-context';

/**
 * While the session is being checked, or couldn't be: never redirect on a guess.
 * The layout's banner carries the reason and the retry when the check failed.
 */
function SessionPending() {
  const auth = useAuth();
  if (auth.status === 'checking') return <LoadingState label="Checking your sign-in…" />;
  return (
    <Page width="narrow" title="Waiting to check your sign-in">
      <p className="text-ink-soft">This page is for signed-in members. It will open as soon as Hearthswap can confirm who you are.</p>
    </Page>
  );
}

/** Signed-out visitors go to sign in and come back; someone who just signed out here goes to the Kitchen. */
function SignedOutRedirect() {
  const auth = useAuth();
  const location = useLocation();
  if (auth.signedOutFrom === location.pathname) return <Navigate to="/" replace />;
  return <Navigate to={signInPathFor(location)} replace />;
}

/** Children (or the nested routes) only for signed-in people. */
export function RequireAuth({ children }: { children?: ReactNode }) {
  const auth = useAuth();
  if (auth.status === 'checking' || auth.status === 'unknown') return <SessionPending />;
  if (auth.status === 'signed-out') return <SignedOutRedirect />;
  return <>{children ?? <Outlet />}</>;
}

const ROLE_PLURALS: Record<UserRole, string> = { cook: 'home cooks', coach: 'coaches', admin: 'administrators' };

function roleList(roles: readonly UserRole[]): string {
  const names = roles.map((role) => ROLE_PLURALS[role]);
  return names.length <= 1 ? (names[0] ?? '') : `${names.slice(0, -1).join(', ')} and ${names[names.length - 1]}`;
}

export function ForbiddenPage({ roles }: { roles: readonly UserRole[] }) {
  return (
    <Page
      width="narrow"
      title="This page isn't part of your account"
      description={`It is for ${roleList(roles)}. You're signed in with a different kind of account, so there's nothing here for you to use.`}
    >
      <div>
        <Link to="/" className={buttonClasses({ variant: 'secondary' })}>
          Back to the Kitchen
        </Link>
      </div>
    </Page>
  );
}

/** Signed-in people with one of `roles`; signed-out people are sent to sign in first. */
export function RequireRole({ roles, children }: { roles: readonly UserRole[]; children?: ReactNode }) {
  const auth = useAuth();
  if (auth.status === 'checking' || auth.status === 'unknown') return <SessionPending />;
  if (auth.status === 'signed-out') return <SignedOutRedirect />;
  if (!hasRole(auth.user, roles)) return <ForbiddenPage roles={roles} />;
  return <>{children ?? <Outlet />}</>;
}
