import { isRouteErrorResponse, useRouteError } from 'react-router';
import { Alert } from '../../components/ui/alert';
import { Button } from '../../components/ui/button';
import { Page } from '../../components/ui/page';
import { errorMessage } from '../../lib/api-client';
import { NotFoundPage } from './not-found';

/** What a page shows when it crashes or its code can't be loaded; the header and footer stay. */
export function RouteErrorPage() {
  const error = useRouteError();
  if (isRouteErrorResponse(error) && error.status === 404) return <NotFoundPage />;

  const message = isRouteErrorResponse(error) ? `${error.status} ${error.statusText}` : errorMessage(error);
  return (
    <Page width="narrow" title="Something went wrong on this page" description="The rest of Hearthswap still works. Reloading usually fixes this.">
      <Alert tone="danger" announce={false}>
        {message}
      </Alert>
      <div>
        <Button onClick={() => window.location.reload()}>Reload the page</Button>
      </div>
    </Page>
  );
}
