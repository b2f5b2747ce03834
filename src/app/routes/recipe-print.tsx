import { Link, useParams, useSearchParams } from 'react-router';
import { Alert } from '../../components/ui/alert';
import { Button, buttonClasses } from '../../components/ui/button';
import { ErrorState } from '../../components/ui/error-state';
import { SelectField } from '../../components/ui/select-field';
import { LoadingState } from '../../components/ui/spinner';
import { usePrep } from '../../features/prep/api/get-prep';
import { useRecipe } from '../../features/recipes/api/get-recipe';
import { useRecipeVersion } from '../../features/recipes/api/get-version';
import { RecipeNotFound } from '../../features/recipes/components/recipe-not-found';
import { RecipePrintCard } from '../../features/recipes/components/recipe-print-card';
import { positiveInt, recipePath } from '../../features/recipes/recipe-links';
import { versionTitle } from '../../features/recipes/version-words';
import { isApiError } from '../../lib/api-client';

/*
 * While this page is open, printing drops the site's header, footer and skip link, and the
 * page's own toolbar (marked print:hidden), leaving only the card.
 */
const PRINT_CSS = `
@media print {
  @page { margin: 14mm; }
  html, body { background: #ffffff !important; }
  #root > div > header, #root > div > footer, a[href="#main"], [role="progressbar"] { display: none !important; }
  #main { padding: 0 !important; max-width: none !important; }
  img { print-color-adjust: exact; -webkit-print-color-adjust: exact; }
}
`;

export function RecipePrintPage() {
  const { id: idParam } = useParams();
  const [params, setParams] = useSearchParams();
  const id = positiveInt(idParam);
  const recipe = useRecipe(id);
  const versions = recipe.data?.versions ?? [];
  const asked = positiveInt(params.get('version'));
  const chosen = versions.find((v) => v.number === asked) ?? versions.at(-1) ?? null;
  const version = useRecipeVersion(recipe.data ? id : null, chosen?.number ?? null);
  // The prep sheet's figures for one batch of the recipe as written: household measures and fridge life.
  const prep = usePrep(version.data ? id : null, chosen?.number ?? null, version.data?.servings ?? null);
  const extras = prep.data ? { household: prep.data.batch.map((b) => b.household ?? ''), fridgeDays: prep.data.storage.fridgeDays } : undefined;

  if (id === null || (recipe.isError && isApiError(recipe.error) && recipe.error.status === 404)) return <RecipeNotFound />;

  const toolbar = (
    <div className="mx-auto mb-6 flex w-full max-w-3xl flex-wrap items-end justify-between gap-3 print:hidden">
      <Link to={recipePath(id, chosen?.number)} className={buttonClasses({ variant: 'secondary', size: 'sm' })}>
        ← Back to the recipe
      </Link>
      <div className="flex flex-wrap items-end gap-2">
        {versions.length > 1 && chosen && (
          <SelectField
            label="Version to print"
            value={chosen.number}
            containerClassName="min-w-56"
            onChange={(e) => setParams({ version: e.target.value }, { replace: true })}
          >
            {[...versions].reverse().map((v) => (
              <option key={v.number} value={v.number}>
                {versionTitle(v)}
              </option>
            ))}
          </SelectField>
        )}
        <Button onClick={() => window.print()} disabled={!version.data}>
          Print this card
        </Button>
      </div>
    </div>
  );

  let body;
  if (recipe.isPending || (chosen && version.isPending)) body = <LoadingState label="Laying out the card…" className="justify-center" />;
  else if (recipe.isError) body = <ErrorState title="This recipe didn't load" error={recipe.error} onRetry={() => void recipe.refetch()} />;
  else if (!chosen)
    body = (
      <Alert tone="info" title="Nothing to print yet">
        This recipe has no saved version.
      </Alert>
    );
  else if (version.isError) body = <ErrorState title={`Version ${chosen.number} didn't load`} error={version.error} onRetry={() => void version.refetch()} />;
  else if (version.data) body = <RecipePrintCard recipe={recipe.data} version={version.data} extras={extras} />;

  return (
    <>
      <title>{`${recipe.data ? `${recipe.data.title} · ` : ''}Print · Hearthswap`}</title>
      <style>{PRINT_CSS}</style>
      {toolbar}
      {asked !== null && chosen && asked !== chosen.number && (
        <Alert tone="caution" title={`This recipe has no version ${asked}`} className="mx-auto mb-4 w-full max-w-3xl print:hidden">
          Showing the newest version instead.
        </Alert>
      )}
      {body}
    </>
  );
}
