import { errorMessage } from '../../lib/api-client';
import { Alert } from './alert';
import { Button } from './button';

interface QueryErrorProps {
  error: unknown;
  /** What could not be loaded, in the words of the page: "the machines", "the outbox". */
  what: string;
  onRetry?: () => void;
  retrying?: boolean;
}

export function QueryError({ error, what, onRetry, retrying = false }: QueryErrorProps) {
  return (
    <Alert
      tone="error"
      title={`Couldn't load ${what}.`}
      action={
        onRetry && (
          <Button variant="secondary" onClick={onRetry} pending={retrying}>
            Try again
          </Button>
        )
      }
    >
      {errorMessage(error)}
    </Alert>
  );
}
