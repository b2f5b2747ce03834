import { formatLongDay } from '../../../lib/dates';
import { Link } from 'react-router';
import { Alert } from '../../../components/ui/alert';
import { Button, buttonClasses } from '../../../components/ui/button';
import { Card } from '../../../components/ui/card';
import { ErrorState } from '../../../components/ui/error-state';
import { LoadingState } from '../../../components/ui/spinner';
import { errorMessage, isApiError } from '../../../lib/api-client';
import type { User } from '../../../lib/user';
import { useAcceptInvitation, useInvitation } from '../api/invitation';

const CLOSED_TITLES: Record<string, string> = {
  invitation_used: 'This invitation has been used',
  invitation_expired: 'This invitation has expired',
  invitation_revoked: 'This invitation was withdrawn',
};

export interface InvitationPanelProps {
  token: string;
  /** null: signed out */
  user: User | null;
  /** sign-in and sign-up links that come back here */
  signInHref: string;
  signUpHref: string;
  onAccepted: (coachName: string) => void;
}

/** An invitation from a coach: who sent it, and the one step that fits the visitor. */
export function InvitationPanel({ token, user, signInHref, signUpHref, onAccepted }: InvitationPanelProps) {
  const invitation = useInvitation(token);
  const accept = useAcceptInvitation(token);

  if (invitation.isPending) return <LoadingState label="Opening the invitation…" />;
  if (invitation.isError) {
    const error = invitation.error;
    if (isApiError(error) && (error.status === 410 || error.status === 404 || error.status === 400)) {
      return (
        <Card title={CLOSED_TITLES[error.code] ?? 'This invitation link does not work'}>
          <div className="flex flex-col gap-4">
            <p className="text-ink-soft">
              {error.status === 410
                ? errorMessage(error)
                : 'The link may be incomplete; check that it was copied whole, or ask your coach to send a new invitation.'}
            </p>
            <div className="flex flex-wrap gap-2">
              <Link to={user?.role === 'cook' ? '/coach' : '/'} className={buttonClasses({ variant: 'secondary' })}>
                {user?.role === 'cook' ? 'Go to My coach' : 'Go to the Kitchen'}
              </Link>
            </div>
          </div>
        </Card>
      );
    }
    return <ErrorState title="The invitation didn't load" error={error} onRetry={() => void invitation.refetch()} retrying={invitation.isFetching} />;
  }

  const { coachName, email, expiresAt } = invitation.data;
  const expires = formatLongDay(expiresAt);
  const otherAddress = user && user.email.toLowerCase() !== email.toLowerCase();

  return (
    <Card>
      <div className="flex flex-col gap-5">
        <div className="flex items-center gap-4">
          <span aria-hidden="true" className="flex size-14 shrink-0 items-center justify-center rounded-pill bg-ember-100 text-2xl font-black text-ember-800">
            {coachName.trim().charAt(0).toUpperCase() || '?'}
          </span>
          <div className="flex min-w-0 flex-col">
            <p className="text-sm font-bold text-ink-soft">Invitation from your coach</p>
            <h2 className="text-2xl font-extrabold break-words text-ink">{coachName}</h2>
          </div>
        </div>
        <p className="text-ink-soft">
          {coachName} invites <strong className="break-all text-ink">{email}</strong> to link on Hearthswap. Once linked, their approved swaps are tried first
          in your rewrites, the targets they set become your defaults, and they can read and comment on the recipe versions you save. The invitation works until{' '}
          {expires}.
        </p>

        {accept.isError && (
          <Alert tone="danger" title="You aren't linked yet" assertive>
            {errorMessage(accept.error)}
          </Alert>
        )}

        {!user ? (
          <div className="flex flex-col gap-3">
            <p className="font-semibold text-ink">Sign in with your cook account to accept, or create one and choose “I cook for myself or my household”.</p>
            <div className="flex flex-wrap gap-2">
              <Link to={signUpHref} className={buttonClasses({})}>
                Create an account
              </Link>
              <Link to={signInHref} className={buttonClasses({ variant: 'secondary' })}>
                Sign in
              </Link>
            </div>
            <p className="text-sm text-ink-soft">
              A new account takes the invited address and is linked with {coachName} at once; after signing in you come back here to accept.
            </p>
          </div>
        ) : user.role !== 'cook' ? (
          <Alert tone="caution" title="Only a cook account can join a coach" announce={false}>
            You're signed in as {user.email}, which is a {user.role} account. Sign out and sign in with the cook account the invitation is for.
          </Alert>
        ) : (
          <div className="flex flex-col gap-3">
            {otherAddress && (
              <Alert tone="caution" title="This invitation is for another address" announce={false}>
                It was sent to {email}; you're signed in as {user.email}. Sign out and sign in with the account for {email} (or create one), or ask {coachName}{' '}
                to invite {user.email}.
              </Alert>
            )}
            {user.coachId !== null && (
              <Alert tone="info" announce={false}>
                You're already linked to a coach. To switch to {coachName}, leave your current coach first on My coach, then come back to this link.
              </Alert>
            )}
            <div className="flex flex-wrap gap-2">
              {!otherAddress && (
                <Button
                  size="lg"
                  loading={accept.isPending}
                  loadingLabel="Linking…"
                  onClick={() => accept.mutate(undefined, { onSuccess: (r) => onAccepted(r.coachName || coachName) })}
                >
                  Accept and link with {coachName}
                </Button>
              )}
              <Link to="/" className={buttonClasses({ variant: 'quiet', size: 'lg' })}>
                Not now
              </Link>
            </div>
          </div>
        )}
      </div>
    </Card>
  );
}
