import { EmptyState } from '../../components/ui/empty-state';
import { Page } from '../../components/ui/page';

export function ClientsPage() {
  return (
    <Page
      title="Clients"
      description="The cooks you coach. Invite someone by e-mail, set their daily and per-meal targets from their body stats and goal, and look over the recipe versions they save."
    >
      <EmptyState title="No clients yet">
        Once you invite a client and they accept, they are listed here with their targets and latest saved recipes.
      </EmptyState>
    </Page>
  );
}
