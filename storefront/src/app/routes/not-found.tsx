import { Button, Container, Heading, Stack, Text } from '@chakra-ui/react';
import { Link as RouterLink } from 'react-router';
import { PageTitle } from '../../components/ui/page-title';
import { paths } from '../../config/paths';

export function NotFoundRoute() {
  return (
    <>
      <PageTitle>Page not found</PageTitle>
      <Container maxW="2xl" py={{ base: '16', md: '24' }}>
        <Stack gap="4" align="start">
          <Text color="caramel.fg" fontWeight="semibold" letterSpacing="0.12em">
            404
          </Text>
          <Heading as="h1" fontSize={{ base: '4xl', md: '5xl' }} fontWeight="normal">
            This page is not on the menu
          </Heading>
          <Text color="fg.muted" textStyle="lg">
            The address may be mistyped, or the page may have moved.
          </Text>
          <Button asChild size="lg" mt="2">
            <RouterLink to={paths.home.getHref()}>Back to the home page</RouterLink>
          </Button>
        </Stack>
      </Container>
    </>
  );
}
