import type { VersionDetail } from '../../../../shared/schemas/recipes';
import { Badge, type BadgeTone } from '../../../components/ui/badge';
import { DataTable, headerWithUnit } from '../../../components/ui/table';
import { Card } from '../../../components/ui/card';
import { NUTRIENT_ROWS } from '../../../components/ui/nutrient-table';
import { cx } from '../../../lib/cx';
import { formatGrams, formatKcal, formatMacroG, formatNumber } from '../../../lib/format';
import { compareLines, rewrittenInPlace, type LineChange, type LineChangeKind } from '../compare-lines';
import { formatWhen } from '../../../lib/dates';
import { nutrientChange, type DifferenceTone as ChangeTone, type Difference as NutrientChange } from '../../../lib/nutrient-difference';
import { servingVolumeMl } from '../../../../shared/shown-figures';
import { versionKindLabel, versionNote, writtenLine } from '../version-words';

const MINUS = '\u2212';

const KIND_WORDS: Record<LineChangeKind, { label: string; tone: BadgeTone }> = {
  same: { label: 'Same', tone: 'neutral' },
  more: { label: 'More', tone: 'honey' },
  less: { label: 'Less', tone: 'honey' },
  swapped: { label: 'Swapped', tone: 'ember' },
  added: { label: 'Added', tone: 'herb' },
  removed: { label: 'Removed', tone: 'beet' },
};

const TONE_CLASSES: Record<ChangeTone, string> = {
  better: 'bg-herb-50 text-herb-800 border-herb-200',
  worse: 'bg-beet-50 text-beet-800 border-beet-200',
  neutral: 'bg-oat-100 text-ink-soft border-oat-200',
};
const TONE_WORDS: Record<ChangeTone, string> = {
  better: 'lighter or more filling',
  worse: 'heavier or less filling',
  neutral: '',
};

/** A signed difference in its colour; the sign and the words carry it without the colour. */
function ChangeChip({ change, className }: { change: NutrientChange; className?: string }) {
  return (
    <span
      className={cx(
        'inline-flex items-center rounded-pill border px-2 py-0.5 text-sm font-extrabold whitespace-nowrap tabular-nums',
        TONE_CLASSES[change.tone],
        className,
      )}
    >
      {change.text}
      {change.tone !== 'neutral' && <span className="sr-only"> ({TONE_WORDS[change.tone]})</span>}
    </span>
  );
}

function VersionHeading({ version, side }: { version: VersionDetail; side: 'Before' | 'After' }) {
  const note = versionNote(version);
  return (
    <div className={cx('flex flex-col gap-1 rounded-card border bg-surface p-4 shadow-card', side === 'After' ? 'border-accent' : 'border-line')}>
      <p className="text-sm font-bold tracking-wide text-ink-soft uppercase">{side}</p>
      <h2 className="text-lg font-extrabold text-ink">
        Version {version.number} · {versionKindLabel(version.kind, version.note)}
      </h2>
      {note && <p className="text-ink">{note}</p>}
      <p className="text-sm text-ink-soft">
        {version.servings} servings · saved {formatWhen(version.createdAt).toLowerCase()}
      </p>
      <p className="mt-1 text-2xl font-black tabular-nums">
        {formatKcal(version.perServing.kcal)}
        <span className="text-base font-bold text-ink-soft"> · </span>
        {formatMacroG(version.perServing.proteinG)} <span className="text-base font-bold text-ink-soft">protein per serving</span>
      </p>
    </div>
  );
}

function NutrientDifferences({ a, b }: { a: VersionDetail; b: VersionDetail }) {
  const volumeA = servingVolumeMl(a.volumeMl, a.servings);
  const volumeB = servingVolumeMl(b.volumeMl, b.servings);
  const volumeChange = volumeA > 0 ? ((volumeB - volumeA) / volumeA) * 100 : 0;
  const volumeChip: NutrientChange =
    Math.abs(volumeChange) < 0.5
      ? { text: 'No change', direction: 'same', tone: 'neutral' }
      : {
          text: `${volumeChange > 0 ? '+' : MINUS}${formatNumber(Math.abs(volumeChange), 0)}%`,
          direction: volumeChange > 0 ? 'more' : 'less',
          tone: 'neutral',
        };
  type Row = { key: string; label: string; part?: boolean; before: string; after: string; change: NutrientChange };
  const rows: Row[] = [
    ...NUTRIENT_ROWS.map((row) => ({
      key: row.key,
      label: row.label,
      part: row.part,
      before: row.format(a.perServing[row.key]),
      after: row.format(b.perServing[row.key]),
      change: nutrientChange(row.key, a.perServing[row.key], b.perServing[row.key], row.format),
    })),
    { key: 'volume', label: 'Volume', part: true, before: `${formatNumber(volumeA, 0)} mL`, after: `${formatNumber(volumeB, 0)} mL`, change: volumeChip },
  ];
  return (
    <DataTable<Row>
      caption="Nutrients per serving, before and after, with the difference"
      captionHidden
      look="plain"
      className="@container"
      tableClassName="@md:text-base"
      rows={rows}
      rowKey={(r) => r.key}
      columns={[
        {
          key: 'label',
          header: 'Per serving',
          rowHeader: true,
          cell: (r) => r.label,
          className: (r) => (r.key === 'volume' ? 'font-semibold text-ink-soft' : r.part ? 'pl-4 font-semibold text-ink-soft' : 'font-bold text-ink'),
        },
        { key: 'a', header: `v${a.number}`, align: 'right', className: 'whitespace-nowrap', cell: (r) => r.before },
        {
          key: 'b',
          header: (
            <>
              v{b.number}
              <span className="@md:hidden"> and change</span>
            </>
          ),
          align: 'right',
          className: (r) => cx('whitespace-nowrap', r.key !== 'volume' && 'font-bold'),
          cell: (r) => (
            <>
              {r.after}
              <span className="mt-0.5 block @md:hidden">
                <ChangeChip change={r.change} />
              </span>
            </>
          ),
        },
        {
          key: 'difference',
          header: 'Difference',
          align: 'right',
          headerClassName: 'hidden @md:table-cell',
          className: 'hidden @md:table-cell',
          cell: (r) => <ChangeChip change={r.change} />,
        },
      ]}
    />
  );
}

function gramsText(change: LineChange): string {
  const before = change.before ? formatGrams(change.before.grams) : null;
  const after = change.after ? formatGrams(change.after.grams) : null;
  if (change.kind === 'same') return after ?? '';
  if (!before) return after ?? '';
  if (!after) return before;
  return `${before} → ${after}`;
}

/** The line as the cook wrote it, the matched food beneath. */
function LineText({ line, className }: { line: LineChange['before']; className?: string }) {
  if (!line) return null;
  const written = writtenLine(line);
  return (
    <span className={cx('flex flex-col', className)}>
      <span>{written ?? line.foodName ?? line.input}</span>
      {written && <span className="text-sm font-normal text-ink-soft no-underline">{line.foodName ? `matched: ${line.foodName}` : 'no food matched'}</span>}
    </span>
  );
}

function FoodText({ change }: { change: LineChange }) {
  if (change.kind === 'swapped') {
    return (
      <span className="flex flex-col gap-1">
        <LineText line={change.before} className="text-ink-soft line-through decoration-oat-400" />
        <span className="flex gap-1 font-bold text-ink">
          <span aria-hidden="true">→ </span>
          <span className="sr-only">replaced by </span>
          <LineText line={change.after} />
        </span>
      </span>
    );
  }
  if (change.kind === 'removed') return <LineText line={change.before} className="text-ink-soft line-through decoration-oat-400" />;
  return <LineText line={change.after} className={change.kind === 'same' ? 'text-ink-soft' : 'font-bold text-ink'} />;
}

function lineDelta(change: LineChange, a: VersionDetail, b: VersionDetail, key: 'kcal' | 'proteinG') {
  const before = change.before ? change.before.nutrients[key] / a.servings : 0;
  const after = change.after ? change.after.nutrients[key] / b.servings : 0;
  return nutrientChange(key, before, after, key === 'kcal' ? formatKcal : formatMacroG);
}

function summary(changes: LineChange[]): string {
  const counts = new Map<LineChangeKind, number>();
  for (const c of changes) counts.set(c.kind, (counts.get(c.kind) ?? 0) + 1);
  const changed = changes.length - (counts.get('same') ?? 0);
  if (changed === 0) return 'The ingredients are the same in both versions.';
  const parts = (['swapped', 'more', 'less', 'added', 'removed'] as const)
    .filter((k) => counts.get(k))
    .map((k) => `${counts.get(k)} ${KIND_WORDS[k].label.toLowerCase()}`);
  return `${changed} of ${changes.length} lines changed: ${parts.join(', ')}.`;
}

function LineChanges({ a, b }: { a: VersionDetail; b: VersionDetail }) {
  const changes = compareLines(a.lines, b.lines, { inPlace: rewrittenInPlace(a, b) });
  return (
    <div className="flex flex-col gap-3">
      <p className="font-semibold text-ink" aria-live="polite">
        {summary(changes)}
      </p>

      <DataTable
        caption={`Lines of version ${a.number} against version ${b.number}`}
        captionHidden
        density="snug"
        cardsBelow="md"
        striped={false}
        className="md:rounded-field"
        rows={changes}
        rowKey={(_, i) => i}
        rowClassName={(change) => (change.kind === 'same' ? 'bg-surface' : 'bg-oat-50 max-md:bg-oat-50')}
        columns={[
          {
            key: 'change',
            header: 'Change',
            cardLabel: false,
            cardOrder: 1,
            className: 'md:py-2.5',
            cell: (change) => <Badge tone={KIND_WORDS[change.kind].tone}>{KIND_WORDS[change.kind].label}</Badge>,
          },
          { key: 'food', header: 'Food', rowHeader: true, className: 'font-normal md:py-2.5', cell: (change) => <FoodText change={change} /> },
          { key: 'grams', header: 'Grams', align: 'right', cardOrder: 2, className: 'whitespace-nowrap md:py-2.5', cell: (change) => gramsText(change) },
          {
            key: 'kcal',
            header: headerWithUnit('Energy', '/ serving'),
            align: 'right',
            cardOrder: 3,
            className: 'md:py-2.5',
            cell: (change) => (change.kind === 'same' ? <span className="text-ink-soft">—</span> : <ChangeChip change={lineDelta(change, a, b, 'kcal')} />),
          },
          {
            key: 'protein',
            header: headerWithUnit('Protein', '/ serving'),
            align: 'right',
            cardOrder: 4,
            className: 'md:py-2.5',
            cell: (change) => (change.kind === 'same' ? <span className="text-ink-soft">—</span> : <ChangeChip change={lineDelta(change, a, b, 'proteinG')} />),
          },
        ]}
      />
    </div>
  );
}

/** Two versions side by side: what changed line by line, and what it does per serving. */
export function VersionComparison({ a, b }: { a: VersionDetail; b: VersionDetail }) {
  return (
    <div className="flex flex-col gap-6">
      <div className="grid grid-cols-[minmax(0,1fr)] gap-4 sm:grid-cols-2">
        <VersionHeading version={a} side="Before" />
        <VersionHeading version={b} side="After" />
      </div>
      <div className="grid grid-cols-[minmax(0,1fr)] items-start gap-6 xl:grid-cols-[minmax(0,1fr)_minmax(22rem,26rem)]">
        <Card title="Lines" description="Ingredients kept in both line up; a food that changed shows what replaced it.">
          <LineChanges a={a} b={b} />
        </Card>
        <Card title="Per serving" description="After minus before.">
          <NutrientDifferences a={a} b={b} />
          <p className="mt-3 text-sm text-ink-soft">
            <span className="font-bold text-herb-800">Green</span> marks a change toward a lighter, more filling plate (fewer kcal; more protein or fiber; less
            fat, sugar or sodium), <span className="font-bold text-beet-800">red</span> a change toward a heavier one. The sign says which way each figure
            moved: + more, {MINUS} less.
          </p>
        </Card>
      </div>
    </div>
  );
}
