import { Alert, Box, Button, EmptyState, Skeleton, Stack, VisuallyHidden } from '@chakra-ui/react';
import type { ReactNode } from 'react';
import { describeError } from '../lib/describe-error';

/** Something that could not be loaded, in words, with a retry that works. */
export function LoadError({
  title,
  error,
  onRetry,
  retrying,
}: {
  title: string;
  error: unknown;
  onRetry: () => void;
  retrying?: boolean;
}) {
  return (
    <Alert.Root status="error" role="alert" borderRadius="l2">
      <Alert.Indicator />
      <Alert.Content gap="3">
        <Alert.Title>{title}</Alert.Title>
        <Alert.Description>{describeError(error)}</Alert.Description>
        <Button size="sm" variant="outline" alignSelf="start" loading={retrying} onClick={onRetry}>
          Try again
        </Button>
      </Alert.Content>
    </Alert.Root>
  );
}

/** Grey bars in the shape of what is coming, announced once to screen readers. */
export function BlockSkeleton({ label, rows = 5 }: { label: string; rows?: number }) {
  return (
    <Box role="status">
      <VisuallyHidden>{label}</VisuallyHidden>
      <Stack gap="3" aria-hidden>
        <Skeleton height="10" width="full" maxW="sm" />
        {Array.from({ length: rows }, (_, i) => (
          <Skeleton key={i} height="16" width={i % 3 === 2 ? '3/4' : 'full'} />
        ))}
      </Stack>
    </Box>
  );
}

/** Nothing here, and why. */
export function EmptyNote({
  icon,
  title,
  children,
  action,
}: {
  icon: ReactNode;
  title: string;
  children: ReactNode;
  action?: ReactNode;
}) {
  return (
    <EmptyState.Root
      borderWidth="1px"
      borderStyle="dashed"
      borderColor="border.emphasized"
      borderRadius="l3"
      bg="bg.panel"
    >
      <EmptyState.Content>
        <EmptyState.Indicator color="caramel.fg">{icon}</EmptyState.Indicator>
        <EmptyState.Title fontFamily="heading" textStyle="xl">
          {title}
        </EmptyState.Title>
        <EmptyState.Description color="fg.muted" textAlign="center" maxW="md">
          {children}
        </EmptyState.Description>
        {action}
      </EmptyState.Content>
    </EmptyState.Root>
  );
}
