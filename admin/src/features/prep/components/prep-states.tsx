import {
  Alert,
  Box,
  Button,
  EmptyState,
  Flex,
  Heading,
  HStack,
  Skeleton,
  Stack,
  Text,
  VisuallyHidden,
} from '@chakra-ui/react';
import type { ReactNode } from 'react';
import { errorMessage } from '../../../lib/error-message';

/** Something that could not be loaded, with a retry that works. */
export function PrepLoadError({
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
        <Alert.Description>{errorMessage(error)}</Alert.Description>
        <Button size="sm" variant="outline" alignSelf="start" loading={retrying} onClick={onRetry}>
          Try again
        </Button>
      </Alert.Content>
    </Alert.Root>
  );
}

/** Grey bars in the shape of what is coming, announced once to screen readers. */
export function PrepSkeleton({ label, rows = 5 }: { label: string; rows?: number }) {
  return (
    <Box role="status">
      <VisuallyHidden>{label}</VisuallyHidden>
      <Stack gap="3" aria-hidden>
        <Skeleton height="8" width="full" maxW="sm" />
        {Array.from({ length: rows }, (_, i) => (
          <Skeleton key={i} height="14" width={i % 3 === 2 ? '3/4' : 'full'} />
        ))}
      </Stack>
    </Box>
  );
}

/** Nothing here, and what to do about it. */
export function PrepEmpty({
  icon,
  title,
  children,
  action,
}: {
  icon: ReactNode;
  title: string;
  children?: ReactNode;
  action?: ReactNode;
}) {
  return (
    <EmptyState.Root
      borderWidth="1px"
      borderStyle="dashed"
      borderColor="border.emphasized"
      borderRadius="l3"
      bg="bg.panel"
      py={{ base: '8', md: '10' }}
    >
      <EmptyState.Content>
        <EmptyState.Indicator color="caramel.fg">{icon}</EmptyState.Indicator>
        <EmptyState.Title as="h2" fontFamily="heading" textStyle="xl" textAlign="center">
          {title}
        </EmptyState.Title>
        {children && (
          <EmptyState.Description color="fg.muted" textAlign="center" maxW="md">
            {children}
          </EmptyState.Description>
        )}
        {action}
      </EmptyState.Content>
    </EmptyState.Root>
  );
}

/** The top of every Prep screen: the section, the title, a line of context, the actions. */
export function PrepPageHeader({
  eyebrow,
  title,
  description,
  actions,
}: {
  eyebrow: string;
  title: string;
  description?: ReactNode;
  actions?: ReactNode;
}) {
  return (
    <Flex
      direction={{ base: 'column', md: 'row' }}
      justify="space-between"
      align={{ base: 'stretch', md: 'end' }}
      gap="4"
      mb={{ base: '5', md: '8' }}
    >
      <Stack gap="2" minW="0">
        <Text color="caramel.fg" fontWeight="semibold" textStyle="sm">
          {eyebrow}
        </Text>
        <Heading as="h1" fontSize={{ base: '3xl', md: '4xl' }} fontWeight="normal">
          {title}
        </Heading>
        {description && (
          <Text color="fg.muted" maxW="2xl">
            {description}
          </Text>
        )}
      </Stack>
      {actions && (
        <HStack gap="2" wrap="wrap" flexShrink="0">
          {actions}
        </HStack>
      )}
    </Flex>
  );
}

/** A titled part of a screen, labelled by its heading. */
export function PrepSection({
  id,
  title,
  aside,
  children,
}: {
  id: string;
  title: string;
  aside?: ReactNode;
  children: ReactNode;
}) {
  return (
    <Box as="section" aria-labelledby={id} minW="0">
      <Flex justify="space-between" align="baseline" gap="3" wrap="wrap" mb="3">
        <Heading as="h2" size="lg" id={id}>
          {title}
        </Heading>
        {aside}
      </Flex>
      {children}
    </Box>
  );
}
