import { useState } from 'react';
import { Link } from 'react-router';
import type { VersionSummary } from '../../../../shared/schemas/recipes';
import { buttonClasses } from '../../../components/ui/button';
import { SelectField } from '../../../components/ui/select-field';
import { comparePath } from '../recipe-links';
import { versionTitle } from '../version-words';

export interface ComparePickerProps {
  recipeId: number;
  versions: VersionSummary[];
  /** the pair to start from; the first and the newest version unless told */
  initial?: { a: number; b: number };
  /** called instead of following the link, e.g. to replace the compare page's search */
  onPick?: (a: number, b: number) => void;
}

/** Pick any two versions and open them side by side. */
export function ComparePicker({ recipeId, versions, initial, onPick }: ComparePickerProps) {
  const first = versions[0]?.number ?? 1;
  const newest = versions.at(-1)?.number ?? 1;
  const [a, setA] = useState(initial?.a ?? first);
  const [b, setB] = useState(initial?.b ?? newest);

  if (versions.length < 2) {
    return (
      <p className="text-sm text-ink-soft">
        Once the recipe has a second version (a lighter rewrite from the Kitchen, or a restored one), you can compare any two of them here.
      </p>
    );
  }

  const options = versions.map((v) => (
    <option key={v.number} value={v.number}>
      {versionTitle(v)}
    </option>
  ));
  const same = a === b;

  return (
    <div className="@container">
      <form
        className="grid gap-3 @lg:grid-cols-[1fr_1fr_auto] @lg:items-end"
        onSubmit={(e) => {
          e.preventDefault();
          if (!same) onPick?.(a, b);
        }}
      >
        <SelectField label="Before" value={a} onChange={(e) => setA(Number(e.target.value))}>
          {options}
        </SelectField>
        <SelectField label="After" value={b} onChange={(e) => setB(Number(e.target.value))}>
          {options}
        </SelectField>
        {onPick ? (
          <button type="submit" disabled={same} className={buttonClasses({ variant: 'secondary' })}>
            Compare
          </button>
        ) : same ? (
          <span className={buttonClasses({ variant: 'secondary', className: 'cursor-not-allowed text-oat-600' })} aria-disabled="true">
            Compare
          </span>
        ) : (
          <Link to={comparePath(recipeId, a, b)} className={buttonClasses({ variant: 'secondary' })}>
            Compare
            <span className="sr-only">
              {' '}
              version {a} with version {b}
            </span>
          </Link>
        )}
        {same && <p className="text-sm text-ink-soft @lg:col-span-3">Pick two different versions to compare.</p>}
      </form>
    </div>
  );
}
