import type { FoodDetail } from '../../../../shared/schemas/analyze';
import { DIET_FLAGS, type DietFlag } from '../../../../shared/food';
import { kcalPerGram, nutrientsForGrams, proteinPer100Kcal } from '../../../../shared/nutrition';
import { ML_PER_CUP } from '../../../../shared/units';
import { Badge } from '../../../components/ui/badge';
import { Card } from '../../../components/ui/card';
import { NutrientTable } from '../../../components/ui/nutrient-table';
import { Stat } from '../../../components/ui/stat';
import { formatEnergyDensity, formatGrams, formatKcal, formatMacroG, formatMg, formatNumber, formatWeight } from '../../../lib/format';
import type { UnitSystem } from '../../../lib/user';
import { DIET_WORDS, foodGroupWords, referenceNumber, roleWords, sourceWords } from '../food-words';

function densityExample(gPerMl: number, unitSystem: UnitSystem): string {
  return unitSystem === 'us' ? `1 cup weighs about ${formatGrams(gPerMl * ML_PER_CUP)}` : `100 mL weighs about ${formatGrams(gPerMl * 100)}`;
}

function PortionsTable({ food, unitSystem }: { food: FoodDetail; unitSystem: UnitSystem }) {
  const headers = ['Weight', 'Energy', 'Protein', 'Carbs', 'Fiber', 'Sugars', 'Fat', 'Sat. fat', 'Sodium'];
  return (
    <div className="overflow-x-auto rounded-field border border-line bg-surface" tabIndex={0} role="region" aria-label="Household measures, scrolls sideways">
      <table className="w-full min-w-[48rem] border-collapse text-sm sm:text-base">
        <caption className="sr-only">Each household measure of {food.name}: its weight and nutrients</caption>
        <thead>
          <tr className="border-b border-line bg-oat-100">
            <th scope="col" className="sticky left-0 z-10 bg-oat-100 px-3 py-2 text-left font-bold">
              Measure
            </th>
            {headers.map((h) => (
              <th key={h} scope="col" className="px-3 py-2 text-right font-bold whitespace-nowrap">
                {h}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {food.portions.map((p, i) => {
            const n = nutrientsForGrams(food.per100g, p.grams);
            return (
              <tr key={`${p.label}-${i}`} className="border-b border-line last:border-b-0">
                <th scope="row" className="sticky left-0 z-10 max-w-48 bg-surface px-3 py-2 text-left font-semibold">
                  {p.label}
                </th>
                <td className="px-3 py-2 text-right tabular-nums whitespace-nowrap">{formatWeight(p.grams, unitSystem)}</td>
                <td className="px-3 py-2 text-right font-bold tabular-nums whitespace-nowrap">{formatKcal(n.kcal)}</td>
                <td className="px-3 py-2 text-right font-bold tabular-nums">{formatMacroG(n.proteinG)}</td>
                <td className="px-3 py-2 text-right tabular-nums">{formatMacroG(n.carbsG)}</td>
                <td className="px-3 py-2 text-right tabular-nums">{formatMacroG(n.fiberG)}</td>
                <td className="px-3 py-2 text-right tabular-nums">{formatMacroG(n.sugarG)}</td>
                <td className="px-3 py-2 text-right tabular-nums">{formatMacroG(n.fatG)}</td>
                <td className="px-3 py-2 text-right tabular-nums">{formatMacroG(n.satFatG)}</td>
                <td className="px-3 py-2 text-right tabular-nums">{formatMg(n.sodiumMg)}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}

export function FoodDetailView({ food, unitSystem }: { food: FoodDetail; unitSystem: UnitSystem }) {
  const per100 = food.per100g;
  const group = foodGroupWords(food.foodGroup);
  const diet = new Set(food.diet);
  return (
    <div className="flex flex-col gap-8">
      <div className="flex flex-wrap items-center gap-2 text-ink-soft">
        {group && <span className="font-semibold">{group}</span>}
        {group && <span aria-hidden="true">·</span>}
        <span>{sourceWords(food)}</span>
        {referenceNumber(food) && (
          <details className="text-sm">
            <summary className="cursor-pointer underline-offset-2 hover:underline">Reference number</summary>
            {referenceNumber(food)}
          </details>
        )}
        {food.branded && <Badge>Brand or restaurant entry</Badge>}
      </div>

      <dl className="grid grid-cols-2 gap-3 sm:grid-cols-4">
        <Stat label="Energy" value={formatKcal(per100.kcal)} note="per 100 g" />
        <Stat label="Protein" value={formatMacroG(per100.proteinG)} note="per 100 g" />
        <Stat label="Protein density" value={`${formatNumber(proteinPer100Kcal(per100), 1)} g`} note="protein per 100 kcal" />
        <Stat label="Energy density" value={formatEnergyDensity(kcalPerGram(per100, 100))} note="the lower, the lighter" />
      </dl>

      <div className="grid gap-6 lg:grid-cols-2">
        <Card title="In 100 g" headingLevel={2}>
          <NutrientTable
            caption={`Nutrients in 100 g of ${food.name}`}
            captionHidden
            columns={[{ key: 'per100g', header: 'Per 100 g', values: per100 }]}
            extraRows={per100.waterG === null ? [] : [{ key: 'water', label: 'Water', cells: [formatMacroG(per100.waterG)] }]}
          />
        </Card>
        <Card title="In the dish" headingLevel={2}>
          <dl className="flex flex-col gap-4">
            <div>
              <dt className="font-bold">Density</dt>
              <dd className="text-ink-soft">
                <span className="tabular-nums">{formatNumber(food.densityGPerMl, 2)} g per mL</span>: {densityExample(food.densityGPerMl, unitSystem)}.
              </dd>
            </div>
            <div>
              <dt className="font-bold">Parts it can play</dt>
              <dd className="mt-1 flex flex-wrap gap-1.5">
                {food.roles.length === 0 ? (
                  <span className="text-ink-soft">None recorded</span>
                ) : (
                  food.roles.map((r) => (
                    <Badge key={r} tone="ember">
                      {roleWords(r)}
                    </Badge>
                  ))
                )}
              </dd>
            </div>
            <div>
              <dt className="font-bold">Diets</dt>
              <dd className="mt-1">
                <ul className="flex flex-wrap gap-1.5">
                  {DIET_FLAGS.map((flag: DietFlag) => (
                    <li key={flag}>
                      <Badge tone={diet.has(flag) ? 'herb' : 'neutral'}>
                        <span aria-hidden="true">{diet.has(flag) ? '✓' : '✗'}</span>
                        {diet.has(flag) ? DIET_WORDS[flag].yes : DIET_WORDS[flag].no}
                      </Badge>
                    </li>
                  ))}
                </ul>
              </dd>
            </div>
          </dl>
        </Card>
      </div>

      <section aria-labelledby="food-portions" className="flex flex-col gap-3">
        <h2 id="food-portions" className="text-xl font-extrabold">
          Household measures
        </h2>
        {food.portions.length === 0 ? (
          <p className="text-ink-soft">The catalogue gives no household measure for this food; weigh it in grams.</p>
        ) : (
          <>
            <p className="text-ink-soft">What each measure weighs and holds, worked out from the values per 100 g.</p>
            <PortionsTable food={food} unitSystem={unitSystem} />
          </>
        )}
      </section>
    </div>
  );
}
