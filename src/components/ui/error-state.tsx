import { errorMessage } from '../../lib/api-client';
import { Alert } from './alert';
import { Button } from './button';

export interface ErrorStateProps {
  title?: string;
  error: unknown;
  onRetry?: () => void;
  retrying?: boolean;
  className?: string;
}

/** A failed load of server data, with its reason and a way to try again. */
export function ErrorState({ title = "This didn't load", error, onRetry, retrying, className }: ErrorStateProps) {
  return (
    <Alert
      tone="danger"
      title={title}
      className={className}
      action={
        onRetry && (
          <Button variant="secondary" size="sm" onClick={onRetry} loading={retrying} loadingLabel="Trying again…">
            Try again
          </Button>
        )
      }
    >
      {errorMessage(error)}
    </Alert>
  );
}
