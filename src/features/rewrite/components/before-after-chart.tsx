import { Bar, BarChart, CartesianGrid, Rectangle, type BarShapeProps, LabelList, Legend, ReferenceLine, Tooltip, XAxis, YAxis } from 'recharts';
import type { Nutrients } from '../../../../shared/nutrition';
import { formatNumber } from '../../../lib/format';

// Theme colours by their CSS variables, so the chart follows the palette in src/styles/index.css.
const BEFORE = 'var(--color-oat-400)';
const AFTER = 'var(--color-herb-600)';
const CEILING = 'var(--color-ember-600)';
const GRID = 'var(--color-oat-200)';
const TICK = { fill: 'var(--color-oat-700)', fontSize: 13 };

export interface BeforeAfterChartProps {
  before: Nutrients;
  after: Nutrients;
  /** "Rewritten", "Closest plan" */
  afterLabel: string;
  kcalMax?: number;
  proteinMinG?: number;
}

const GRAM_ROWS: { key: keyof Nutrients; label: string }[] = [
  { key: 'proteinG', label: 'Protein' },
  { key: 'carbsG', label: 'Carbs' },
  { key: 'fatG', label: 'Fat' },
  { key: 'fiberG', label: 'Fiber' },
];

const grams = (v: unknown) => `${formatNumber(Number(v), Number(v) < 10 ? 1 : 0)} g`;
const kcal = (v: unknown) => `${formatNumber(Number(v), 0)} kcal`;

// Each energy bar takes its own colour from its row.
function energyBar(props: BarShapeProps) {
  return <Rectangle {...props} fill={(props.payload as { fill?: string } | undefined)?.fill ?? AFTER} />;
}

/**
 * One serving before and after, for a glance: calories as two bars against the ceiling, and the
 * macronutrients in grams side by side. The exact numbers are in the table beside it.
 */
export function BeforeAfterChart({ before, after, afterLabel, kcalMax, proteinMinG }: BeforeAfterChartProps) {
  const energy = [
    { label: 'As written', kcal: before.kcal, fill: BEFORE },
    { label: afterLabel, kcal: after.kcal, fill: AFTER },
  ];
  const macros = GRAM_ROWS.map((row) => ({ label: row.label, before: before[row.key], after: after[row.key] }));

  return (
    <div className="grid gap-6 md:grid-cols-[minmax(0,2fr)_minmax(0,3fr)]">
      <figure className="flex min-w-0 flex-col gap-2">
        <figcaption className="font-bold">
          Calories per serving
          {kcalMax !== undefined && <span className="block text-sm font-normal text-ink-soft">Dashed line: your ceiling, {kcal(kcalMax)}</span>}
        </figcaption>
        <BarChart
          responsive
          data={energy}
          layout="vertical"
          style={{ width: '100%', height: 170 }}
          margin={{ top: 8, right: 72, bottom: 0, left: 0 }}
          accessibilityLayer
          title={`Calories per serving: ${kcal(before.kcal)} as written, ${kcal(after.kcal)} ${afterLabel.toLowerCase()}`}
        >
          <CartesianGrid horizontal={false} stroke={GRID} />
          <XAxis type="number" domain={[0, 'auto']} tick={TICK} tickFormatter={(v) => formatNumber(v, 0)} allowDecimals={false} />
          <YAxis type="category" dataKey="label" tick={TICK} width={92} />
          <Tooltip formatter={(v) => kcal(v)} cursor={{ fill: 'var(--color-oat-100)' }} />
          <Bar dataKey="kcal" name="Calories" isAnimationActive={false} radius={[0, 6, 6, 0]} barSize={30} shape={energyBar}>
            <LabelList dataKey="kcal" position="right" formatter={kcal} fill="var(--color-oat-900)" fontWeight={700} fontSize={13} />
          </Bar>
          {kcalMax !== undefined && <ReferenceLine x={kcalMax} stroke={CEILING} strokeWidth={2} strokeDasharray="6 4" ifOverflow="extendDomain" />}
        </BarChart>
      </figure>

      <figure className="flex min-w-0 flex-col gap-2">
        <figcaption className="font-bold">
          Grams per serving
          {proteinMinG !== undefined && <span className="block text-sm font-normal text-ink-soft">Your protein floor: {grams(proteinMinG)}</span>}
        </figcaption>
        <BarChart
          responsive
          data={macros}
          style={{ width: '100%', height: 250 }}
          margin={{ top: 20, right: 4, bottom: 0, left: -12 }}
          barGap={2}
          accessibilityLayer
          title="Protein, carbohydrate, fat and fiber per serving, as written and rewritten"
        >
          <CartesianGrid vertical={false} stroke={GRID} />
          <XAxis dataKey="label" tick={TICK} interval={0} />
          <YAxis tick={TICK} tickFormatter={(v) => formatNumber(v, 0)} width={44} />
          <Tooltip formatter={(v) => grams(v)} cursor={{ fill: 'var(--color-oat-100)' }} />
          <Legend verticalAlign="bottom" iconType="square" wrapperStyle={{ fontSize: 14, color: 'var(--color-oat-800)' }} />
          <Bar dataKey="before" name="As written" fill={BEFORE} isAnimationActive={false} radius={[4, 4, 0, 0]}>
            <LabelList dataKey="before" position="top" formatter={(v: unknown) => formatNumber(Number(v), 0)} fill="var(--color-oat-700)" fontSize={12} />
          </Bar>
          <Bar dataKey="after" name={afterLabel} fill={AFTER} isAnimationActive={false} radius={[4, 4, 0, 0]}>
            <LabelList
              dataKey="after"
              position="top"
              formatter={(v: unknown) => formatNumber(Number(v), 0)}
              fill="var(--color-herb-800)"
              fontSize={12}
              fontWeight={700}
            />
          </Bar>
        </BarChart>
      </figure>
    </div>
  );
}
