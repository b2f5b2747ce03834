import type { VersionDetail } from '../../../../shared/schemas/recipes';
import { NutrientTable } from '../../../components/ui/nutrient-table';
import { DataTable } from '../../../components/ui/table';
import { Stat } from '../../../components/ui/stat';
import { formatKcal, formatMacroG, formatMg, formatNumber, formatProteinDensity, formatWeight } from '../../../lib/format';
import type { UnitSystem } from '../../../lib/user';
import { versionNote } from '../../../lib/version-kinds';
import type { ClientTargets } from '../api/clients';
import { meetsPerMeal } from '../targets-form';

function TargetsUsed({ targets }: { targets: NonNullable<VersionDetail['targets']> }) {
  const parts = [
    `protein at least ${formatMacroG(targets.proteinMinG)}`,
    `energy at most ${formatKcal(targets.kcalMax)}`,
    targets.fiberMinG !== undefined && `fiber at least ${formatMacroG(targets.fiberMinG)}`,
    targets.fatMaxG !== undefined && `fat at most ${formatMacroG(targets.fatMaxG)}`,
    targets.satFatMaxG !== undefined && `saturated fat at most ${formatMacroG(targets.satFatMaxG)}`,
    targets.sodiumMaxMg !== undefined && `sodium at most ${formatMg(targets.sodiumMaxMg)}`,
    targets.sugarMaxG !== undefined && `sugars at most ${formatMacroG(targets.sugarMaxG)}`,
  ].filter(Boolean);
  return <p className="text-ink-soft">Rewritten for, per serving: {parts.join(', ')}.</p>;
}

/** One saved version, read-only: its lines with weights and figures, and its nutrients per serving. */
export function VersionReview({ version, unitSystem, clientTargets }: { version: VersionDetail; unitSystem: UnitSystem; clientTargets: ClientTargets | null }) {
  const per = version.perServing;
  const density = per.kcal > 0 ? (per.proteinG * 100) / per.kcal : null;
  const servings = version.servings;
  const meets = meetsPerMeal(per, clientTargets);
  const note = versionNote(version);

  return (
    <div className="flex flex-col gap-6">
      <dl className="grid grid-cols-2 gap-3 sm:grid-cols-4">
        <Stat
          label="Energy / serving"
          value={formatKcal(per.kcal)}
          note={clientTargets ? `target at most ${formatKcal(clientTargets.perMeal.kcal)}` : undefined}
          className={meets && !meets.kcal ? 'border-ember-300 bg-ember-50' : undefined}
        />
        <Stat
          label="Protein / serving"
          value={formatMacroG(per.proteinG)}
          note={clientTargets ? `target at least ${formatMacroG(clientTargets.perMeal.proteinG)}` : undefined}
          className={meets && !meets.protein ? 'border-honey-200 bg-honey-50' : undefined}
        />
        <Stat label="Protein density" value={density === null ? '—' : formatNumber(density, 1)} note="g protein / 100 kcal" />
        <Stat
          label="Servings"
          value={formatNumber(servings)}
          note={`${formatWeight(version.lines.reduce((sum, l) => sum + l.grams, 0) / Math.max(1, servings), unitSystem)} each`}
        />
      </dl>

      {note && (
        <p className="rounded-field border-l-4 border-accent bg-oat-100 px-4 py-3 text-ink">
          <span className="font-bold">Their note: </span>
          {note}
        </p>
      )}
      {version.targets && <TargetsUsed targets={version.targets} />}

      <section aria-labelledby="review-lines" className="flex flex-col gap-3">
        <h2 id="review-lines" className="text-xl font-extrabold text-ink">
          Ingredients
        </h2>
        <DataTable
          caption="Ingredient lines with weight, energy and protein for the whole dish"
          captionHidden
          cardsBelow="sm"
          cardColumns={3}
          rows={version.lines}
          rowKey={(_, i) => i}
          columns={[
            { key: 'line', header: 'Line', rowHeader: true, className: 'font-semibold', cell: (line) => line.input },
            { key: 'food', header: 'Food', cardWide: true, className: 'text-ink-soft', cell: (line) => line.foodName ?? 'Not matched' },
            { key: 'weight', header: 'Weight', align: 'right', className: 'whitespace-nowrap', cell: (line) => formatWeight(line.grams, unitSystem) },
            { key: 'kcal', header: 'Energy', align: 'right', className: 'whitespace-nowrap', cell: (line) => formatKcal(line.nutrients.kcal) },
            { key: 'protein', header: 'Protein', align: 'right', className: 'whitespace-nowrap', cell: (line) => formatMacroG(line.nutrients.proteinG) },
          ]}
        />
        <p className="text-sm text-ink-soft">Weights and figures are for the whole dish.</p>
      </section>

      <section aria-labelledby="review-nutrients" className="flex flex-col gap-3">
        <h2 id="review-nutrients" className="text-xl font-extrabold text-ink">
          Nutrients
        </h2>
        <div className="rounded-card border border-line bg-surface p-4 sm:max-w-lg">
          <NutrientTable
            caption="Nutrients per serving and for the whole dish"
            captionHidden
            columns={[
              { key: 'serving', header: 'Per serving', values: per },
              { key: 'dish', header: `Whole dish (${servings})`, values: version.totals },
            ]}
          />
        </div>
        {density !== null && <p className="text-sm text-ink-soft">{formatProteinDensity(density)} per serving.</p>}
      </section>
    </div>
  );
}
