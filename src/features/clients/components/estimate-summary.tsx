import { Alert } from '../../../components/ui/alert';
import { Stat } from '../../../components/ui/stat';
import { formatKcal, formatMacroG, formatNumber } from '../../../lib/format';
import { mealTargets } from '../../../../shared/shown-figures';
import type { TargetEstimate } from '../api/estimate-targets';
import { countOf } from '../../../lib/words';

/** What the estimate worked out, with its cautions first. */
export function EstimateSummary({ estimate, mealsPerDay }: { estimate: TargetEstimate; mealsPerDay: number }) {
  // The figures "Use these targets" saves, so the summary and the saved targets read the same.
  const rounded = mealTargets(estimate.kcalPerDay, estimate.proteinGPerDay, mealsPerDay);
  return (
    <div className="flex flex-col gap-4">
      <Alert tone="caution" title="Read before using these numbers">
        <ul className="flex list-disc flex-col gap-1.5 pl-5">
          {estimate.cautions.map((caution) => (
            <li key={caution}>{caution}</li>
          ))}
        </ul>
      </Alert>
      <dl className="grid grid-cols-2 gap-3">
        <Stat
          label="Per meal, energy"
          value={formatKcal(rounded.perMeal.kcal)}
          note={`over ${countOf(mealsPerDay, 'meal')}`}
          className="border-ember-200 bg-ember-50"
        />
        <Stat label="Per meal, protein" value={formatMacroG(rounded.perMeal.proteinG)} note="at least" className="border-herb-200 bg-herb-50" />
      </dl>
      <dl className="flex flex-col">
        {[
          ['Resting energy (Mifflin–St Jeor)', formatKcal(estimate.bmrKcal)],
          ['With their activity', formatKcal(estimate.tdeeKcal)],
          ['Energy a day for the goal', formatKcal(rounded.kcalPerDay)],
          ['Protein a day', `${formatMacroG(rounded.proteinGPerDay)} (${formatNumber(estimate.proteinGPerKg, 1)} g/kg)`],
        ].map(([label, value]) => (
          <div key={label} className="flex justify-between gap-3 border-b border-line py-1.5">
            <dt className="text-ink-soft">{label}</dt>
            <dd className="text-right font-bold whitespace-nowrap tabular-nums">{value}</dd>
          </div>
        ))}
      </dl>
    </div>
  );
}
