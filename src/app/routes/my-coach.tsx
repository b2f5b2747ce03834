import { Page } from '../../components/ui/page';
import { MyCoachView } from '../../features/my-coach/components/my-coach-view';
import { roleWords } from '../../features/foods/food-words';
import { useAuth } from '../auth-context';

export function MyCoachPage() {
  const { user } = useAuth();
  return (
    <Page
      title="My coach"
      description="If you work with a coach, this is where their side of Hearthswap meets yours: the swaps they approve, with their cooking notes, and the per-meal targets they set for you."
    >
      <MyCoachView email={user?.email ?? ''} roleLabel={roleWords} />
    </Page>
  );
}
