import { Card } from '../../components/ui/card';
import { EmptyState } from '../../components/ui/empty-state';
import { ErrorState } from '../../components/ui/error-state';
import { Page } from '../../components/ui/page';
import { LoadingState } from '../../components/ui/spinner';
import { useToast } from '../../components/ui/toast';
import { useClients } from '../../features/clients/api/clients';
import { clientPath } from '../../features/clients/client-paths';
import { ClientList } from '../../features/clients/components/client-list';
import { InvitationList } from '../../features/clients/components/invitation-list';
import { InviteClientForm } from '../../features/clients/components/invite-client-form';
import { invitationSentWords } from '../../features/clients/invitation-words';

export function ClientsPage() {
  const clients = useClients();
  const toast = useToast();

  return (
    <Page
      title="Clients"
      description="The cooks you coach. Invite someone by e-mail, set their daily and per-meal targets from their body stats and goal, and look over the recipe versions they save."
    >
      <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <Card title="Invite a client" className="lg:col-start-2">
          <InviteClientForm onInvited={(sent) => toast.show(invitationSentWords(sent), 'success')} />
        </Card>

        <section aria-labelledby="clients-heading" className="flex flex-col gap-4 lg:col-start-1 lg:row-span-2 lg:row-start-1">
          <h2 id="clients-heading" className="text-xl font-extrabold text-ink">
            Your clients
            {clients.isSuccess && clients.data.clients.length > 0 && <span className="ml-2 font-bold text-ink-soft">({clients.data.clients.length})</span>}
          </h2>
          {clients.isPending ? (
            <LoadingState label="Loading your clients…" />
          ) : clients.isError ? (
            <ErrorState title="Your clients didn't load" error={clients.error} onRetry={() => void clients.refetch()} retrying={clients.isFetching} />
          ) : clients.data.clients.length === 0 ? (
            <EmptyState title="No clients yet">
              Once someone accepts your invitation they are listed here with their targets; open one to set targets and read the versions they save.
            </EmptyState>
          ) : (
            <ClientList clients={clients.data.clients} clientHref={clientPath} />
          )}
        </section>

        <Card
          title="Invitations"
          className="lg:col-start-2"
          description={clients.isSuccess && clients.data.invitations.length > 0 ? 'Newest first. A link works for 7 days.' : undefined}
        >
          {clients.isPending ? (
            <LoadingState label="Loading invitations…" />
          ) : clients.isError ? (
            <p className="text-ink-soft">Invitations show once the list loads.</p>
          ) : clients.data.invitations.length === 0 ? (
            <p className="text-ink-soft">You haven't sent any invitations yet.</p>
          ) : (
            <InvitationList invitations={clients.data.invitations} />
          )}
        </Card>
      </div>
    </Page>
  );
}
