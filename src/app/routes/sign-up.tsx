import { Link, Navigate, useNavigate, useSearchParams } from 'react-router';
import { Card } from '../../components/ui/card';
import { Page } from '../../components/ui/page';
import { useToast } from '../../components/ui/toast';
import { SignUpForm } from '../../features/auth/components/sign-up-form';
import { safeNextPath } from '../../lib/safe-redirect';
import type { User } from '../../lib/user';
import { useAuth } from '../auth-context';

/** Where a new account starts when it didn't come from another page. */
function homeFor(user: User): string {
  return user.role === 'coach' ? '/swaps' : '/';
}

export function SignUpPage() {
  const [params] = useSearchParams();
  const requested = params.get('next');
  const auth = useAuth();
  const navigate = useNavigate();
  const toast = useToast();

  if (auth.status === 'signed-in' && auth.user) return <Navigate to={safeNextPath(requested, homeFor(auth.user))} replace />;

  const signInLink = requested ? `/sign-in?next=${encodeURIComponent(safeNextPath(requested))}` : '/sign-in';
  return (
    <Page
      width="narrow"
      title="Create your account"
      description="Anyone can analyse a recipe without an account. With one you keep a recipe book, link with a coach, or coach others."
    >
      <Card>
        <SignUpForm
          onSignedUp={(user) => {
            toast.show(`Welcome to Hearthswap, ${user.displayName}.`, 'success');
            navigate(safeNextPath(requested, homeFor(user)), { replace: true });
          }}
        />
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
