import { useState, type FormEvent } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { EmailField, looksLikeEmail } from '../../../components/ui/email-field';
import { errorMessage, isApiError } from '../../../lib/api-client';
import { useRequestPasswordReset } from '../api/password-reset';

/** Asks for a reset link by e-mail; says the same thing whether or not the address has an account. */
export function ForgotPasswordForm() {
  const request = useRequestPasswordReset();
  const [email, setEmail] = useState('');
  const [error, setError] = useState<string | undefined>();
  const [sentTo, setSentTo] = useState<string | null>(null);

  function submit(event: FormEvent) {
    event.preventDefault();
    const address = email.trim();
    if (!looksLikeEmail(address)) {
      setError('Enter the e-mail address you sign in with, like name@example.com.');
      return;
    }
    setError(undefined);
    request.mutate(address, {
      onSuccess: () => setSentTo(address),
      onError: (e) => setError(isApiError(e) ? e.fieldErrors.email : undefined),
    });
  }

  if (sentTo) {
    return (
      <div className="flex flex-col gap-4">
        <Alert tone="success" title="Check your e-mail">
          If <strong className="break-all">{sentTo}</strong> has a Hearthswap account, a link to choose a new password is on its way. It works for 2 hours and
          only once.
        </Alert>
        <p className="text-ink-soft">
          Nothing after a few minutes? Look in the spam folder, or{' '}
          <button
            type="button"
            onClick={() => {
              setSentTo(null);
              request.reset();
            }}
            className="font-bold text-accent-strong underline underline-offset-2"
          >
            try another address
          </button>
          .
        </p>
      </div>
    );
  }

  const rateLimited = isApiError(request.error) && request.error.status === 429;
  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-5">
      {request.isError && !error && (
        <Alert tone={rateLimited ? 'caution' : 'danger'} title={rateLimited ? 'Please slow down' : 'No link was sent'} assertive>
          {errorMessage(request.error)}
        </Alert>
      )}
      <EmailField
        label="E-mail"
        value={email}
        onChange={(e) => {
          setEmail(e.target.value);
          if (error) setError(undefined);
        }}
        error={error}
      />
      <Button type="submit" size="lg" fullWidth loading={request.isPending} loadingLabel="Sending…">
        Send me a reset link
      </Button>
    </form>
  );
}
