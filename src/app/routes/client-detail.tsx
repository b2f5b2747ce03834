import { Link, useNavigate, useParams } from 'react-router';
import { buttonClasses } from '../../components/ui/button';
import { Card } from '../../components/ui/card';
import { EmptyState } from '../../components/ui/empty-state';
import { ErrorState } from '../../components/ui/error-state';
import { Page } from '../../components/ui/page';
import { LoadingState } from '../../components/ui/spinner';
import { useClient } from '../../features/clients/api/clients';
import { clientVersionPath, positiveId } from '../../features/clients/client-paths';
import { ClientVersionList } from '../../features/clients/components/client-version-list';
import { EndLinkCard } from '../../features/clients/components/end-link-card';
import { TargetsEditor } from '../../features/clients/components/targets-editor';
import { unitSystemOf } from '../../lib/user';
import { useAuth } from '../auth-context';

function BackToClients() {
  return (
    <Link to="/clients" className="self-start font-bold text-accent-strong underline-offset-4 hover:underline">
      <span aria-hidden="true">← </span>All clients
    </Link>
  );
}

export function ClientDetailPage() {
  const params = useParams();
  const clientId = positiveId(params.id);
  const { user } = useAuth();
  const navigate = useNavigate();
  const { client, ...clients } = useClient(clientId);

  if (clients.isPending) {
    return (
      <Page title="Client">
        <LoadingState label="Loading the client…" />
      </Page>
    );
  }
  if (clients.isError) {
    return (
      <Page title="Client">
        <ErrorState title="This client didn't load" error={clients.error} onRetry={() => void clients.refetch()} retrying={clients.isFetching} />
      </Page>
    );
  }
  if (!client || clientId === null) {
    return (
      <Page title="Not one of your clients" width="narrow">
        <EmptyState
          title="No client here"
          action={
            <Link to="/clients" className={buttonClasses({ variant: 'secondary' })}>
              Back to your clients
            </Link>
          }
        >
          They may have left, or the link is from someone else's list.
        </EmptyState>
      </Page>
    );
  }

  return (
    <Page title={client.displayName} description={<span className="break-all">{client.email}</span>}>
      <BackToClients />
      <TargetsEditor key={client.id} client={client} defaultUnits={unitSystemOf(user) === 'metric' ? 'metric' : 'us'} />
      <Card
        title="Recent saved versions"
        description={`The recipes ${client.displayName} keeps, newest first. Open one to review its lines and leave a comment.`}
      >
        <ClientVersionList
          clientId={client.id}
          clientName={client.displayName}
          targets={client.targets}
          reviewHref={(v) => clientVersionPath(client.id, v.recipeId, v.number)}
        />
      </Card>
      <EndLinkCard client={client} onEnded={() => navigate('/clients', { replace: true })} />
    </Page>
  );
}
