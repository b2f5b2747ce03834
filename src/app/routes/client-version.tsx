import { Link, useParams } from 'react-router';
import { Card } from '../../components/ui/card';
import { ErrorState } from '../../components/ui/error-state';
import { Page } from '../../components/ui/page';
import { LoadingState } from '../../components/ui/spinner';
import { useClient } from '../../features/clients/api/clients';
import { useReviewedRecipe, useReviewedVersion } from '../../features/clients/api/reviewed-version';
import { clientPath, positiveId } from '../../features/clients/client-paths';
import { CommentThread } from '../../features/clients/components/comment-thread';
import { VersionReview } from '../../features/clients/components/version-review';
import { versionKindWords } from '../../features/clients/version-words';
import { formatDateTime } from '../../lib/dates';
import { unitSystemOf } from '../../lib/user';
import { useAuth } from '../auth-context';

/** A coach's read-only look at one version a client saved, with the comments on it. */
export function ClientVersionPage() {
  const params = useParams();
  const clientId = positiveId(params.id);
  const recipeId = positiveId(params.recipeId);
  const number = positiveId(params.number);
  const { user } = useAuth();
  const { client } = useClient(clientId);
  const recipe = useReviewedRecipe(recipeId);
  const version = useReviewedVersion(recipeId, number);

  const back = (
    <Link to={clientId ? clientPath(clientId) : '/clients'} className="self-start font-bold text-accent-strong underline-offset-4 hover:underline">
      <span aria-hidden="true">← </span>
      {client ? client.displayName : 'Back to the client'}
    </Link>
  );

  if (recipeId === null || number === null || clientId === null) {
    return (
      <Page title="No such version" width="narrow">
        {back}
        <p className="text-ink-soft">This address doesn't name a saved version.</p>
      </Page>
    );
  }
  if (version.isPending || recipe.isPending) {
    return (
      <Page title="Saved version">
        {back}
        <LoadingState label="Opening the version…" />
      </Page>
    );
  }
  if (version.isError || recipe.isError) {
    const retry = () => {
      if (recipe.isError) void recipe.refetch();
      if (version.isError) void version.refetch();
    };
    return (
      <Page title="Saved version">
        {back}
        <ErrorState title="This version didn't load" error={version.error ?? recipe.error} onRetry={retry} retrying={version.isFetching || recipe.isFetching} />
      </Page>
    );
  }

  const v = version.data;
  const clientName = client?.displayName ?? 'Your client';
  return (
    <Page
      title={`${recipe.data.title} · version ${v.number}`}
      description={`${versionKindWords(v.kind)}, saved ${formatDateTime(v.createdAt)} by ${clientName}. Read-only: only ${clientName} can change it.`}
    >
      {back}
      <VersionReview version={v} unitSystem={unitSystemOf(user)} clientTargets={client?.targets ?? null} />
      <Card title="Comments" description={`A conversation about this version between you and ${clientName}.`}>
        {user && <CommentThread recipeId={recipeId} number={v.number} viewerId={user.id} otherName={clientName} />}
      </Card>
    </Page>
  );
}
