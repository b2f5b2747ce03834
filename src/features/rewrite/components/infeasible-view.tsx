import type { TargetsInput } from '../../../../shared/schemas/rewrite';
import type { Suggestion } from '../../../../shared/rewrite/types';
import { Alert } from '../../../components/ui/alert';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { DataTable } from '../../../components/ui/table';
import { formatNumber } from '../../../lib/format';
import type { InfeasibleDetails } from '../rewrite-types';
import { formatNutrient, TARGET_ROWS, targetText } from '../rewrite-words';
import { LazyBeforeAfterChart as BeforeAfterChart } from './lazy-before-after-chart';

export interface InfeasibleViewProps {
  message: string;
  details: InfeasibleDetails;
  targets: TargetsInput;
  onApply: (suggestion: Suggestion) => void;
  applying: boolean;
}

function suggestionLabel(s: Suggestion): string {
  return s.message ? s.message.charAt(0).toUpperCase() + s.message.slice(1) : `Use ${formatNumber(s.value, 1)}`;
}

/** Targets out of reach: how close the dish gets, which targets hold it back, and one-click ways out. */
export function InfeasibleView({ message, details, targets, onApply, applying }: InfeasibleViewProps) {
  const rows = TARGET_ROWS.filter((r) => targets[r.target] !== undefined);
  return (
    <div className="flex flex-col gap-5">
      <Alert tone="caution" title="These targets can’t all be met" assertive>
        {message}
      </Alert>

      <DataTable
        caption="The closest the dish gets, per serving"
        look="plain"
        rows={rows}
        rowKey={(row) => row.target}
        columns={[
          {
            key: 'target',
            header: 'Target',
            rowHeader: true,
            className: 'py-2 font-bold',
            cell: (row) => (
              <>
                <span className="block">{row.label.charAt(0).toUpperCase() + row.label.slice(1)}</span>
                {details.binding.includes(row.target) ? <Badge tone="beet">Out of reach</Badge> : <Badge tone="herb">Met</Badge>}
              </>
            ),
          },
          { key: 'asked', header: 'You asked', align: 'right', className: 'py-2', cell: (row) => targetText(row.target, targets[row.target] as number) },
          {
            key: 'reachable',
            header: 'Best reachable',
            align: 'right',
            className: 'py-2 font-bold whitespace-nowrap',
            cell: (row) => formatNutrient(row.key, details.bestReachable[row.key]),
          },
        ]}
      />

      {details.suggestions.length > 0 && (
        <section className="flex flex-col gap-3" aria-labelledby="rewrite-suggestions">
          <h3 id="rewrite-suggestions" className="font-extrabold">
            Ways to make it reachable
          </h3>
          <p className="text-sm text-ink-soft">Each one changes that setting in the form above and rewrites again.</p>
          <ul className="flex flex-col gap-2">
            {details.suggestions.map((s, i) => (
              <li key={`${s.kind}-${s.target ?? ''}-${i}`}>
                <Button variant="secondary" onClick={() => onApply(s)} disabled={applying} className="h-auto py-2 text-left">
                  {suggestionLabel(s)}
                  <span aria-hidden="true">→</span>
                </Button>
              </li>
            ))}
          </ul>
        </section>
      )}

      <section className="flex flex-col gap-3" aria-label="The closest plan against the dish as written">
        <h3 className="font-extrabold">The closest plan against the dish as written</h3>
        <BeforeAfterChart
          before={details.before.perServing}
          after={details.closest.perServing}
          afterLabel="Closest plan"
          kcalMax={targets.kcalMax}
          proteinMinG={targets.proteinMinG}
        />
      </section>
    </div>
  );
}
