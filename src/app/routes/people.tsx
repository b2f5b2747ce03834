import { Page } from '../../components/ui/page';
import { PeopleList } from '../../features/people/components/people-list';
import { useAuth } from '../auth-context';

export function PeoplePage() {
  const { user } = useAuth();
  return (
    <Page
      title="People"
      description="Every account on this Hearthswap: who they are, whether they cook or coach, and which coach a cook is linked to. Change a person's role here."
    >
      <PeopleList selfId={user?.id ?? null} />
    </Page>
  );
}
