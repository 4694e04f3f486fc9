import { Box, Card, Container, Flex, Heading, Stack, Text } from '@chakra-ui/react';
import type { ReactNode } from 'react';
import { Wordmark } from '../../components/ui/wordmark';

/** The page around the signed-out account screens: the wordmark over one centred card. */
export function AccountCard({
  title,
  intro,
  children,
  footer,
}: {
  title: string;
  intro: ReactNode;
  children: ReactNode;
  footer?: ReactNode;
}) {
  return (
    <Flex as="main" id="main-content" minH="100dvh" align="center" justify="center" bg="bg.muted">
      <Container maxW="md" py={{ base: '8', md: '16' }} px={{ base: '4', md: '6' }}>
        <Stack gap="6">
          <Box alignSelf="center">
            <Wordmark size="lg" />
          </Box>
          <Card.Root variant="outline" bg="bg.panel" borderColor="border" boxShadow="card">
            <Card.Body gap="6" p={{ base: '6', md: '8' }}>
              <Stack gap="2">
                <Heading as="h1" fontSize="3xl" fontWeight="normal">
                  {title}
                </Heading>
                <Text color="fg.muted">{intro}</Text>
              </Stack>
              {children}
              {footer && (
                <Text textStyle="sm" color="fg.muted">
                  {footer}
                </Text>
              )}
            </Card.Body>
          </Card.Root>
        </Stack>
      </Container>
    </Flex>
  );
}
