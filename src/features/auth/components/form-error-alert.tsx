import { Alert } from '../../../components/ui/alert';
import { errorMessage, isApiError } from '../../../lib/api-client';

/**
 * The form-level part of a failed submit. When every problem is already shown under a
 * field, this only points there; a rate limit or a wrong password gets its own words.
 */
export function FormErrorAlert({ error, fieldsShown }: { error: unknown; fieldsShown: boolean }) {
  if (!error) return null;
  const rateLimited = isApiError(error) && error.status === 429;
  const title = rateLimited ? 'Please slow down' : fieldsShown ? 'Check the fields marked below' : undefined;
  const body = fieldsShown && !rateLimited ? undefined : errorMessage(error);
  return (
    <Alert tone={rateLimited ? 'caution' : 'danger'} title={title} assertive>
      {body}
    </Alert>
  );
}
