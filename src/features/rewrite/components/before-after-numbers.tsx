import { proteinPer100Kcal, type Nutrients } from '../../../../shared/nutrition';
import type { TargetsInput } from '../../../../shared/schemas/rewrite';
import type { TargetName } from '../../../../shared/rewrite/types';
import { Stat } from '../../../components/ui/stat';
import { cx } from '../../../lib/cx';
import { formatNumber } from '../../../lib/format';
import type { UnitSystem } from '../../../lib/user';
import {
  densityDifference,
  everydayVolume,
  formatNutrient,
  meetsTarget,
  nutrientDifference,
  TARGET_ROWS,
  targetText,
  volumeChangeText,
} from '../rewrite-words';
import { DifferenceText } from './difference-text';

const ROWS: { key: keyof Nutrients; label: string; part?: boolean }[] = [
  { key: 'kcal', label: 'Energy' },
  { key: 'proteinG', label: 'Protein' },
  { key: 'carbsG', label: 'Carbohydrate' },
  { key: 'fiberG', label: 'Fiber', part: true },
  { key: 'sugarG', label: 'Sugars', part: true },
  { key: 'fatG', label: 'Fat' },
  { key: 'satFatG', label: 'Saturated fat', part: true },
  { key: 'sodiumMg', label: 'Sodium' },
];

function targetFor(key: keyof Nutrients, targets: TargetsInput): { target: TargetName; value: number } | null {
  const row = TARGET_ROWS.find((r) => r.key === key && targets[r.target] !== undefined);
  return row ? { target: row.target, value: targets[row.target] as number } : null;
}

const density = (n: Nutrients) => `${formatNumber(proteinPer100Kcal(n), 1)} g`;

/** The four figures a cook checks first, each with what it was. */
export function BeforeAfterHeadline({
  before,
  after,
  beforeVolumeMl,
  afterVolumeMl,
  volumeTolerancePct,
  unitSystem,
}: {
  before: Nutrients;
  after: Nutrients;
  beforeVolumeMl: number;
  afterVolumeMl: number;
  volumeTolerancePct: number;
  unitSystem: UnitSystem;
}) {
  return (
    <dl className="grid grid-cols-2 gap-3 lg:grid-cols-4">
      <Stat
        label="Energy per serving"
        value={formatNutrient('kcal', after.kcal)}
        note={
          <>
            was {formatNutrient('kcal', before.kcal)} · <DifferenceText difference={nutrientDifference('kcal', before, after)} />
          </>
        }
      />
      <Stat
        label="Protein per serving"
        value={formatNutrient('proteinG', after.proteinG)}
        note={
          <>
            was {formatNutrient('proteinG', before.proteinG)} · <DifferenceText difference={nutrientDifference('proteinG', before, after)} />
          </>
        }
      />
      <Stat
        label="Protein per 100 kcal"
        value={density(after)}
        note={
          <>
            was {density(before)} · <DifferenceText difference={densityDifference(before, after)} />
          </>
        }
      />
      <Stat
        label="Volume of the dish"
        value={`${formatNumber(afterVolumeMl, 0)} mL`}
        note={
          <>
            {everydayVolume(afterVolumeMl, unitSystem)}
            <span className="block">
              was {formatNumber(beforeVolumeMl, 0)} mL · <span className="font-bold">{volumeChangeText(beforeVolumeMl, afterVolumeMl)}</span> (±
              {formatNumber(volumeTolerancePct, 1)} % allowed)
            </span>
          </>
        }
      />
    </dl>
  );
}

/** Every nutrient per serving as written and after, the difference, and each target with whether it is met. */
export function BeforeAfterNumbers({
  before,
  after,
  afterLabel,
  targets,
  caption,
}: {
  before: Nutrients;
  after: Nutrients;
  afterLabel: string;
  targets: TargetsInput;
  caption: string;
}) {
  return (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse text-sm sm:text-base">
        <caption className="sr-only">{caption}</caption>
        <thead>
          <tr className="border-b-2 border-ink text-ink-soft">
            <th scope="col" className="py-1.5 pr-2 text-left text-sm font-bold">
              Per serving
            </th>
            <th scope="col" className="px-1 py-1.5 text-right text-sm font-bold sm:px-2">
              As written
            </th>
            <th scope="col" className="px-1 py-1.5 text-right text-sm font-bold sm:px-2">
              {afterLabel}
            </th>
            <th scope="col" className="py-1.5 pl-2 text-right text-sm font-bold">
              Change
            </th>
          </tr>
        </thead>
        <tbody>
          {ROWS.map((row) => {
            const target = targetFor(row.key, targets);
            const met = target ? meetsTarget(target.target, target.value, after) : null;
            return (
              <tr key={row.key} className="border-b border-line align-top">
                <th scope="row" className={cx('py-2 pr-2 text-left', row.part ? 'pl-3 font-semibold text-ink-soft' : 'font-bold')}>
                  {row.label}
                  {target && (
                    <span className={cx('block text-xs font-semibold', met ? 'text-herb-700' : 'text-beet-700')}>
                      <span aria-hidden="true">{met ? '✓ ' : '✗ '}</span>
                      target {targetText(target.target, target.value)}: {met ? 'met' : 'not met'}
                    </span>
                  )}
                </th>
                <td className="px-1 py-2 text-right whitespace-nowrap tabular-nums sm:px-2">{formatNutrient(row.key, before[row.key])}</td>
                <td className="px-1 py-2 text-right font-bold whitespace-nowrap tabular-nums sm:px-2">{formatNutrient(row.key, after[row.key])}</td>
                <td className="py-2 pl-2 text-right">
                  <DifferenceText difference={nutrientDifference(row.key, before, after)} />
                </td>
              </tr>
            );
          })}
          <tr className="align-top">
            <th scope="row" className="py-2 pr-2 text-left font-bold">
              Protein per 100 kcal
            </th>
            <td className="px-1 py-2 text-right whitespace-nowrap tabular-nums sm:px-2">{density(before)}</td>
            <td className="px-1 py-2 text-right font-bold whitespace-nowrap tabular-nums sm:px-2">{density(after)}</td>
            <td className="py-2 pl-2 text-right">
              <DifferenceText difference={densityDifference(before, after)} />
            </td>
          </tr>
        </tbody>
      </table>
    </div>
  );
}
