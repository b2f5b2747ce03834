import { useId } from 'react';
import type { LabelPanel } from '../../../../shared/label-rounding';
import type { Nutrients } from '../../../../shared/nutrition';
import { NutrientTable } from '../../../components/ui/nutrient-table';
import { cx } from '../../../lib/cx';

interface PanelRow {
  key: keyof LabelPanel;
  label: string;
  /** a part of the row above (saturated fat of fat; fiber and sugars of carbohydrate) */
  part?: boolean;
}

const ROWS: readonly PanelRow[] = [
  { key: 'totalFatG', label: 'Fat' },
  { key: 'satFatG', label: 'Saturated fat', part: true },
  { key: 'sodiumMg', label: 'Sodium' },
  { key: 'carbsG', label: 'Carbohydrate' },
  { key: 'fiberG', label: 'Fiber', part: true },
  { key: 'sugarG', label: 'Sugars', part: true },
  { key: 'proteinG', label: 'Protein' },
];

export interface ServingPanelProps {
  label: LabelPanel;
  /** the unrounded figures, shown on request */
  perServing?: Nutrients;
  className?: string;
}

/**
 * One serving at a glance, rounded the way US food labels round (21 CFR 101.9(c)); the server does the
 * rounding, this shows its text.
 */
export function ServingPanel({ label, perServing, className }: ServingPanelProps) {
  const id = useId();
  return (
    <section aria-labelledby={id} className={cx('overflow-hidden rounded-card border-2 border-ink bg-surface print:break-inside-avoid', className)}>
      <div className="flex items-baseline justify-between gap-3 bg-ink px-4 py-2.5 text-canvas print:bg-transparent print:text-ink print:border-b-2 print:border-ink">
        <h2 id={id} className="text-lg font-black tracking-tight">
          Per serving
        </h2>
        <p className="text-sm font-bold">Serving size {label.servingSizeG.text}</p>
      </div>
      <div className="flex items-end justify-between gap-3 border-b-4 border-ink px-4 pt-3 pb-2">
        <p className="font-extrabold">Calories</p>
        <p className="text-4xl leading-none font-black tabular-nums" aria-label={`${label.calories.text} calories`}>
          {label.calories.text}
        </p>
      </div>
      <dl className="px-4 pb-1">
        {ROWS.map((row) => {
          const value = label[row.key];
          return (
            <div
              key={row.key}
              className={cx('flex justify-between gap-3 border-b border-line py-1.5 last:border-b-0', row.key === 'proteinG' && 'border-t-2 border-t-ink')}
            >
              <dt className={row.part ? 'pl-4 text-ink-soft' : 'font-extrabold'}>{row.label}</dt>
              <dd className={cx('tabular-nums', row.part ? 'text-ink-soft' : 'font-extrabold')}>{value.text}</dd>
            </div>
          );
        })}
      </dl>
      <p className="border-t border-line bg-oat-50 px-4 py-2 text-xs leading-relaxed text-ink-soft print:bg-transparent">
        Rounded as US food labels round them (FDA, 21 CFR 101.9(c)). Estimates from USDA food values, not a legal label and not medical advice.
      </p>
      {perServing && (
        <details className="border-t border-line px-4 py-2 print:hidden">
          <summary className="cursor-pointer rounded-field text-sm font-bold text-accent">Unrounded figures</summary>
          <NutrientTable
            caption="Per serving, unrounded"
            captionHidden
            columns={[{ key: 'serving', header: 'Per serving', values: perServing }]}
            className="mt-2 text-sm"
          />
        </details>
      )}
    </section>
  );
}
