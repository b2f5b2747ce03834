import { Page } from '../../components/ui/page';
import { OutboxList } from '../../features/outbox/components/outbox-list';

export function OutboxPage() {
  return (
    <Page
      title="Outbox"
      description="Mail Hearthswap would have sent, kept on this machine instead: client invitations and password-reset links. Open a message and follow its link as the person it was for."
    >
      <OutboxList />
    </Page>
  );
}
