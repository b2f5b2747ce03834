import { useState, type FormEvent } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { EmailField, looksLikeEmail } from '../../../components/ui/email-field';
import { errorMessage, isApiError } from '../../../lib/api-client';
import { useInviteClient, type SentInvitation } from '../api/clients';

/** Sends an invitation e-mail with a link the client opens to link with the coach. */
export function InviteClientForm({ onInvited }: { onInvited: (sent: SentInvitation) => void }) {
  const invite = useInviteClient();
  const [email, setEmail] = useState('');
  const [error, setError] = useState<string | undefined>();

  function submit(event: FormEvent) {
    event.preventDefault();
    const address = email.trim().toLowerCase();
    if (!looksLikeEmail(address)) {
      setError('Enter the e-mail address your client signs in with, like name@example.com.');
      return;
    }
    setError(undefined);
    invite.mutate(address, {
      onSuccess: (sent) => {
        setEmail('');
        onInvited(sent);
      },
      onError: (e) => setError(isApiError(e) ? (e.fieldErrors.email ?? undefined) : undefined),
    });
  }

  const formError = invite.isError && !error ? errorMessage(invite.error) : null;

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4">
      {formError && (
        <Alert tone={isApiError(invite.error) && invite.error.status === 409 ? 'caution' : 'danger'} title="No invitation was sent" assertive>
          {formError}
        </Alert>
      )}
      <EmailField
        label="Client's e-mail"
        hint="They get a link that works for 7 days. They sign in with a cook account — or create one — and accept. Inviting the same address again sends a fresh link in place of the first."
        autoComplete="off"
        value={email}
        onChange={(e) => {
          setEmail(e.target.value);
          if (error) setError(undefined);
        }}
        error={error}
      />
      <Button type="submit" loading={invite.isPending} loadingLabel="Sending…" className="self-start">
        Send the invitation
      </Button>
    </form>
  );
}
