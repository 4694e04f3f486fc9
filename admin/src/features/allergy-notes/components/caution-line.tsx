import { HStack, Text } from '@chakra-ui/react';
import { CautionIcon } from '../../../components/ui/icons';

/** The usual caution, in one short line. */
export function CautionLine() {
  return (
    <HStack gap="2" align="start" color="fg.muted" textStyle="sm">
      <CautionIcon boxSize="4" mt="0.5" flexShrink="0" aria-hidden />
      <Text>
        Allergen cross-contact is the kitchen’s responsibility under your local food code: separate
        tools, surfaces and storage, and when in doubt ask the chef before serving.
      </Text>
    </HStack>
  );
}
