import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { Card } from '../../../components/ui/card';
import { ConfirmDialog } from '../../../components/ui/dialog';
import { EmptyState } from '../../../components/ui/empty-state';
import { ErrorState } from '../../../components/ui/error-state';
import { LoadingState } from '../../../components/ui/spinner';
import { useToast } from '../../../components/ui/toast';
import { errorMessage } from '../../../lib/api-client';
import { useLeaveCoach, useMyCoach } from '../api/my-coach';
import type { RoleLabel } from '../../../lib/swap-words';
import { CoachTargets } from './coach-targets';
import { NoCoachExplainer } from './no-coach-explainer';
import { PublishedSwapList } from './published-swap-list';
import { countOf } from '../../../lib/words';

/** The signed-in cook's side of coaching: who, what they set, what they publish, and the way out. */
export function MyCoachView({ email, roleLabel }: { email: string; roleLabel: RoleLabel }) {
  const mine = useMyCoach();
  const leave = useLeaveCoach();
  const toast = useToast();
  const [confirming, setConfirming] = useState(false);

  if (mine.isPending) return <LoadingState label="Looking up your coach…" />;
  if (mine.isError)
    return <ErrorState title="Your coach's page didn't load" error={mine.error} onRetry={() => void mine.refetch()} retrying={mine.isFetching} />;

  const { coach, targets, swaps } = mine.data;
  if (!coach) return <NoCoachExplainer email={email} />;

  return (
    <div className="flex flex-col gap-6">
      <Card>
        <div className="flex flex-wrap items-center justify-between gap-4">
          <div className="flex items-center gap-4">
            <span aria-hidden="true" className="flex size-14 shrink-0 items-center justify-center rounded-pill bg-ember-100 text-2xl font-black text-ember-800">
              {coach.displayName.trim().charAt(0).toUpperCase() || '?'}
            </span>
            <div className="flex flex-col">
              <p className="text-sm font-bold text-ink-soft">Your coach</p>
              <h2 className="text-2xl font-extrabold text-ink">{coach.displayName}</h2>
            </div>
          </div>
          <Button variant="secondary" onClick={() => setConfirming(true)}>
            Leave this coach
          </Button>
        </div>
        <p className="mt-4 text-ink-soft">
          Their published swaps are tried first in every rewrite you ask for, and their targets are your defaults. Comments they leave on your saved versions
          show on each recipe's page.
        </p>
      </Card>

      <Card title="Your targets" description={targets ? `Set by ${coach.displayName}.` : undefined}>
        {targets ? (
          <CoachTargets targets={targets} coachName={coach.displayName} />
        ) : (
          <EmptyState title="No targets set yet">{coach.displayName} hasn't set your targets. Until then a rewrite uses the targets you give it.</EmptyState>
        )}
      </Card>

      <section aria-labelledby="coach-swaps-heading" className="flex flex-col gap-4">
        <div className="flex flex-col gap-1">
          <h2 id="coach-swaps-heading" className="text-xl font-extrabold text-ink">
            Approved swaps
          </h2>
          <p className="text-ink-soft">
            {swaps.length > 0 ? `${countOf(swaps.length, 'swap')} ${coach.displayName} recommends, with how to cook them.` : null}
          </p>
        </div>
        {swaps.length > 0 ? (
          <PublishedSwapList swaps={swaps} roleLabel={roleLabel} label={`Swaps approved by ${coach.displayName}`} />
        ) : (
          <EmptyState title="Nothing published yet">When {coach.displayName} publishes a swap it shows here, and your rewrites start trying it.</EmptyState>
        )}
      </section>

      <ConfirmDialog
        open={confirming}
        title={`Leave ${coach.displayName}?`}
        confirmLabel="Leave this coach"
        destructive
        busy={leave.isPending}
        onCancel={() => setConfirming(false)}
        onConfirm={() =>
          leave.mutate(undefined, {
            onSuccess: () => {
              setConfirming(false);
              toast.show(`You've left ${coach.displayName}.`, 'success');
            },
            onError: (error) => toast.show(`Couldn't leave: ${errorMessage(error)}`, 'danger'),
          })
        }
      >
        <p>
          Their swaps stop being tried in your rewrites, the targets they set are removed, and they can no longer see the versions you save. Your recipes stay
          yours. To link again you need a new invitation.
        </p>
      </ConfirmDialog>
    </div>
  );
}
