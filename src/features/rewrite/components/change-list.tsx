import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { formatWeight } from '../../../lib/format';
import type { UnitSystem } from '../../../lib/user';
import { commonFoodName, writtenFoodName } from '../../../../shared/rewritten-line-text';
import type { RewriteChange } from '../rewrite-types';
import { MINUS, orderedChanges } from '../rewrite-words';

export interface ChangeListProps {
  changes: RewriteChange[];
  /** the recipe lines as written, to name each line the way the cook wrote it */
  lineInputs: string[];
  unitSystem: UnitSystem;
  /** leave a swapped-in food out and rewrite again */
  onExclude?: (food: { id: number; name: string }) => void;
  excluding?: boolean;
}

function gramsChange(change: RewriteChange, unitSystem: UnitSystem) {
  const diff = change.gramsAfter - change.gramsBefore;
  const sign = diff >= 0 ? '+' : MINUS;
  return (
    <span className="tabular-nums">
      {formatWeight(change.gramsBefore, unitSystem)} <span aria-hidden="true">→</span>
      <span className="sr-only">to</span> <strong>{formatWeight(change.gramsAfter, unitSystem)}</strong>{' '}
      <span className="whitespace-nowrap text-ink-soft">
        ({sign}
        {formatWeight(Math.abs(diff), 'metric')})
      </span>
    </span>
  );
}

/** The two foods of a change in the cook's words: the food as their line names it, the new food by its common name. */
function cookNames(change: RewriteChange, lineInput: string | undefined) {
  return {
    from: (lineInput && writtenFoodName(lineInput)) || commonFoodName(change.from),
    to: commonFoodName(change.to, change.rule?.label),
  };
}

function SharedLine({ change, unitSystem, names }: { change: RewriteChange; unitSystem: UnitSystem; names: { from: string; to: string } }) {
  return (
    <ul className="flex flex-col gap-1 tabular-nums" aria-label="The line, shared between two foods">
      <li>
        Keep <strong>{formatWeight(change.keptGrams ?? 0, unitSystem)}</strong> {names.from}{' '}
        <span className="text-ink-soft">(of {formatWeight(change.gramsBefore, unitSystem)} as written)</span>
      </li>
      <li>
        Add <strong className="text-herb-800">{formatWeight(change.gramsAfter, unitSystem)}</strong> {names.to}
      </li>
    </ul>
  );
}

function ChangeItem({
  change,
  lineInput,
  unitSystem,
  onExclude,
  excluding,
}: { change: RewriteChange; lineInput: string | undefined } & Omit<ChangeListProps, 'changes' | 'lineInputs'>) {
  const cautions = change.rule?.cautions ?? [];
  const names = cookNames(change, lineInput);
  return (
    <li className="flex flex-col gap-2 rounded-field border border-line bg-surface p-4">
      <div className="flex flex-wrap items-center gap-2">
        <Badge tone={change.swapped ? 'ember' : 'neutral'}>{change.partial ? 'Part swap' : change.swapped ? 'Swap' : 'Amount'}</Badge>
        <span className="text-sm font-semibold text-ink-soft">
          Line {change.line + 1}
          {lineInput && <>: “{lineInput}”</>}
        </span>
      </div>
      {change.swapped ? (
        <p className="flex flex-col">
          <span className="font-bold">
            {names.from} <span aria-hidden="true">→</span>
            <span className="sr-only">{change.partial ? 'shared with' : 'becomes'}</span> <span className="text-herb-800">{names.to}</span>
          </span>
          <span className="text-sm text-ink-soft">
            matched: {change.from.name} → {change.to.name}
          </span>
        </p>
      ) : (
        <p className="flex flex-col">
          <span className="font-bold">{names.from}</span>
          <span className="text-sm text-ink-soft">matched: {change.to.name}</span>
        </p>
      )}
      {change.partial ? <SharedLine change={change} unitSystem={unitSystem} names={names} /> : <p>{gramsChange(change, unitSystem)}</p>}
      {change.rule && (
        <p className="text-sm">
          <span className="font-bold">Rule:</span> {change.rule.label}
        </p>
      )}
      <p className="text-ink-soft">{change.reason}</p>
      {change.approvedBy ? (
        <div className="flex flex-col gap-1 rounded-field bg-herb-50 px-3 py-2 text-herb-900">
          <p className="flex flex-wrap items-center gap-2 text-sm font-bold">
            <Badge tone="herb">Coach approved</Badge> {change.approvedBy}
          </p>
          {change.note && <p className="text-sm">Note: {change.note}</p>}
        </div>
      ) : (
        change.note && <p className="rounded-field bg-oat-100 px-3 py-2 text-sm">Cook’s note: {change.note}</p>
      )}
      {cautions.length > 0 && (
        <ul className="list-inside list-disc text-sm text-ink-soft" aria-label="Cautions">
          {cautions.map((c) => (
            <li key={c}>{c}</li>
          ))}
        </ul>
      )}
      {change.swapped && onExclude && (
        <Button
          variant="quiet"
          size="sm"
          className="self-start underline underline-offset-2"
          disabled={excluding}
          onClick={() => onExclude({ id: change.to.id, name: change.to.name })}
        >
          Don’t use {names.to}; rewrite again
        </Button>
      )}
    </li>
  );
}

/** What the rewrite changed and why: swaps first, then amounts, each in recipe order. */
export function ChangeList({ changes, lineInputs, unitSystem, onExclude, excluding }: ChangeListProps) {
  const ordered = orderedChanges(changes);
  const swaps = ordered.filter((c) => c.swapped);
  const amounts = ordered.filter((c) => !c.swapped);
  if (ordered.length === 0) {
    return <p className="text-ink-soft">The dish already meets these targets as written; nothing needs to change.</p>;
  }
  const group = (title: string, list: RewriteChange[]) =>
    list.length > 0 && (
      <section className="flex flex-col gap-3" aria-label={title}>
        <h4 className="font-extrabold">
          {title} <span className="font-semibold text-ink-soft">({list.length})</span>
        </h4>
        <ol className="flex flex-col gap-3">
          {list.map((change) => (
            <ChangeItem
              key={`${change.line}-${change.to.id}`}
              change={change}
              lineInput={lineInputs[change.line]}
              unitSystem={unitSystem}
              onExclude={onExclude}
              excluding={excluding}
            />
          ))}
        </ol>
      </section>
    );
  return (
    <div className="flex flex-col gap-5">
      {group('Swaps', swaps)}
      {group('Amounts adjusted', amounts)}
    </div>
  );
}
