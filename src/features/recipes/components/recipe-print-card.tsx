import type { RecipeDetail, VersionDetail } from '../../../../shared/schemas/recipes';
import { incompleteLineNumbers } from '../../../../shared/line-status';
import { IncompleteTotalsAlert } from '../../../components/ui/incomplete-totals-alert';
import { NutrientTable } from '../../../components/ui/nutrient-table';
import { formatGrams } from '../../../lib/format';
import { formatDateTime } from '../../../lib/dates';
import { versionKindLabel, versionNote, writtenLine } from '../version-words';

/** Method text as steps: one step a line, any "1." or "Step 1:" the cook typed left off. */
function methodSteps(method: string): string[] {
  return method
    .split(/\r?\n/)
    .map((line) => line.trim().replace(/^(?:step\s*)?\d+[.):]\s*/i, ''))
    .filter(Boolean);
}

/**
 * One version as a card for the kitchen wall: title, photo, servings, lines in grams, method and
 * the figures per serving. The print stylesheet drops the site's header and footer around it.
 */
export interface PrintExtras {
  /** the household measure of each line, in line order ("2 cups"); '' where there is none */
  household: string[];
  /** USDA FSIS fridge life for this dish, from the same guidance the prep page shows */
  fridgeDays: number | null;
}

export function RecipePrintCard({ recipe, version, extras }: { recipe: RecipeDetail; version: VersionDetail; extras?: PrintExtras }) {
  const steps = methodSteps(recipe.method);
  const note = versionNote(version);
  return (
    <article className="mx-auto flex w-full max-w-3xl flex-col gap-6 rounded-card border border-line bg-surface p-5 text-ink shadow-card sm:p-8 print:max-w-none print:rounded-none print:border-0 print:p-0 print:shadow-none">
      <header className="flex flex-col-reverse gap-4 sm:flex-row sm:items-start sm:justify-between print:flex-row">
        <div className="flex min-w-0 flex-col gap-1.5">
          <h1 className="text-3xl font-black tracking-tight">{recipe.title}</h1>
          <p className="text-ink-soft">
            {version.servings} servings · version {version.number}, {versionKindLabel(version.kind, version.note).toLowerCase()}
            {note ? ` — ${note}` : ''}
          </p>
        </div>
        {recipe.photoUrl && (
          <img src={recipe.photoUrl} alt={`The dish: ${recipe.title}`} className="aspect-[4/3] w-full shrink-0 rounded-field object-cover sm:w-56 print:w-48" />
        )}
      </header>

      <div className="grid grid-cols-[minmax(0,1fr)] gap-6 sm:grid-cols-[minmax(0,3fr)_minmax(0,2fr)] print:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <section aria-labelledby="print-ingredients" className="flex flex-col gap-2 print:break-inside-avoid">
          <h2 id="print-ingredients" className="border-b-2 border-ink pb-1 text-lg font-extrabold">
            Ingredients <span className="text-sm font-semibold text-ink-soft">weigh them raw, in grams</span>
          </h2>
          <IncompleteTotalsAlert lineNumbers={incompleteLineNumbers(version.lines)} />
          <ul className="flex flex-col">
            {version.lines.map((line, i) => (
              <li key={i} className="grid grid-cols-[6.5rem_minmax(0,1fr)] gap-3 border-b border-line py-1.5 last:border-b-0">
                <span className="text-right tabular-nums">
                  <span className="font-extrabold">{formatGrams(line.grams)}</span>
                  {extras?.household[i] && <span className="block text-sm text-ink-soft">{extras.household[i]}</span>}
                </span>
                <span>
                  <span className="font-semibold">{writtenLine(line) ?? line.foodName ?? line.input}</span>
                  {line.foodName && writtenLine(line) && <span className="block text-sm text-ink-soft">matched: {line.foodName}</span>}
                  {line.checkMatch && line.foodName && <span className="block text-sm font-semibold">▲ check this match</span>}
                  {line.incomplete && <span className="block text-sm font-semibold">▲ not counted in the totals</span>}
                </span>
              </li>
            ))}
          </ul>
        </section>

        <section aria-labelledby="print-nutrients" className="flex flex-col gap-2 print:break-inside-avoid">
          <h2 id="print-nutrients" className="sr-only">
            Nutrients per serving
          </h2>
          <NutrientTable
            caption="Per serving"
            columns={[{ key: 'serving', header: `1 serving of ${version.servings}`, values: version.perServing }]}
            className="text-sm"
          />
        </section>
      </div>

      <section aria-labelledby="print-method" className="flex flex-col gap-2">
        <h2 id="print-method" className="border-b-2 border-ink pb-1 text-lg font-extrabold">
          Method
        </h2>
        {steps.length > 0 ? (
          <ol className="flex list-decimal flex-col gap-1.5 pl-6 marker:font-bold">
            {steps.map((step, i) => (
              <li key={i} className="pl-1 leading-relaxed">
                {step}
              </li>
            ))}
          </ol>
        ) : (
          <p className="text-ink-soft italic">No method written down yet.</p>
        )}
      </section>

      {recipe.notes.trim() && (
        <section aria-labelledby="print-notes" className="flex flex-col gap-2">
          <h2 id="print-notes" className="border-b-2 border-ink pb-1 text-lg font-extrabold">
            Notes
          </h2>
          <p className="leading-relaxed whitespace-pre-line">{recipe.notes}</p>
        </section>
      )}

      <footer className="border-t border-line pt-3 text-xs leading-relaxed text-ink-soft">
        Hearthswap · version saved {formatDateTime(version.createdAt)} · Figures are estimates from USDA Standard Reference food values, not medical advice.
        Leftovers: refrigerate within 2 hours, {extras?.fridgeDays ? `eat within ${extras.fridgeDays} days` : 'eat within 3–4 days'}, reheat to 165 °F (74 °C)
        (USDA FSIS).
      </footer>
    </article>
  );
}
