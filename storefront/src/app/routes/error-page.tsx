import { Box, Button, Container, Heading, HStack, Stack, Text } from '@chakra-ui/react';
import { isRouteErrorResponse, Link as RouterLink, useRouteError } from 'react-router';
import { PageTitle } from '../../components/ui/page-title';
import { paths } from '../../config/paths';
import { ApiError } from '../../lib/api-client';
import type { NotFoundData } from '../loaders';

/** What a person sees when a screen fails to load or crashes: never a blank page. */
export function ErrorPage() {
  const error = useRouteError();
  const notFound = isRouteErrorResponse(error) && error.status === 404;
  // A screen that knows what was missing (an unknown menu or event) says so, with a way back.
  const known = notFound ? (error.data as Partial<NotFoundData> | undefined) : undefined;
  const specific = known?.title && known.message && known.back ? (known as NotFoundData) : null;
  // No answer, or the proxy in front of the API got none (bad gateway, unavailable, timeout).
  const offline = error instanceof ApiError && [0, 502, 503, 504].includes(error.status);
  // A new release replaces the chunk files; an open tab then asks for ones that are gone.
  const staleChunk =
    error instanceof TypeError && /dynamically imported module|import\(\)/i.test(error.message);

  const throttled = error instanceof ApiError && error.status === 429;

  const title = specific
    ? specific.title
    : notFound
      ? 'Page not found'
      : throttled
        ? 'Too many requests'
        : 'Something went wrong';
  const message = specific
    ? specific.message
    : notFound
      ? 'The address may be mistyped, or the page may have moved.'
      : throttled
        ? `The server asked us to slow down. Please try again in ${error.retryAfterSeconds ?? 60} seconds.`
        : offline
          ? 'We could not reach Nappe. Check your connection, then try again.'
          : staleChunk
            ? 'A newer version of this site is available. Reloading will fetch it.'
            : 'This page could not be shown. Please try again; if it keeps happening, come back a little later.';

  return (
    <Box as="section" role="alert" aria-labelledby="error-heading">
      <PageTitle>{title}</PageTitle>
      <Container maxW="2xl" py={{ base: '16', md: '24' }}>
        <Stack gap="4" align="start">
          <Heading
            as="h1"
            id="error-heading"
            fontSize={{ base: '3xl', md: '4xl' }}
            fontWeight="normal"
          >
            {title}
          </Heading>
          <Text color="fg.muted" textStyle="lg">
            {message}
          </Text>
          <HStack gap="3" mt="2" wrap="wrap">
            {!notFound && <Button onClick={() => window.location.reload()}>Try again</Button>}
            {specific ? (
              <Button asChild>
                <RouterLink to={specific.back.href}>{specific.back.label}</RouterLink>
              </Button>
            ) : (
              <Button asChild variant="outline">
                <RouterLink to={paths.home.getHref()}>Go to the home page</RouterLink>
              </Button>
            )}
          </HStack>
        </Stack>
      </Container>
    </Box>
  );
}
