import { Link, Navigate, useNavigate, useSearchParams } from 'react-router';
import { Alert } from '../../components/ui/alert';
import { LoadingState } from '../../components/ui/spinner';
import { Card } from '../../components/ui/card';
import { Page } from '../../components/ui/page';
import { useToast } from '../../components/ui/toast';
import { SignUpForm } from '../../features/auth/components/sign-up-form';
import { useInvitation } from '../../features/invitations/api/invitation';
import { errorMessage } from '../../lib/api-client';
import { safeNextPath } from '../../lib/safe-redirect';
import type { User } from '../../lib/user';
import { useAuth } from '../auth-context';

/** Where a new account starts when it didn't come from another page. */
function homeFor(user: User): string {
  return user.role === 'coach' ? '/swaps' : '/';
}

/** `?invitation=<token>`: the link in a coach's invitation, so the form takes the invited address. */
const INVITATION_TOKEN = /^[A-Za-z0-9_-]{20,100}$/;

export function SignUpPage() {
  const [params] = useSearchParams();
  const requested = params.get('next');
  const asked = params.get('invitation') ?? '';
  const token = INVITATION_TOKEN.test(asked) ? asked : '';
  const auth = useAuth();
  const navigate = useNavigate();
  const toast = useToast();
  const invitation = useInvitation(token);
  const bound = token && invitation.isSuccess ? { token, email: invitation.data.email, coachName: invitation.data.coachName } : undefined;

  if (auth.status === 'signed-in' && auth.user) {
    // signed up from an invitation: the account is linked already, so the coach's page, not the link again
    const to = token && auth.user.coachId !== null ? '/coach' : safeNextPath(requested, homeFor(auth.user));
    return <Navigate to={to} replace />;
  }

  const signInLink = requested ? `/sign-in?next=${encodeURIComponent(safeNextPath(requested))}` : '/sign-in';
  return (
    <Page
      width="narrow"
      title="Create your account"
      description="Anyone can analyse a recipe without an account. With one you keep a recipe book, link with a coach, or coach others."
    >
      {token && invitation.isError && (
        <Alert tone="caution" title="This invitation can't be used to sign up" announce={false}>
          {errorMessage(invitation.error)} You can still create an account; ask your coach for a new invitation to link with them.
        </Alert>
      )}
      <Card>
        {token && invitation.isPending ? (
          <LoadingState label="Opening the invitation…" />
        ) : (
          <SignUpForm
            key={bound?.token ?? 'plain'}
            invitation={bound}
            onSignedUp={(user) => {
              if (bound && user.coachId !== null) {
                toast.show(`Welcome to Hearthswap, ${user.displayName}. You're linked with ${bound.coachName}.`, 'success');
                navigate('/coach', { replace: true });
              } else {
                toast.show(`Welcome to Hearthswap, ${user.displayName}.`, 'success');
                navigate(safeNextPath(requested, homeFor(user)), { replace: true });
              }
            }}
          />
        )}
      </Card>
      <p className="text-center text-ink-soft">
        Already have an account?{' '}
        <Link to={signInLink} className="font-bold text-accent-strong underline underline-offset-4">
          Sign in
        </Link>
      </p>
    </Page>
  );
}
