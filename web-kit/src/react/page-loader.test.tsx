import { ChakraProvider, defaultSystem } from '@chakra-ui/react';
import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { PageLoader } from './page-loader.js';

// role="status" with aria-live="polite" is read out once it changes, without interrupting
// (WAI-ARIA 1.2, the status role).
describe('PageLoader', () => {
  it('says it is loading, politely, to screen readers', () => {
    render(
      <ChakraProvider value={defaultSystem}>
        <PageLoader />
      </ChakraProvider>,
    );
    const status = screen.getByRole('status');
    expect(status).toHaveTextContent('Loading…');
    expect(status).toHaveAttribute('aria-live', 'polite');
  });

  it('says what is loading when told', () => {
    render(
      <ChakraProvider value={defaultSystem}>
        <PageLoader label="Loading your events…" />
      </ChakraProvider>,
    );
    expect(screen.getByRole('status')).toHaveTextContent('Loading your events…');
  });
});
