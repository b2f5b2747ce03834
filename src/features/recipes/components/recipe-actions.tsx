import { Link } from 'react-router';
import type { RecipeDetail } from '../../../../shared/schemas/recipes';
import { Button, buttonClasses } from '../../../components/ui/button';
import { exportHref, kitchenPath, prepPath, printPath } from '../recipe-links';

export interface RecipeActionsProps {
  recipe: RecipeDetail;
  /** the version print and export use */
  version: number | null;
  onDuplicate: () => void;
  duplicating: boolean;
  onDelete: () => void;
  deleting: boolean;
}

/** What can be done with the whole recipe: prep it, edit or rewrite it again in the Kitchen, print a card, download it, copy it, delete it. */
export function RecipeActions({ recipe, version, onDuplicate, duplicating, onDelete, deleting }: RecipeActionsProps) {
  const busy = duplicating || deleting;
  const prepVersion = version ?? recipe.latest?.number ?? null;
  return (
    <div className="flex flex-wrap gap-2">
      {prepVersion && (
        <Link to={prepPath(recipe.id, prepVersion)} className={buttonClasses({ variant: 'primary', size: 'sm' })}>
          Batch prep
          <span className="sr-only"> of version {prepVersion}</span>
        </Link>
      )}
      {prepVersion && (
        <Link to={kitchenPath(recipe.id, prepVersion)} className={buttonClasses({ variant: 'secondary', size: 'sm' })}>
          Edit in the Kitchen
          <span className="sr-only"> (version {prepVersion})</span>
        </Link>
      )}
      <Link to={printPath(recipe.id, version)} className={buttonClasses({ variant: 'secondary', size: 'sm' })}>
        Print
        {version && <span className="sr-only"> version {version}</span>}
      </Link>
      <a href={exportHref(recipe.id, version)} download className={buttonClasses({ variant: 'secondary', size: 'sm' })}>
        Export JSON-LD
        {version && <span className="sr-only"> of version {version}</span>}
      </a>
      <Button variant="secondary" size="sm" onClick={onDuplicate} loading={duplicating} loadingLabel="Copying…" disabled={busy}>
        Duplicate
      </Button>
      <Button variant="danger" size="sm" onClick={onDelete} loading={deleting} loadingLabel="Deleting…" disabled={busy}>
        Delete
      </Button>
    </div>
  );
}
