import { createQueryClient } from '@nappe/web-kit/react';
import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { AppProvider } from '../../app/provider';
import { BlockSkeleton } from './block-skeleton';

// role="status" is a polite live region announced once, named here by its hidden text (WAI-ARIA
// 1.2, the status role); the grey bars are aria-hidden so they are not read out.
describe('BlockSkeleton', () => {
  it('is announced once by its label, and its bars stay silent', () => {
    render(
      <AppProvider queryClient={createQueryClient()}>
        <BlockSkeleton label="Loading the figures…" rows={3} />
      </AppProvider>,
    );
    const status = screen.getByRole('status');
    expect(status).toHaveTextContent('Loading the figures…');
    const bars = status.querySelector('[aria-hidden="true"]');
    // The heading bar and the three rows.
    expect(bars?.children).toHaveLength(4);
  });
});
