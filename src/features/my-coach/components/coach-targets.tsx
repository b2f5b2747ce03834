import type { ClientTargets } from '../../../../shared/schemas/coaching';
import { Stat } from '../../../components/ui/stat';
import { formatKcal, formatMacroG, formatMg, formatNumber } from '../../../lib/format';

/** The targets a coach set, per meal first, as the client reads them. */
export function CoachTargets({ targets, coachName }: { targets: ClientTargets; coachName: string }) {
  const daily = [
    targets.kcalPerDay !== undefined && { label: 'Energy a day', value: formatKcal(targets.kcalPerDay) },
    targets.proteinGPerDay !== undefined && { label: 'Protein a day', value: formatMacroG(targets.proteinGPerDay) },
    targets.mealsPerDay !== undefined && { label: 'Meals a day', value: formatNumber(targets.mealsPerDay) },
    targets.fiberMinG !== undefined && { label: 'Fiber per meal, at least', value: formatMacroG(targets.fiberMinG) },
    targets.sodiumMaxMg !== undefined && { label: 'Sodium per meal, at most', value: formatMg(targets.sodiumMaxMg) },
  ].filter((x): x is { label: string; value: string } => Boolean(x));

  return (
    <div className="flex flex-col gap-4">
      <dl className="grid grid-cols-2 gap-3">
        <Stat label="Per meal, at most" value={formatKcal(targets.perMeal.kcal)} note="energy" className="border-ember-200 bg-ember-50" />
        <Stat label="Per meal, at least" value={formatMacroG(targets.perMeal.proteinG)} note="protein" className="border-herb-200 bg-herb-50" />
      </dl>
      {daily.length > 0 && (
        <dl className="grid gap-x-6 gap-y-1 sm:grid-cols-2">
          {daily.map((d) => (
            <div key={d.label} className="flex justify-between gap-3 border-b border-line py-1.5">
              <dt className="text-ink-soft">{d.label}</dt>
              <dd className="font-bold tabular-nums">{d.value}</dd>
            </div>
          ))}
        </dl>
      )}
      {targets.note && (
        <figure className="rounded-field border-l-4 border-accent bg-oat-100 px-4 py-3">
          <blockquote className="whitespace-pre-line text-ink">{targets.note}</blockquote>
          <figcaption className="mt-1 text-sm text-ink-soft">— {coachName}</figcaption>
        </figure>
      )}
      <p className="text-sm text-ink-soft">
        A rewrite aims for these per serving unless you set other targets for it. They are estimates, not medical advice: if you have a medical condition, are
        pregnant or breastfeeding, follow your physician or a registered dietitian.
      </p>
    </div>
  );
}
