import { Link, Navigate, useNavigate, useSearchParams } from 'react-router';
import { Card } from '../../components/ui/card';
import { Page } from '../../components/ui/page';
import { useToast } from '../../components/ui/toast';
import { SignInForm } from '../../features/auth/components/sign-in-form';
import { safeNextPath } from '../../lib/safe-redirect';
import { useAuth } from '../auth-context';

export function SignInPage() {
  const [params] = useSearchParams();
  const next = safeNextPath(params.get('next'));
  const auth = useAuth();
  const navigate = useNavigate();
  const toast = useToast();

  if (auth.status === 'signed-in') return <Navigate to={next} replace />;

  const signUpLink = next === '/' ? '/sign-up' : `/sign-up?next=${encodeURIComponent(next)}`;
  return (
    <Page width="narrow" title="Sign in" description="Welcome back. Your recipe book, your coach's swaps and your targets are where you left them.">
      <Card>
        <SignInForm
          onSignedIn={(user) => {
            toast.show(`Welcome back, ${user.displayName}.`, 'success');
            navigate(next, { replace: true });
          }}
        />
      </Card>
      <p className="text-center text-ink-soft">
        New to Hearthswap?{' '}
        <Link to={signUpLink} className="font-bold text-accent-strong underline underline-offset-4">
          Create an account
        </Link>
      </p>
    </Page>
  );
}
