import { Link } from 'react-router';
import { Badge } from '../../../components/ui/badge';
import { EmptyState } from '../../../components/ui/empty-state';
import { ErrorState } from '../../../components/ui/error-state';
import { LoadingState } from '../../../components/ui/spinner';
import { formatKcal, formatMacroG } from '../../../lib/format';
import type { ClientTargets } from '../api/clients';
import { useClientVersions, type ClientVersion } from '../api/client-versions';
import { meetsPerMeal } from '../targets-form';
import { versionKindWords } from '../version-words';
import { formatDay, formatDateTime } from '../../../lib/dates';
import { countOf } from '../../../lib/words';

function TargetBadges({ version, targets }: { version: ClientVersion; targets: ClientTargets | null }) {
  const meets = meetsPerMeal(version.perServing, targets);
  if (!meets) return null;
  if (meets.kcal && meets.protein) return <Badge tone="herb">Meets per-meal targets</Badge>;
  return (
    <span className="flex flex-wrap gap-1.5">
      {!meets.kcal && <Badge tone="ember">Over the energy target</Badge>}
      {!meets.protein && <Badge tone="honey">Under the protein target</Badge>}
    </span>
  );
}

export interface ClientVersionListProps {
  clientId: number;
  clientName: string;
  targets: ClientTargets | null;
  reviewHref: (version: ClientVersion) => string;
}

/** The client's latest saved versions, each with its figures per serving and a way to review it. */
export function ClientVersionList({ clientId, clientName, targets, reviewHref }: ClientVersionListProps) {
  const versions = useClientVersions(clientId);
  if (versions.isPending) return <LoadingState label="Loading their saved versions…" />;
  if (versions.isError)
    return (
      <ErrorState title="Their saved versions didn't load" error={versions.error} onRetry={() => void versions.refetch()} retrying={versions.isFetching} />
    );
  if (versions.data.length === 0) {
    return (
      <EmptyState title="Nothing saved yet">
        When {clientName} saves a version of a recipe — as written, rewritten or edited — it shows here for you to review.
      </EmptyState>
    );
  }
  return (
    <ul aria-label={`Versions ${clientName} saved`} className="flex flex-col divide-y divide-line">
      {versions.data.map((version) => (
        <li
          key={`${version.recipeId}-${version.number}`}
          className="flex flex-col gap-2 py-4 first:pt-0 last:pb-0 sm:flex-row sm:items-start sm:justify-between sm:gap-6"
        >
          <div className="flex min-w-0 flex-col gap-1">
            <Link to={reviewHref(version)} className="self-start font-extrabold text-accent-strong underline-offset-2 hover:underline">
              {version.recipeTitle || 'Untitled recipe'}
              <span className="font-semibold text-ink-soft"> · version {version.number}</span>
            </Link>
            <span className="text-sm text-ink-soft">
              {versionKindWords(version.kind)} ·{' '}
              <time dateTime={version.createdAt} title={formatDateTime(version.createdAt)}>
                {formatDay(version.createdAt)}
              </time>
              {version.comments > 0 && ` · ${countOf(version.comments, 'comment')}`}
            </span>
            {version.note && <span className="text-ink">{version.note}</span>}
          </div>
          <div className="flex shrink-0 flex-col gap-1.5 sm:items-end">
            <span className="font-bold whitespace-nowrap tabular-nums">
              {formatKcal(version.perServing.kcal)} · {formatMacroG(version.perServing.proteinG)} protein
              <span className="font-semibold text-ink-soft"> / serving</span>
            </span>
            <TargetBadges version={version} targets={targets} />
          </div>
        </li>
      ))}
    </ul>
  );
}
