import { useId } from 'react';
import type { StorageGuidance } from '../../../../shared/food-safety';
import { cx } from '../../../lib/cx';

function degrees(f: number, c: number): string {
  // a true minus sign reads better than a hyphen: −18 °C
  return `${f} °F (${String(c).replace('-', '−')} °C)`;
}

function Figure({ label, value, note }: { label: string; value: string; note: string }) {
  return (
    <div className="flex min-w-0 flex-col rounded-field border border-herb-200 bg-herb-50 px-3.5 py-2.5 print:border-line print:bg-transparent">
      <dt className="text-sm font-bold text-herb-800">{label}</dt>
      <dd className="text-2xl font-black tabular-nums text-herb-900">{value}</dd>
      <dd className="text-sm text-herb-800">{note}</dd>
    </div>
  );
}

/** Fridge and freezer life, the reheat temperature and every caution that comes with them. */
export function StorageGuide({ storage, headingLevel = 2, className }: { storage: StorageGuidance; headingLevel?: 2 | 3; className?: string }) {
  const Heading = headingLevel === 2 ? 'h2' : 'h3';
  const id = useId();
  return (
    <section aria-labelledby={id} className={cx('flex flex-col gap-3', className)}>
      <Heading id={id} className="text-xl font-extrabold">
        Storing and reheating
      </Heading>
      <dl className="grid grid-cols-1 gap-2 min-[420px]:grid-cols-3 print:grid-cols-3">
        <Figure label="Fridge" value={`${storage.fridgeDays} days`} note={`at ${degrees(storage.fridgeMaxF, storage.fridgeMaxC)} or below`} />
        <Figure label="Freezer" value={`${storage.freezerMonths} months`} note={`best quality, at ${degrees(storage.freezerF, storage.freezerC)}`} />
        <Figure label="Reheat to" value={`${storage.reheatF} °F`} note={`${String(storage.reheatC).replace('-', '−')} °C in the middle, by thermometer`} />
      </dl>
      <ul className="flex flex-col gap-1.5 pl-5 text-ink marker:text-herb-600 list-disc">
        {storage.notes.map((note) => (
          <li key={note} className="pl-1 leading-relaxed">
            {note}
          </li>
        ))}
      </ul>
      <p className="text-xs text-ink-soft">From USDA Food Safety and Inspection Service guidance on leftovers and freezing.</p>
    </section>
  );
}
