import { proteinPer100Kcal, type Nutrients } from '../../../../shared/nutrition';
import type { TargetsInput } from '../../../../shared/schemas/rewrite';
import type { TargetName } from '../../../../shared/rewrite/types';
import { NUTRIENT_ROWS } from '../../../components/ui/nutrient-table';
import { DataTable } from '../../../components/ui/table';
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
  type Row = { key: keyof Nutrients | 'density'; label: string; part?: boolean };
  const rows: Row[] = [...NUTRIENT_ROWS, { key: 'density', label: 'Protein per 100 kcal' }];
  const shown = (key: Row['key'], n: Nutrients) => (key === 'density' ? density(n) : formatNutrient(key, n[key]));
  return (
    <DataTable<Row>
      caption={caption}
      captionHidden
      look="plain"
      rows={rows}
      rowKey={(r) => r.key}
      columns={[
        {
          key: 'label',
          header: 'Per serving',
          headerClassName: 'max-sm:pr-0.5',
          rowHeader: true,
          className: (r) => cx('py-2 max-sm:pr-0.5', r.part ? 'pl-3 font-semibold text-ink-soft' : 'font-bold'),
          cell: (r) => {
            const target = r.key === 'density' ? null : targetFor(r.key, targets);
            const met = target ? meetsTarget(target.target, target.value, after) : null;
            return (
              <>
                {r.label}
                {target && (
                  <span className={cx('block text-xs font-semibold', met ? 'text-herb-700' : 'text-beet-700')}>
                    <span aria-hidden="true">{met ? '✓ ' : '✗ '}</span>
                    target {targetText(target.target, target.value)}: {met ? 'met' : 'not met'}
                  </span>
                )}
              </>
            );
          },
        },
        {
          key: 'before',
          header: 'As written',
          headerClassName: 'max-sm:px-0.5',
          align: 'right',
          className: 'py-2 whitespace-nowrap max-sm:px-0.5',
          cell: (r) => shown(r.key, before),
        },
        {
          key: 'after',
          header: afterLabel,
          headerClassName: 'max-sm:px-0.5',
          align: 'right',
          className: 'py-2 font-bold whitespace-nowrap max-sm:px-0.5',
          cell: (r) => shown(r.key, after),
        },
        {
          key: 'change',
          header: 'Change',
          headerClassName: 'max-sm:pl-0.5',
          align: 'right',
          className: 'py-2 max-sm:pl-0.5',
          // on a phone "−154 kcal" may break after its number, so the four columns fit a 360 px screen
          cell: (r) => (
            <DifferenceText
              className="max-sm:flex-wrap max-sm:justify-end max-sm:gap-x-1 max-sm:whitespace-normal"
              difference={r.key === 'density' ? densityDifference(before, after) : nutrientDifference(r.key, before, after)}
            />
          ),
        },
      ]}
    />
  );
}
