import { Card, Container, Heading, Stack, Text } from '@chakra-ui/react';
import type { ReactNode } from 'react';

/** The centred card that holds Sign in and Create account. */
export function AuthCard({
  title,
  intro,
  children,
  footer,
}: {
  title: string;
  intro: ReactNode;
  children: ReactNode;
  footer: ReactNode;
}) {
  return (
    <Container maxW="md" py={{ base: '8', md: '16' }} px={{ base: '4', md: '6' }}>
      <Card.Root variant="outline" bg="bg.panel" borderColor="border" boxShadow="card">
        <Card.Body gap="6" p={{ base: '6', md: '8' }}>
          <Stack gap="2">
            <Heading as="h1" fontSize="3xl" fontWeight="normal">
              {title}
            </Heading>
            <Text color="fg.muted">{intro}</Text>
          </Stack>
          {children}
          <Text textStyle="sm" color="fg.muted" textAlign="center">
            {footer}
          </Text>
        </Card.Body>
      </Card.Root>
    </Container>
  );
}
