import { Alert, Button } from '@chakra-ui/react';
import { errorMessage } from '../../lib/error-message';

/** A list or item that could not be loaded, with a retry that works. */
export function LoadError({
  title,
  error,
  onRetry,
  retrying,
}: {
  title: string;
  /** What went wrong, shown in words under the title; left out, the title stands alone. */
  error?: unknown;
  onRetry: () => void;
  retrying?: boolean;
}) {
  return (
    <Alert.Root status="error" role="alert" borderRadius="l2">
      <Alert.Indicator />
      <Alert.Content gap="3">
        <Alert.Title>{title}</Alert.Title>
        {error !== undefined && <Alert.Description>{errorMessage(error)}</Alert.Description>}
        <Button size="sm" variant="outline" alignSelf="start" loading={retrying} onClick={onRetry}>
          Try again
        </Button>
      </Alert.Content>
    </Alert.Root>
  );
}
