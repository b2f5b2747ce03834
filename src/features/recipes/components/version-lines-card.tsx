import type { ReactNode } from 'react';
import type { VersionSummary } from '../../../../shared/schemas/recipes';
import { Card } from '../../../components/ui/card';
import { ErrorState } from '../../../components/ui/error-state';
import { LoadingState } from '../../../components/ui/spinner';
import { useRecipeVersion } from '../api/get-version';
import { versionTitle } from '../version-words';
import { VersionLinesTable } from './version-lines-table';

/** The lines of the version picked on the timeline. */
export function VersionLinesCard({ recipeId, version, actions }: { recipeId: number; version: VersionSummary; actions?: ReactNode }) {
  const detail = useRecipeVersion(recipeId, version.number);
  const title = versionTitle(version);
  return (
    <Card title={title} description="Each line weighed in grams, matched to a catalogue food, and what it adds to the whole dish." actions={actions}>
      {detail.isPending ? (
        <LoadingState label={`Opening version ${version.number}…`} />
      ) : detail.isError ? (
        <ErrorState title={`Version ${version.number} didn't load`} error={detail.error} onRetry={() => void detail.refetch()} retrying={detail.isFetching} />
      ) : (
        <VersionLinesTable version={detail.data} caption={`Ingredients of ${title}`} />
      )}
    </Card>
  );
}
