import type { FoodDetail } from '../../../../shared/schemas/analyze';
import { DIET_FLAGS, type DietFlag } from '../../../../shared/food';
import { kcalPerGram, nutrientsForGrams, proteinPer100Kcal, type Nutrients } from '../../../../shared/nutrition';
import { ML_PER_CUP } from '../../../../shared/units';
import { Badge } from '../../../components/ui/badge';
import { Card } from '../../../components/ui/card';
import { NutrientTable } from '../../../components/ui/nutrient-table';
import { DataTable } from '../../../components/ui/table';
import { Stat } from '../../../components/ui/stat';
import { formatEnergyDensity, formatGrams, formatKcal, formatMacroG, formatMg, formatNumber, formatWeight } from '../../../lib/format';
import { cx } from '../../../lib/cx';
import type { UnitSystem } from '../../../lib/user';
import { DIET_WORDS, foodGroupWords, referenceNumber, roleWords, sourceWords } from '../food-words';

function densityExample(gPerMl: number, unitSystem: UnitSystem): string {
  return unitSystem === 'us' ? `1 cup weighs about ${formatGrams(gPerMl * ML_PER_CUP)}` : `100 mL weighs about ${formatGrams(gPerMl * 100)}`;
}

type Portion = FoodDetail['portions'][number];

const PORTION_FIGURES: { key: keyof Nutrients; header: string; format: (value: number) => string; bold?: boolean }[] = [
  { key: 'kcal', header: 'Energy', format: formatKcal, bold: true },
  { key: 'proteinG', header: 'Protein', format: formatMacroG, bold: true },
  { key: 'carbsG', header: 'Carbs', format: formatMacroG },
  { key: 'fiberG', header: 'Fiber', format: formatMacroG },
  { key: 'sugarG', header: 'Sugars', format: formatMacroG },
  { key: 'fatG', header: 'Fat', format: formatMacroG },
  { key: 'satFatG', header: 'Sat. fat', format: formatMacroG },
  { key: 'sodiumMg', header: 'Sodium', format: formatMg },
];

function PortionsTable({ food, unitSystem }: { food: FoodDetail; unitSystem: UnitSystem }) {
  const figures = (p: Portion) => nutrientsForGrams(food.per100g, p.grams);
  return (
    <DataTable<Portion>
      caption={`Each household measure of ${food.name}: its weight and nutrients`}
      captionHidden
      density="snug"
      striped={false}
      scrollLabel="Household measures, scrolls sideways"
      className="rounded-field"
      tableClassName="min-w-[48rem]"
      rows={food.portions}
      rowKey={(p, i) => `${p.label}-${i}`}
      columns={[
        {
          key: 'measure',
          header: 'Measure',
          rowHeader: true,
          headerClassName: 'sticky left-0 z-10 bg-oat-100',
          className: 'sticky left-0 z-10 max-w-48 bg-surface font-semibold',
          cell: (p) => p.label,
        },
        {
          key: 'weight',
          header: 'Weight',
          align: 'right',
          headerClassName: 'whitespace-nowrap',
          className: 'whitespace-nowrap',
          cell: (p) => formatWeight(p.grams, unitSystem),
        },
        ...PORTION_FIGURES.map((f) => ({
          key: f.key,
          header: f.header,
          align: 'right' as const,
          headerClassName: 'whitespace-nowrap',
          className: cx('whitespace-nowrap', f.bold && 'font-bold'),
          cell: (p: Portion) => f.format(figures(p)[f.key]),
        })),
      ]}
    />
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
