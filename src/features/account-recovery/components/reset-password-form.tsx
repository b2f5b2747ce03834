import { useState, type FormEvent } from 'react';
import { Link } from 'react-router';
import { passwordResetConfirmSchema } from '../../../../shared/schemas/coaching';
import { Alert } from '../../../components/ui/alert';
import { Button, buttonClasses } from '../../../components/ui/button';
import { PasswordField } from '../../../components/ui/password-field';
import { errorMessage, isApiError } from '../../../lib/api-client';
import { useConfirmPasswordReset } from '../api/password-reset';

const passwordRule = passwordResetConfirmSchema.shape.password;

const LINK_PROBLEMS: Record<string, string> = {
  reset_used: 'This link has already been used',
  reset_expired: 'This link has expired',
};

/** Sets a new password with the token from the e-mailed link. */
export function ResetPasswordForm({ token }: { token: string }) {
  const confirm = useConfirmPasswordReset();
  const [password, setPassword] = useState('');
  const [error, setError] = useState<string | undefined>();

  if (confirm.isSuccess) {
    return (
      <div className="flex flex-col gap-4">
        <Alert tone="success" title="Your password is changed">
          Sign in with your new password.
        </Alert>
        <Link to="/sign-in" className={buttonClasses({ size: 'lg', fullWidth: true })}>
          Sign in
        </Link>
      </div>
    );
  }

  const linkProblem =
    isApiError(confirm.error) &&
    (confirm.error.status === 410 || confirm.error.status === 404 || (confirm.error.status === 400 && 'token' in confirm.error.fieldErrors));
  if (linkProblem && isApiError(confirm.error)) {
    return (
      <div className="flex flex-col gap-4">
        <Alert tone="danger" title={LINK_PROBLEMS[confirm.error.code] ?? 'This link does not work'}>
          {confirm.error.status === 410 ? errorMessage(confirm.error) : 'The link may be incomplete. Ask for a new one; it comes by e-mail.'}
        </Alert>
        <Link to="/forgot-password" className={buttonClasses({ size: 'lg', fullWidth: true })}>
          Ask for a new link
        </Link>
      </div>
    );
  }

  function submit(event: FormEvent) {
    event.preventDefault();
    const checked = passwordRule.safeParse(password);
    if (!checked.success) {
      setError(checked.error.issues[0]?.message ?? 'Choose another password.');
      return;
    }
    setError(undefined);
    confirm.mutate({ token, password }, { onError: (e) => setError(isApiError(e) ? e.fieldErrors.password : undefined) });
  }

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-5">
      {confirm.isError && !error && (
        <Alert tone="danger" title="The password wasn't changed" assertive>
          {errorMessage(confirm.error)}
        </Alert>
      )}
      <PasswordField
        label="New password"
        hint="At least 10 characters. A few unrelated words make a strong one."
        autoComplete="new-password"
        value={password}
        onChange={(e) => {
          setPassword(e.target.value);
          if (error) setError(undefined);
        }}
        error={error}
      />
      <Button type="submit" size="lg" fullWidth loading={confirm.isPending} loadingLabel="Saving…">
        Save the new password
      </Button>
    </form>
  );
}
