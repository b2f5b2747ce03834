import { Page } from '../../components/ui/page';
import { SwapLibrary } from '../../features/swaps/components/swap-library';
import type { RenderFoodSearch } from '../../features/swaps/food-search-slot';
import { FoodCombobox } from '../../features/foods/components/food-combobox';
import { roleWords } from '../../features/foods/food-words';

const renderFoodSearch: RenderFoodSearch = ({ label, hint, onChoose, onCancel, autoFocus }) => (
  <FoodCombobox label={label} hint={hint} onChoose={onChoose} onCancel={onCancel} autoFocus={autoFocus} placeholder="Search the catalogue, e.g. mozzarella" />
);

export function SwapLibraryPage() {
  return (
    <Page
      title="Swap library"
      description="The swaps you stand behind: a lighter food in place of another, or for a whole role such as melting cheese, each with a cooking note like “bake 5 minutes longer for melt”. Publish a swap and your clients' rewrites try it first."
    >
      <SwapLibrary renderFoodSearch={renderFoodSearch} roleLabel={roleWords} />
    </Page>
  );
}
