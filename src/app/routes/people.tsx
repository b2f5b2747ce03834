import { EmptyState } from '../../components/ui/empty-state';
import { Page } from '../../components/ui/page';

export function PeoplePage() {
  return (
    <Page
      title="People"
      description="Every account on this Hearthswap: who they are, whether they cook or coach, and which coach a cook is linked to. Change a person's role here."
    >
      <EmptyState title="No accounts listed">
        Accounts are listed here with their e-mail, display name and role.
      </EmptyState>
    </Page>
  );
}
