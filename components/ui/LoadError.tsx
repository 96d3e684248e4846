'use client';
// The one way a page says its data could not be loaded, with the error and a retry.
import { Alert } from './Alert';
import { Button } from './Button';
import { errorMessage } from './fetchJson';

export function LoadError({
  title,
  error,
  onRetry,
}: {
  title: string;
  error: unknown;
  onRetry: () => void;
}) {
  return (
    <Alert
      tone="error"
      title={title}
      action={
        <Button variant="secondary" size="sm" onClick={onRetry}>
          Try again
        </Button>
      }
    >
      {errorMessage(error)}
    </Alert>
  );
}
