import { useNavigate, useParams } from 'react-router';
import { Page } from '../../components/ui/page';
import { LoadingState } from '../../components/ui/spinner';
import { useToast } from '../../components/ui/toast';
import { InvitationPanel } from '../../features/invitations/components/invitation-panel';
import { useAuth } from '../auth-context';

/** The link in a coach's invitation e-mail. Open to everyone; accepting needs a signed-in cook. */
export function InvitationPage() {
  const { token = '' } = useParams();
  const auth = useAuth();
  const navigate = useNavigate();
  const toast = useToast();
  const here = `/invitations/${encodeURIComponent(token)}`;
  const next = `next=${encodeURIComponent(here)}`;

  return (
    <Page width="narrow" title="Join your coach" description="A coach has invited you to link with them on Hearthswap.">
      {auth.status === 'checking' ? (
        <LoadingState label="Checking your sign-in…" />
      ) : (
        <InvitationPanel
          token={token}
          user={auth.user}
          signInHref={`/sign-in?${next}`}
          signUpHref={`/sign-up?invitation=${encodeURIComponent(token)}&${next}`}
          onAccepted={(coachName) => {
            toast.show(`You're linked with ${coachName}.`, 'success');
            navigate('/coach', { replace: true });
          }}
        />
      )}
    </Page>
  );
}
