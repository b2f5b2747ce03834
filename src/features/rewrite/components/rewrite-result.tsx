import type { RewriteRequest } from '../../../../shared/schemas/rewrite';
import { Alert } from '../../../components/ui/alert';
import { Card } from '../../../components/ui/card';
import type { UnitSystem } from '../../../lib/user';
import { DEFAULT_VOLUME_TOLERANCE_PCT } from '../rewrite-form';
import type { HeldLine } from '../../../../shared/rewrite/types';
import type { RewriteAnswer, SkippedLine } from '../rewrite-types';
import { heldWords } from '../rewrite-words';
import { LazyBeforeAfterChart as BeforeAfterChart } from './lazy-before-after-chart';
import { BeforeAfterHeadline, BeforeAfterNumbers } from './before-after-numbers';
import { ChangeList } from './change-list';

export interface RewriteResultProps {
  request: RewriteRequest;
  answer: RewriteAnswer;
  unitSystem: UnitSystem;
  onExclude: (food: { id: number; name: string }) => void;
  busy: boolean;
}

function solverNote(answer: RewriteAnswer): string {
  return answer.solver.provenOptimal
    ? 'Every swap and amount was weighed; no better plan exists for the goal you chose.'
    : 'Time ran out before every plan was weighed, so this is the best one found; a better one may exist.';
}

export function SkippedLinesNote({ skipped }: { skipped: SkippedLine[] }) {
  if (skipped.length === 0) return null;
  return (
    <Alert tone="caution" title="Left as written" announce={false}>
      <ul className="list-inside list-disc">
        {skipped.map((s) => (
          <li key={s.line}>
            Line {s.line + 1}, “{s.input}”: {s.reason}.
          </li>
        ))}
      </ul>
    </Alert>
  );
}

/** Lines the rewrite never touches, and why, in the order of the recipe. */
export function HeldLinesNote({ held, lineInputs }: { held: HeldLine[]; lineInputs: string[] }) {
  if (held.length === 0) return null;
  return (
    <Alert tone="info" title="Kept as written" announce={false}>
      <p>These lines season, raise or set the dish, so the rewrite leaves them alone. Change what a line does in the Kitchen to let the rewrite touch it.</p>
      <ul className="list-inside list-disc">
        {[...held]
          .sort((a, b) => a.line - b.line)
          .map((h) => (
            <li key={h.line}>
              Line {h.line + 1}
              {lineInputs[h.line] && <>, “{lineInputs[h.line]}”</>}: {heldWords(h.reason)}.
            </li>
          ))}
      </ul>
    </Alert>
  );
}

/** The rewrite beside the dish as written: headline figures, the chart, every number and every change. */
export function RewriteResult({ request, answer, unitSystem, onExclude, busy }: RewriteResultProps) {
  const { before, after } = answer;
  const lineInputs = (request.lines ?? []).map((l) => l.input);
  return (
    <div className="flex flex-col gap-6">
      <BeforeAfterHeadline
        before={before.perServing}
        after={after.perServing}
        beforeVolumeMl={before.volumeMl}
        afterVolumeMl={after.volumeMl}
        volumeTolerancePct={request.volumeTolerancePct ?? DEFAULT_VOLUME_TOLERANCE_PCT}
        unitSystem={unitSystem}
      />
      <Card title="Before and after" headingLevel={3} description={`Per serving; one serving is 1/${request.servings} of the dish.`}>
        <BeforeAfterChart
          before={before.perServing}
          after={after.perServing}
          afterLabel="Rewritten"
          kcalMax={request.targets.kcalMax}
          proteinMinG={request.targets.proteinMinG}
        />
      </Card>
      {/* minmax(0, …) in one column too: a wide table scrolls inside its card instead of widening the page */}
      <div className="grid grid-cols-[minmax(0,1fr)] items-start gap-6 lg:grid-cols-[minmax(0,2fr)_minmax(0,3fr)]">
        <Card title="The numbers" headingLevel={3} description="Rounded for display; ✓ marks a change for the better, ! one to watch.">
          <BeforeAfterNumbers
            before={before.perServing}
            after={after.perServing}
            afterLabel="Rewritten"
            targets={request.targets}
            caption="Nutrients per serving as written and rewritten, with the change"
          />
        </Card>
        <Card title="What changes, and why" headingLevel={3} description={solverNote(answer)}>
          <div className="flex flex-col gap-4">
            <SkippedLinesNote skipped={answer.skippedLines} />
            <HeldLinesNote held={answer.held ?? []} lineInputs={lineInputs} />
            <ChangeList changes={answer.changes} lineInputs={lineInputs} unitSystem={unitSystem} onExclude={onExclude} excluding={busy} />
          </div>
        </Card>
      </div>
    </div>
  );
}
