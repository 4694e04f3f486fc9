import { Alert, List, Text } from '@chakra-ui/react';
import { LOCAL_CODE_DEFERRAL, type SafetyNote } from '@nappe/shared';
import { CautionIcon } from '../../../components/ui/icons';

/**
 * The cautions a step needs (hot sugar, custard, cooling, cold holding, freezing, a hot oven),
 * from the shared safety rules, each with its source, and always the deferral to the local
 * food code and licensed practice.
 */
export function SafetyNotes({
  notes,
  title = 'Safety',
}: {
  notes: readonly SafetyNote[];
  title?: string;
}) {
  if (notes.length === 0) return null;
  return (
    <Alert.Root status="warning" borderRadius="l2" alignItems="start">
      <Alert.Indicator>
        <CautionIcon />
      </Alert.Indicator>
      <Alert.Content gap="2">
        <Alert.Title>{title}</Alert.Title>
        <Alert.Description>
          <List.Root ps="4" gap="1">
            {notes.map((note) => (
              <List.Item key={note.topic}>
                {note.text}{' '}
                <Text as="span" color="fg.muted" textStyle="xs">
                  ({note.source})
                </Text>
              </List.Item>
            ))}
          </List.Root>
          <Text mt="2" fontWeight="medium">
            {LOCAL_CODE_DEFERRAL}
          </Text>
        </Alert.Description>
      </Alert.Content>
    </Alert.Root>
  );
}

/** A storage caution (frozen ≤ −18 °C, chilled ≤ 5 °C), which already ends with the deferral. */
export function StorageCaution({ text }: { text: string | undefined }) {
  if (!text) return null;
  return (
    <Alert.Root status="warning" borderRadius="l2" alignItems="start">
      <Alert.Indicator>
        <CautionIcon />
      </Alert.Indicator>
      <Alert.Content>
        <Alert.Title>Storage</Alert.Title>
        <Alert.Description>{text}</Alert.Description>
      </Alert.Content>
    </Alert.Root>
  );
}
