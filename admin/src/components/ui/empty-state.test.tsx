import { Button } from '@chakra-ui/react';
import { createQueryClient } from '@nappe/web-kit/react';
import { render, screen } from '@testing-library/react';
import type { ReactElement } from 'react';
import { describe, expect, it } from 'vitest';
import { AppProvider } from '../../app/provider';
import { EmptyState } from './empty-state';
import { InboxIcon } from './icons';

function renderIn(ui: ReactElement) {
  render(<AppProvider queryClient={createQueryClient()}>{ui}</AppProvider>);
}

// Headings are found by role and level (WAI-ARIA 1.2, the heading role and aria-level; HTML h1–h6
// map to levels 1–6 in HTML-AAM).
describe('EmptyState', () => {
  it('names what is missing as an h3 by default, with what to do and the action', () => {
    renderIn(
      <EmptyState
        icon={<InboxIcon />}
        title="No menus yet"
        action={<Button size="sm">New menu</Button>}
      >
        Put desserts together into a menu clients can book.
      </EmptyState>,
    );
    expect(screen.getByRole('heading', { level: 3, name: 'No menus yet' })).toBeInTheDocument();
    expect(
      screen.getByText('Put desserts together into a menu clients can book.'),
    ).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'New menu' })).toBeInTheDocument();
  });

  it('takes the heading level it is given, and without words shows the title alone', () => {
    renderIn(<EmptyState icon={<InboxIcon />} title="Nothing to prep on this day" titleAs="h2" />);
    const heading = screen.getByRole('heading', { level: 2, name: 'Nothing to prep on this day' });
    expect(screen.queryByRole('heading', { level: 3 })).not.toBeInTheDocument();
    expect(heading.parentElement?.querySelector('p')).toBeNull();
  });
});
