import { useSearchParams } from 'react-router';
import { Page } from '../../components/ui/page';
import { FoodSearchPanel } from '../../features/foods/components/food-search-panel';

export function FoodsPage() {
  const [params, setParams] = useSearchParams();
  const initialQuery = params.get('q') ?? '';

  return (
    <Page
      title="Foods"
      description="The catalogue behind every number: thousands of foods from the USDA Standard Reference, each with its nutrients per 100 g, its household measures (a cup, a slice, a large egg) and the parts it can play in a dish. Look a food up before you cook, or compare two swaps by protein per 100 kcal."
    >
      <FoodSearchPanel
        initialQuery={initialQuery}
        foodHref={(id) => `/foods/${id}`}
        linkState={{ fromSearch: initialQuery }}
        onQueryChange={(q) => {
          if (q === (params.get('q') ?? '')) return;
          setParams(q ? { q } : {}, { replace: true });
        }}
      />
    </Page>
  );
}
