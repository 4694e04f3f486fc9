import { Alert, Button } from '@chakra-ui/react';
import { errorMessage } from '../../lib/error-message';

/** A list or item that could not be loaded, with a retry that works. */
export function LoadError({
  title,
  error,
  onRetry,
  retrying,
  describe = errorMessage,
}: {
  title: string;
  /** What went wrong, shown in words under the title; left out, the title stands alone. */
  error?: unknown;
  onRetry: () => void;
  retrying?: boolean;
  /** The words for `error`, where a feature says some failures its own way. */
  describe?: (error: unknown) => string;
}) {
  return (
    <Alert.Root status="error" role="alert" borderRadius="l2">
      <Alert.Indicator />
      <Alert.Content gap="3">
        <Alert.Title>{title}</Alert.Title>
        {error !== undefined && <Alert.Description>{describe(error)}</Alert.Description>}
        <Button size="sm" variant="outline" alignSelf="start" loading={retrying} onClick={onRetry}>
          Try again
        </Button>
      </Alert.Content>
    </Alert.Root>
  );
}
