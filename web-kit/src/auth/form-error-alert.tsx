import { Alert, List } from '@chakra-ui/react';

/** A server answer the person can act on, announced to screen readers as it appears. */
export function FormErrorAlert({ title, messages }: { title: string; messages: string[] }) {
  return (
    <Alert.Root status="error" role="alert" borderRadius="l2">
      <Alert.Indicator />
      <Alert.Content>
        <Alert.Title>{title}</Alert.Title>
        {messages.length === 1 ? (
          <Alert.Description>{messages[0]}</Alert.Description>
        ) : messages.length > 1 ? (
          <Alert.Description>
            <List.Root ps="4">
              {messages.map((message) => (
                <List.Item key={message}>{message}</List.Item>
              ))}
            </List.Root>
          </Alert.Description>
        ) : null}
      </Alert.Content>
    </Alert.Root>
  );
}
