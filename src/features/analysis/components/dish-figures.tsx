import type { AnalyzeResponse } from '../../../../shared/schemas/analyze';
import { kcalPerGram, proteinPer100Kcal } from '../../../../shared/nutrition';
import { Card } from '../../../components/ui/card';
import { NutrientTable } from '../../../components/ui/nutrient-table';
import { Stat } from '../../../components/ui/stat';
import { formatEnergyDensity, formatKcal, formatMacroG, formatNumber, formatWeight } from '../../../lib/format';
import type { UnitSystem } from '../../../lib/user';
import { servingVolumeMl } from '../../../../shared/shown-figures';
import { formatVolume } from '../amount-words';

/** The headline figures of one serving: energy, protein and the two quick judges of a dish. */
export function ServingHeadline({ analysis }: { analysis: AnalyzeResponse }) {
  const serving = analysis.perServing;
  return (
    <dl className="grid grid-cols-2 gap-3 lg:grid-cols-4">
      <Stat label="Energy per serving" value={formatKcal(serving.kcal)} note={`of ${formatKcal(analysis.totals.kcal)} in the dish`} />
      <Stat label="Protein per serving" value={formatMacroG(serving.proteinG)} note={`of ${formatNumber(analysis.totals.proteinG, 0)} g in the dish`} />
      <Stat label="Protein density" value={`${formatNumber(proteinPer100Kcal(serving), 1)} g`} note="protein per 100 kcal" />
      <Stat label="Energy density" value={formatEnergyDensity(kcalPerGram(analysis.totals, analysis.totalGrams))} note="kcal per gram of dish" />
    </dl>
  );
}

/** Every nutrient per serving and for the whole dish, with the dish's weight and volume. */
export function DishPanels({ analysis, unitSystem }: { analysis: AnalyzeResponse; unitSystem: UnitSystem }) {
  const servings = analysis.servings;
  const perServingGrams = analysis.totalGrams / servings;
  const perServingMl = servingVolumeMl(analysis.volumeMl, servings);
  return (
    <div className="grid gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
      <Card title="Nutrients" headingLevel={3} description={`One serving is 1/${servings} of the dish. Shown rounded; every sum is worked out unrounded.`}>
        <NutrientTable
          caption="Nutrients per serving and in the whole dish"
          captionHidden
          columns={[
            { key: 'serving', header: 'Per serving', values: analysis.perServing },
            { key: 'dish', header: 'Whole dish', values: analysis.totals },
          ]}
          extraRows={[
            {
              key: 'p100',
              label: 'Protein per 100 kcal',
              cells: [`${formatNumber(proteinPer100Kcal(analysis.perServing), 1)} g`, `${formatNumber(proteinPer100Kcal(analysis.totals), 1)} g`],
            },
          ]}
        />
      </Card>
      <Card title="Size of the dish" headingLevel={3} description="What the pan holds, and what one plate gets.">
        <dl className="grid gap-4">
          <div>
            <dt className="font-bold">Weight</dt>
            <dd className="tabular-nums">
              {formatWeight(analysis.totalGrams, unitSystem)} in all; {formatWeight(perServingGrams, unitSystem)} a serving
            </dd>
          </div>
          <div>
            <dt className="font-bold">Volume</dt>
            <dd className="tabular-nums">
              {formatVolume(analysis.volumeMl, unitSystem)} in all; {formatVolume(perServingMl, unitSystem)} a serving
            </dd>
          </div>
          <div>
            <dt className="font-bold">Energy density</dt>
            <dd className="tabular-nums">{formatEnergyDensity(kcalPerGram(analysis.totals, analysis.totalGrams))}</dd>
          </div>
        </dl>
      </Card>
    </div>
  );
}
