import { Button } from '../../components/ui/button';
import { Card } from '../../components/ui/card';
import { Page } from '../../components/ui/page';
import { AccountSettingsForm } from '../../features/auth/components/account-settings-form';
import { ChangePasswordForm } from '../../features/auth/components/change-password-form';
import { DeleteAccountForm } from '../../features/auth/components/delete-account-form';
import { BOOK_EXPORT_HREF } from '../../features/recipes/recipe-links';
import { ROLE_LABELS } from '../../lib/user';
import { useAuth } from '../auth-context';
import { useSignOutAction } from '../shell/use-sign-out-action';

export function AccountPage() {
  const { user } = useAuth();
  const { signOut, signingOut } = useSignOutAction();
  // RequireAuth guards this route; the check keeps the types honest.
  if (!user) return null;

  return (
    <Page width="narrow" title="Account" description="Who you are on Hearthswap and how numbers are shown to you.">
      <Card title="Your details">
        <dl className="grid gap-x-6 gap-y-1 sm:grid-cols-[auto_1fr] sm:gap-y-3">
          <dt className="font-bold">E-mail</dt>
          <dd className="mb-2 break-all text-ink-soft sm:mb-0">{user.email}</dd>
          <dt className="font-bold">Account type</dt>
          <dd className="mb-2 text-ink-soft sm:mb-0">{ROLE_LABELS[user.role]}</dd>
          {user.role === 'cook' && (
            <>
              <dt className="font-bold">Coach</dt>
              <dd className="mb-2 text-ink-soft sm:mb-0">{user.coachId != null ? 'Linked to a coach' : 'Not linked to a coach'}</dd>
            </>
          )}
        </dl>
      </Card>
      <Card title="Preferences">
        <AccountSettingsForm user={user} />
      </Card>
      <Card title="Password">
        <ChangePasswordForm />
      </Card>
      <div>
        <Button variant="secondary" onClick={signOut} loading={signingOut} loadingLabel="Signing out…">
          Sign out
        </Button>
      </div>
      <Card title="Delete your account">
        <DeleteAccountForm exportHref={BOOK_EXPORT_HREF} onDeleted={() => window.location.replace('/?account=deleted')} />
      </Card>
    </Page>
  );
}
