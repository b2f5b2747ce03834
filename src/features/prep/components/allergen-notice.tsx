import { useId } from 'react';
import { ALLERGEN_LABELS, type Allergen } from '../../../../shared/allergens';
import { cx } from '../../../lib/cx';
import { allergenWords } from '../prep-words';

export interface AllergenNoticeProps {
  allergens: Allergen[];
  /** lines no catalogue food matched: nothing could be read from them */
  unmatchedLines: number;
  className?: string;
}

/** The major food allergens in the version's foods, up front, with the reminder to read the packages. */
export function AllergenNotice({ allergens, unmatchedLines, className }: AllergenNoticeProps) {
  const id = useId();
  const found = allergens.length > 0;
  return (
    <section
      aria-labelledby={id}
      className={cx(
        'flex flex-col gap-2.5 rounded-card border-2 px-4 py-4 sm:px-5 print:break-inside-avoid',
        found ? 'border-honey-600 bg-honey-50' : 'border-line-strong bg-surface',
        className,
      )}
    >
      <h2 id={id} className={cx('text-lg font-black', found ? 'text-honey-800' : 'text-ink')}>
        {found ? `Contains ${allergenWords(allergens).toLowerCase()}` : 'No major allergens found in the matched foods'}
      </h2>
      {found && (
        <ul aria-label="Major food allergens" className="flex flex-wrap gap-2">
          {allergens.map((a) => (
            <li key={a} className="rounded-pill border border-honey-600 bg-surface px-3 py-1 text-sm font-extrabold text-honey-800">
              {ALLERGEN_LABELS[a]}
            </li>
          ))}
        </ul>
      )}
      <p className={cx('font-bold', found ? 'text-honey-800' : 'text-ink')}>
        Check every package label: recipes and brands differ, and a lighter swap can bring in an allergen the original did not have.
      </p>
      {unmatchedLines > 0 && (
        <p className="text-sm text-ink-soft">
          {unmatchedLines === 1 ? 'One line has' : `${unmatchedLines} lines have`} no catalogue match and could not be checked for allergens.
        </p>
      )}
    </section>
  );
}
