import { Link, useParams, useSearchParams } from 'react-router';
import { Alert } from '../../components/ui/alert';
import { buttonClasses } from '../../components/ui/button';
import { Card } from '../../components/ui/card';
import { ErrorState } from '../../components/ui/error-state';
import { Page } from '../../components/ui/page';
import { LoadingState } from '../../components/ui/spinner';
import { useRecipe } from '../../features/recipes/api/get-recipe';
import { useRecipeVersion } from '../../features/recipes/api/get-version';
import { ComparePicker } from '../../features/recipes/components/compare-picker';
import { RecipeNotFound } from '../../features/recipes/components/recipe-not-found';
import { VersionComparison } from '../../features/recipes/components/version-comparison';
import { positiveInt, recipePath } from '../../features/recipes/recipe-links';
import { isApiError } from '../../lib/api-client';

export function RecipeComparePage() {
  const { id: idParam } = useParams();
  const [params, setParams] = useSearchParams();
  const id = positiveInt(idParam);
  const recipe = useRecipe(id);

  const versions = recipe.data?.versions ?? [];
  const has = (n: number | null) => n !== null && versions.some((v) => v.number === n);
  const askedA = positiveInt(params.get('a'));
  const askedB = positiveInt(params.get('b'));
  const a = has(askedA) ? askedA : (versions[0]?.number ?? null);
  const b = has(askedB) ? askedB : (versions.at(-1)?.number ?? null);
  const before = useRecipeVersion(recipe.data ? id : null, a);
  const after = useRecipeVersion(recipe.data ? id : null, b);

  if (id === null || (recipe.isError && isApiError(recipe.error) && recipe.error.status === 404)) return <RecipeNotFound />;

  const back = (
    <Link to={recipePath(id)} className={buttonClasses({ variant: 'secondary', size: 'sm' })}>
      ← Back to the recipe
    </Link>
  );

  if (recipe.isPending) {
    return (
      <Page title="Compare versions" actions={back}>
        <LoadingState label="Opening the recipe…" />
      </Page>
    );
  }
  if (recipe.isError) {
    return (
      <Page title="Compare versions" actions={back}>
        <ErrorState title="This recipe didn't load" error={recipe.error} onRetry={() => void recipe.refetch()} retrying={recipe.isFetching} />
      </Page>
    );
  }

  const missing = [askedA, askedB].filter((n) => n !== null && !has(n));
  let body;
  if (versions.length < 2 || a === null || b === null) {
    body = (
      <Alert tone="info" title="Only one version so far">
        Save a lighter rewrite of this recipe from the Kitchen, then come back to see the two side by side.
      </Alert>
    );
  } else if (before.isPending || after.isPending) {
    body = <LoadingState label={`Opening versions ${a} and ${b}…`} />;
  } else if (before.isError || after.isError) {
    const failed = before.isError ? before : after;
    body = <ErrorState title="A version didn't load" error={failed.error} onRetry={() => void failed.refetch()} retrying={failed.isFetching} />;
  } else {
    body = (
      <>
        {a === b && (
          <Alert tone="caution" title="The same version twice">
            Pick two different versions above to see what changed.
          </Alert>
        )}
        <VersionComparison a={before.data} b={after.data} />
      </>
    );
  }

  return (
    <Page title={`Compare: ${recipe.data.title}`} description="Two versions side by side, line by line, and what the changes do per serving." actions={back}>
      {versions.length >= 2 && a !== null && b !== null && (
        <Card title="Versions to compare" headingLevel={2}>
          <ComparePicker
            key={`${a}-${b}`}
            recipeId={id}
            versions={versions}
            initial={{ a, b }}
            onPick={(na, nb) => setParams({ a: String(na), b: String(nb) }, { replace: true, preventScrollReset: true })}
          />
        </Card>
      )}
      {missing.length > 0 && (
        <Alert tone="caution" title={`This recipe has no version ${missing.join(' or ')}`}>
          Showing the first and the newest versions instead.
        </Alert>
      )}
      {body}
    </Page>
  );
}
