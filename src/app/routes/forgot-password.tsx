import { Link } from 'react-router';
import { Card } from '../../components/ui/card';
import { Page } from '../../components/ui/page';
import { ForgotPasswordForm } from '../../features/account-recovery/components/forgot-password-form';

export function ForgotPasswordPage() {
  return (
    <Page width="narrow" title="Forgot your password?" description="Enter the e-mail you sign in with and we'll send a link to choose a new one.">
      <Card>
        <ForgotPasswordForm />
      </Card>
      <p className="text-center text-ink-soft">
        Remembered it?{' '}
        <Link to="/sign-in" className="font-bold text-accent-strong underline underline-offset-4">
          Sign in
        </Link>
      </p>
    </Page>
  );
}
