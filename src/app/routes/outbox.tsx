import { EmptyState } from '../../components/ui/empty-state';
import { Page } from '../../components/ui/page';

export function OutboxPage() {
  return (
    <Page
      title="Outbox"
      description="Mail Hearthswap would have sent, kept on this machine instead: client invitations and account notices. Use it in development to read a message and follow its link."
    >
      <EmptyState title="The outbox is empty">Nothing has been sent yet. Invitations a coach sends land here.</EmptyState>
    </Page>
  );
}
