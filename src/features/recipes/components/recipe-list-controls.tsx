import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/field';
import { RECIPE_SORTS, type RecipeSort } from '../api/list-recipes';

export const SORT_LABELS: Record<RecipeSort, string> = {
  updated: 'Recently changed',
  title: 'Title, A to Z',
  kcal: 'Fewest kcal per serving',
  protein: 'Most protein per serving',
};

export interface RecipeListControlsProps {
  query: string;
  onQueryChange: (q: string) => void;
  sort: RecipeSort;
  onSortChange: (sort: RecipeSort) => void;
}

/** Find a recipe by its title and choose the order of the list. */
export function RecipeListControls({ query, onQueryChange, sort, onSortChange }: RecipeListControlsProps) {
  return (
    <form role="search" onSubmit={(e) => e.preventDefault()} className="grid gap-4 sm:grid-cols-[minmax(0,1fr)_16rem] sm:items-end">
      <TextField
        label="Find a recipe"
        type="search"
        placeholder="A word from the title, e.g. ziti"
        value={query}
        onChange={(e) => onQueryChange(e.target.value)}
        autoComplete="off"
        enterKeyHint="search"
      />
      <SelectField label="Order" value={sort} onChange={(e) => onSortChange(e.target.value as RecipeSort)}>
        {RECIPE_SORTS.map((s) => (
          <option key={s} value={s}>
            {SORT_LABELS[s]}
          </option>
        ))}
      </SelectField>
    </form>
  );
}
