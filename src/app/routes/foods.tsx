import { EmptyState } from '../../components/ui/empty-state';
import { Page } from '../../components/ui/page';

export function FoodsPage() {
  return (
    <Page
      title="Foods"
      description="The catalogue behind every number: thousands of foods from the USDA Standard Reference, each with its nutrients per 100 g, its household measures (a cup, a slice, a large egg) and the parts it can play in a dish. Look a food up before you cook, or compare two swaps by protein per 100 kcal."
    >
      <EmptyState title="No food looked up yet">
        Search by a name as a recipe would write it, such as "sharp cheddar" or "ground turkey", to see what 100 g
        holds and how much a cup or a slice weighs.
      </EmptyState>
    </Page>
  );
}
