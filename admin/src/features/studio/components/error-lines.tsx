import { Box, Field } from '@chakra-ui/react';

/** A field's messages, one a line (a cancellation policy can break several rules at once). */
export function ErrorLines({ message }: { message?: string }) {
  if (!message) return null;
  return (
    <Field.ErrorText display="block">
      {message.split('\n').map((line) => (
        <Box as="span" display="block" key={line}>
          {line}
        </Box>
      ))}
    </Field.ErrorText>
  );
}
