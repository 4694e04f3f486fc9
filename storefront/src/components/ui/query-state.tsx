import { Alert, Button, Stack } from '@chakra-ui/react';
import { ApiError } from '../../lib/api-client';

/** Words for a failed load: what happened and that trying again may help. */
export function describeLoadError(error: unknown): string {
  if (error instanceof ApiError) {
    if (error.status === 0) return error.message;
    if (error.status === 429) {
      return `The server asked us to slow down. Please try again in ${error.retryAfterSeconds ?? 60} seconds.`;
    }
    if (error.status >= 500)
      return 'Something went wrong on our side. Please try again in a moment.';
    return error.messages.join(' ');
  }
  return 'Something went wrong. Please try again.';
}

/** The error state of a section that failed to load, with a button to load it again. */
export function LoadError({
  title,
  error,
  onRetry,
  retrying = false,
}: {
  title: string;
  error: unknown;
  onRetry: () => void;
  retrying?: boolean;
}) {
  return (
    <Alert.Root status="error" role="alert" borderRadius="l2">
      <Alert.Indicator />
      <Alert.Content>
        <Stack gap="3" align="start">
          <Stack gap="1">
            <Alert.Title>{title}</Alert.Title>
            <Alert.Description>{describeLoadError(error)}</Alert.Description>
          </Stack>
          <Button size="sm" variant="outline" onClick={onRetry} loading={retrying}>
            Try again
          </Button>
        </Stack>
      </Alert.Content>
    </Alert.Root>
  );
}
