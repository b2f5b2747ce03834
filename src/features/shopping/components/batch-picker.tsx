import { useState, type FormEvent } from 'react';
import type { RecipeSummary } from '../../../../shared/schemas/recipes';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { NumberStepper } from '../../../components/ui/number-stepper';
import { SelectField } from '../../../components/ui/select-field';
import { errorMessage } from '../../../lib/api-client';
import { useRecipeVersions } from '../api/get-recipe-versions';
import { MAX_PORTIONS, MIN_PORTIONS, type ShoppingPick } from '../shopping-picks';
import { portionsProblem, versionOption } from '../shopping-words';

export interface BatchPickerProps {
  /** recipes with at least one saved version */
  recipes: RecipeSummary[];
  onAdd: (pick: ShoppingPick) => void;
  /** the list holds as many batches as one list may */
  full: boolean;
}

/** Choose a recipe, one of its saved versions and how many portions, and add the batch to the list. */
export function BatchPicker({ recipes, onAdd, full }: BatchPickerProps) {
  const [recipeId, setRecipeId] = useState<number | null>(recipes[0]?.id ?? null);
  const chosenRecipe = recipes.find((r) => r.id === recipeId) ?? recipes[0] ?? null;
  const versions = useRecipeVersions(chosenRecipe?.id ?? null);
  const [askedVersion, setAskedVersion] = useState<number | null>(null);
  const list = versions.data ?? [];
  const version = list.find((v) => v.number === askedVersion) ?? list.at(-1) ?? null;

  // Portions start at the version's servings and follow the person's changes from there.
  const pickKey = `${chosenRecipe?.id}.${version?.number}`;
  const [portions, setPortions] = useState<{ value: number; forKey: string } | null>(null);
  const portionsValue = portions && portions.forKey === pickKey ? portions.value : (version?.servings ?? chosenRecipe?.servings ?? 4);
  const problem = portionsProblem(portionsValue);
  const [tried, setTried] = useState(false);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    setTried(true);
    if (!chosenRecipe || !version || problem || full) return;
    onAdd({ recipeId: chosenRecipe.id, versionNumber: version.number, portions: portionsValue });
    setTried(false);
  };

  return (
    <form onSubmit={submit} className="flex flex-col gap-4" aria-label="Add a batch">
      <SelectField
        label="Recipe"
        value={chosenRecipe?.id ?? ''}
        onChange={(e) => {
          setRecipeId(Number(e.target.value));
          setAskedVersion(null);
        }}
      >
        {recipes.map((r) => (
          <option key={r.id} value={r.id}>
            {r.title}
          </option>
        ))}
      </SelectField>

      {versions.isError ? (
        <Alert
          tone="danger"
          title="Its versions didn't load"
          action={
            <Button variant="secondary" size="sm" onClick={() => void versions.refetch()}>
              Try again
            </Button>
          }
        >
          {errorMessage(versions.error)}
        </Alert>
      ) : (
        <SelectField
          label="Saved version"
          hint={versions.isPending ? 'Loading the versions…' : 'Newest first.'}
          value={version?.number ?? ''}
          disabled={versions.isPending}
          onChange={(e) => setAskedVersion(Number(e.target.value))}
        >
          {versions.isPending && <option value="">Loading…</option>}
          {[...list].reverse().map((v) => (
            <option key={v.number} value={v.number}>
              {versionOption(v)}
            </option>
          ))}
        </SelectField>
      )}

      <NumberStepper
        label="Portions"
        value={portionsValue}
        min={MIN_PORTIONS}
        max={MAX_PORTIONS}
        unit="portions"
        onChange={(value) => setPortions({ value, forKey: pickKey })}
        hint={version ? `This version is written for ${version.servings}.` : undefined}
        error={tried || portionsValue > MAX_PORTIONS || portionsValue < MIN_PORTIONS ? problem : undefined}
      />

      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" disabled={!version || full}>
          Add to the list
        </Button>
        {full && <p className="text-sm font-semibold text-ink-soft">One list holds at most 20 batches.</p>}
      </div>
    </form>
  );
}
