import { EmptyState } from '../../components/ui/empty-state';
import { Page } from '../../components/ui/page';
import { useAuth } from '../auth-context';

export function MyCoachPage() {
  const { user } = useAuth();
  const linked = user?.coachId != null;
  return (
    <Page
      title="My coach"
      description="If you work with a coach, this is where their side of Hearthswap meets yours: the swaps they approve, with their cooking notes, and the daily and per-meal targets they set for you. Their approved swaps are tried first in every rewrite, and their targets become your defaults."
    >
      {linked ? (
        <EmptyState title="Your coach hasn't published anything yet">
          You're linked to a coach. When they publish approved swaps or set your targets, they appear here.
        </EmptyState>
      ) : (
        <EmptyState title="You're not linked to a coach">
          A coach links you by sending an invitation to the e-mail address on your account. Hearthswap works just as
          well without one.
        </EmptyState>
      )}
    </Page>
  );
}
