import { configure, screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { beforeAll, describe, expect, it } from 'vitest';
import { staffUser } from '../../testing/fixtures';
import { server } from '../../testing/server';
import { dashboard, emptyDashboard } from '../../testing/studio-fixtures';
import { renderStudio } from '../../testing/studio-render';

// Money is formatted by Intl with CLDR's en-GB pattern for EUR ("€1,560.00": symbol first, comma
// for thousands, two decimals, ISO 4217's minor unit for EUR). The sums are worked by hand from
// the fixture in src/testing/studio-fixtures.ts. 5 December 2026 is a Saturday (ISO 8601 calendar).

/** The row of a table whose first cell (its row header) is `label`. */
function rowOf(table: HTMLElement, label: string) {
  const header = within(table).getByRole('rowheader', { name: label });
  return within(header.closest('tr')!);
}

describe('Insights', () => {
  // The screen's chunk carries recharts: load it once up front, as the browser would on first visit.
  beforeAll(async () => {
    // Whole-route tests on a busy 2-core machine: screens can take longer than the default wait.
    configure({ asyncUtilTimeout: 15_000 });
    await import('./insights');
  }, 30_000);

  it('shows the alerts, each linking to its order, and the next 14 days and waiting requests', async () => {
    renderStudio('/insights');

    const alerts = await screen.findByRole('region', { name: 'Needs your attention (3)' });
    // Each alert names its kind in words, not only in colour.
    expect(within(alerts).getByText('Lead time too short')).toBeInTheDocument();
    expect(within(alerts).getByText('Balance overdue')).toBeInTheDocument();
    expect(within(alerts).getByText('Allergy conflict')).toBeInTheDocument();
    // 84 000 minor units of EUR = €840.00.
    expect(
      within(alerts).getByText(
        'Event Sat 12 Dec (in 10 days) · €840.00 due since 28 November 2026',
      ),
    ).toBeInTheDocument();
    // The reference is the link; the message does not repeat it.
    expect(
      within(alerts).getByText('2 guest plates still conflict with a guest’s requirement.'),
    ).toBeInTheDocument();
    expect(within(alerts).getByRole('link', { name: 'Open order NP-0098' })).toHaveAttribute(
      'href',
      '/orders/ord-3',
    );
    expect(within(alerts).getAllByRole('link', { name: 'Open order NP-0101' })).toHaveLength(2);

    const upcoming = screen.getByRole('region', { name: 'Next 14 days (2)' });
    expect(within(upcoming).getByText('Sat 5 Dec')).toBeInTheDocument();
    expect(within(upcoming).getByText('(in 3 days)')).toBeInTheDocument();
    expect(within(upcoming).getByRole('link', { name: 'NP-0101' })).toHaveAttribute(
      'href',
      '/orders/ord-1',
    );
    expect(within(upcoming).getByText('Confirmed')).toBeInTheDocument();
    expect(within(upcoming).getByText('Requested')).toBeInTheDocument();

    const requests = screen.getByRole('region', { name: 'Waiting for your decision (1)' });
    expect(within(requests).getByRole('link', { name: 'NP-0102' })).toHaveAttribute(
      'href',
      '/orders/ord-2',
    );
    expect(within(requests).getByText('€1,560.00')).toBeInTheDocument();
    // Requested on 30 November (studio time), two days before the fixture's today.
    expect(within(requests).getByText('Requested 2 days ago')).toBeInTheDocument();
  }, 60_000);

  it('gives every chart a summary and a table with every figure, for screen readers', async () => {
    renderStudio('/insights');

    const revenue = await screen.findByRole('region', { name: 'Revenue by month' });
    // 420.00 + 960.00 + 1,200.50 + 610.00 + 468.00 = 3,658.50.
    expect(
      within(revenue).getByText(
        '€3,658.50 received, less refunds, from January 2026 to December 2026. Best month: October 2026 (€1,200.50). This month so far: €468.00.',
      ),
    ).toBeInTheDocument();
    const revenueTable = within(revenue).getByRole('table', { name: 'Revenue by month, EUR' });
    expect(within(revenueTable).getAllByRole('row')).toHaveLength(13); // header + 12 months
    const october = rowOf(revenueTable, 'October 2026');
    expect(october.getByText('€1,300.50')).toBeInTheDocument();
    expect(october.getByText('€100.00')).toBeInTheDocument();
    expect(october.getByText('€1,200.50')).toBeInTheDocument();

    const plates = screen.getByRole('region', { name: 'Plates by week' });
    // Weeks to date: 24 (2 Nov) + 19 (this week, 30 Nov) = 43 in 13 weeks; 42 booked ahead.
    expect(
      within(plates).getByText(
        '43 plates in the 13 weeks up to this one (this week: 19 plates); 42 plates booked in the 4 weeks ahead. Busiest: the week of 7 December 2026, 42 plates.',
      ),
    ).toBeInTheDocument();
    const platesTable = within(plates).getByRole('table', { name: /Plates by week/ });
    expect(
      rowOf(platesTable, 'Week of 30 November 2026').getByText('This week'),
    ).toBeInTheDocument();
    expect(rowOf(platesTable, 'Week of 7 December 2026').getByText('42')).toBeInTheDocument();
    expect(
      rowOf(platesTable, 'Week of 7 December 2026').getByText('Booked ahead'),
    ).toBeInTheDocument();
    // The two kinds of bar are told apart in words, not by colour alone.
    expect(within(plates).getByText('Booked ahead (striped)')).toBeInTheDocument();

    const foodCost = screen.getByRole('region', { name: 'Food cost over time' });
    expect(
      within(foodCost).getByText(
        'Latest: November 2026, 24 %. Lowest 24 % (March 2026), highest 31.4 % (October 2026).',
      ),
    ).toBeInTheDocument();
    const foodTable = within(foodCost).getByRole('table', { name: /Food cost by month/ });
    expect(rowOf(foodTable, 'October 2026').getByText('31.4 %')).toBeInTheDocument();
    expect(rowOf(foodTable, 'February 2026').getByText('No events served')).toBeInTheDocument();
  }, 60_000);

  it('shows four alerts at first, and the rest on request', async () => {
    const many = Array.from({ length: 6 }, (_, i) => ({
      kind: 'allergy_conflict' as const,
      orderId: `ord-${i}`,
      reference: `NP-02${i}0`,
      eventDate: '2026-12-05',
      unresolvedPlates: 1,
      message: `NP-02${i}0: 1 guest plate still conflicts with a guest’s requirement.`,
    }));
    const { user } = renderStudio('/insights', undefined, {
      dashboard: { ...dashboard, alerts: many },
    });
    const alerts = await screen.findByRole('region', { name: 'Needs your attention (6)' });
    expect(within(alerts).getAllByRole('listitem')).toHaveLength(4);
    const more = within(alerts).getByRole('button', { name: 'Show all 6 alerts' });
    expect(more).toHaveAttribute('aria-expanded', 'false');
    await user.click(more);
    expect(within(alerts).getAllByRole('listitem')).toHaveLength(6);
    expect(within(alerts).getByRole('button', { name: 'Show fewer' })).toHaveAttribute(
      'aria-expanded',
      'true',
    );
  }, 60_000);

  it('tells a new studio with no orders what will appear, instead of empty charts', async () => {
    renderStudio('/insights', undefined, { dashboard: emptyDashboard });
    expect(await screen.findByRole('heading', { level: 2, name: 'No bookings yet' })).toBeVisible();
    expect(screen.queryByRole('region', { name: 'Revenue by month' })).not.toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Check the menus clients can book' })).toHaveAttribute(
      'href',
      '/kitchen/menus',
    );
  }, 60_000);

  it('shows an error with a retry that works', async () => {
    const { user } = renderStudio('/insights');
    let fixed = false;
    server.use(
      http.get('/api/insights/dashboard', () =>
        fixed
          ? HttpResponse.json(emptyDashboard)
          : HttpResponse.json({ statusCode: 500, message: 'Internal' }, { status: 500 }),
      ),
    );
    const alert = await screen.findByRole('alert');
    expect(within(alert).getByText('The figures could not be loaded')).toBeInTheDocument();
    fixed = true;
    await user.click(within(alert).getByRole('button', { name: 'Try again' }));
    expect(await screen.findByText('No bookings yet')).toBeInTheDocument();
  }, 60_000);

  it('is the chef’s: staff get an explanation and no figures are requested', async () => {
    const { api } = renderStudio('/insights', staffUser);
    server.use(
      http.get('/api/insights/dashboard', () => {
        throw new Error('staff must not ask for the dashboard');
      }),
    );
    expect(
      await screen.findByRole('heading', { level: 1, name: 'Not available for your role' }),
    ).toBeInTheDocument();
    expect(api.state.requests).toEqual([]);
  });
});
