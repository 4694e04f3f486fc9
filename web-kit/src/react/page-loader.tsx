import { Center, Spinner, Text, VStack } from '@chakra-ui/react';

/** Shown while a screen's code or data is on its way. */
export function PageLoader({ label = 'Loading…' }: { label?: string }) {
  return (
    <Center py="24" role="status" aria-live="polite">
      <VStack gap="3">
        <Spinner size="lg" color="accent.fg" borderWidth="3px" />
        <Text color="fg.muted" textStyle="sm">
          {label}
        </Text>
      </VStack>
    </Center>
  );
}
