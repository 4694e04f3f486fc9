import { Box, Flex, Heading, HStack, Stack, Text } from '@chakra-ui/react';
import type { ComponentProps, ReactNode } from 'react';
import { BlockSkeleton } from '../../../components/ui/block-skeleton';
import { EmptyState } from '../../../components/ui/empty-state';

/** Nothing here, and what to do about it: its title is an h2, straight under the screen's h1. */
export function PrepEmpty(props: ComponentProps<typeof EmptyState>) {
  return <EmptyState titleAs="h2" py={{ base: '8', md: '10' }} {...props} />;
}

/** Grey bars in the shape of what is coming, announced once to screen readers. */
export function PrepSkeleton({ label, rows = 5 }: { label: string; rows?: number }) {
  return <BlockSkeleton label={label} rows={rows} headHeight="8" rowHeight="14" />;
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
