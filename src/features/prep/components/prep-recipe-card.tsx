import type { PrepResponse as Prep } from '../../../../shared/schemas/prep';
import { allergenWords, methodSteps, portionsWord, versionLine } from '../prep-words';
import { ServingPanel } from './serving-panel';
import { StorageGuide } from './storage-guide';
import { WeightsTable } from './weights-table';

function SectionHeading({ id, children }: { id: string; children: string }) {
  return (
    <h2 id={id} className="border-b-2 border-ink pb-1 text-lg font-extrabold">
      {children}
    </h2>
  );
}

/**
 * The batch on one card for the kitchen: title, photo, portions, grams per portion and for the batch,
 * method and notes, the per-serving panel, storage and allergens. Prints on its own (see PrintSheetStyle).
 */
export function PrepRecipeCard({ prep }: { prep: Prep }) {
  const { recipe, version, portions } = prep;
  const steps = methodSteps(recipe.method);
  const unmatched = prep.perPortion.filter((l) => l.food.id === null).length;
  return (
    <article className="mx-auto flex w-full max-w-3xl flex-col gap-6 rounded-card border border-line bg-surface p-5 text-ink shadow-card sm:p-8 print:max-w-none print:gap-4 print:rounded-none print:border-0 print:p-0 print:shadow-none">
      <header className="flex flex-col-reverse gap-4 sm:flex-row sm:items-start sm:justify-between print:flex-row">
        <div className="flex min-w-0 flex-col gap-1.5">
          <p className="text-sm font-extrabold tracking-wide text-accent uppercase">Batch card · {portionsWord(portions)}</p>
          <h1 className="text-3xl font-black tracking-tight">{recipe.title}</h1>
          <p className="text-ink-soft">{versionLine(version)}</p>
        </div>
        {recipe.photoUrl && (
          <img src={recipe.photoUrl} alt={`The dish: ${recipe.title}`} className="aspect-[4/3] w-full shrink-0 rounded-field object-cover sm:w-56 print:w-44" />
        )}
      </header>

      <p className="rounded-field border-2 border-honey-600 bg-honey-50 px-4 py-2.5 font-bold text-honey-800 print:bg-transparent">
        {prep.allergens.length > 0 ? `Contains ${allergenWords(prep.allergens).toLowerCase()}.` : 'No major allergens found in the matched foods.'} Check every
        package label.
        {unmatched > 0 && (
          <span className="block text-sm font-semibold">{unmatched === 1 ? 'One line was' : `${unmatched} lines were`} not checked: no catalogue match.</span>
        )}
      </p>

      <div className="grid gap-6 sm:grid-cols-[minmax(0,3fr)_minmax(0,2fr)] print:grid-cols-[minmax(0,3fr)_minmax(0,2fr)] print:gap-4">
        <section aria-labelledby="card-weights" className="flex flex-col gap-2 print:break-inside-avoid">
          <SectionHeading id="card-weights">Weigh it raw, in grams</SectionHeading>
          <WeightsTable perPortion={prep.perPortion} batch={prep.batch} portions={portions} compact />
        </section>
        <ServingPanel label={prep.label} className="self-start" />
      </div>

      <section aria-labelledby="card-method" className="flex flex-col gap-2">
        <SectionHeading id="card-method">Method</SectionHeading>
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
        {recipe.notes.trim() && (
          <>
            <h3 className="mt-2 font-extrabold">Notes</h3>
            <p className="leading-relaxed whitespace-pre-line">{recipe.notes}</p>
          </>
        )}
      </section>

      <StorageGuide storage={prep.storage} headingLevel={2} className="print:break-inside-avoid" />

      <footer className="border-t border-line pt-3 text-xs leading-relaxed text-ink-soft">
        Hearthswap batch card. Figures are estimates from USDA Standard Reference food values, not medical advice; if you live with a medical condition or food
        allergy, follow your physician or a registered dietitian.
      </footer>
    </article>
  );
}
