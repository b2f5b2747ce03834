import type { TargetsInput } from '../../../../shared/schemas/rewrite';
import type { Suggestion } from '../../../../shared/rewrite/types';
import { Alert } from '../../../components/ui/alert';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
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

      <div className="overflow-x-auto">
        <table className="w-full border-collapse text-sm sm:text-base">
          <caption className="pb-2 text-left font-bold">The closest the dish gets, per serving</caption>
          <thead>
            <tr className="border-b-2 border-ink text-ink-soft">
              <th scope="col" className="py-1.5 pr-2 text-left text-sm font-bold">
                Target
              </th>
              <th scope="col" className="px-2 py-1.5 text-right text-sm font-bold">
                You asked
              </th>
              <th scope="col" className="py-1.5 pl-2 text-right text-sm font-bold">
                Best reachable
              </th>
            </tr>
          </thead>
          <tbody>
            {rows.map((row) => {
              const binding = details.binding.includes(row.target);
              return (
                <tr key={row.target} className="border-b border-line">
                  <th scope="row" className="py-2 pr-2 text-left align-top font-bold">
                    <span className="block">{row.label.charAt(0).toUpperCase() + row.label.slice(1)}</span>
                    {binding ? <Badge tone="beet">Out of reach</Badge> : <Badge tone="herb">Met</Badge>}
                  </th>
                  <td className="px-2 py-2 text-right align-top">{targetText(row.target, targets[row.target] as number)}</td>
                  <td className="py-2 pl-2 text-right align-top font-bold whitespace-nowrap tabular-nums">
                    {formatNutrient(row.key, details.bestReachable[row.key])}
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>

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
