import { addIsoDays } from '@nappe/shared';
import { screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { studioToday } from '../../../features/prep/lib/dates';
import { staffUser } from '../../../testing/fixtures';
import { TIME_ZONE } from '../../../testing/prep-api';
import { BOARD_DINNER, ENGAGEMENT } from '../../../testing/prep-fixtures';
import { renderPrep } from '../../../testing/prep-render';

const events = [ENGAGEMENT, BOARD_DINNER];
const WEEK = '/prep/plan?from=2026-03-23&to=2026-03-29';

/** The text of each cell of the row whose first cell starts with `first`, in the table `name`. */
function row(name: string, first: string | RegExp): string[] {
  const table = screen.getByRole('table', { name });
  const cell = within(table)
    .getAllByRole('cell')
    .find((c) =>
      typeof first === 'string'
        ? c.textContent?.startsWith(first)
        : first.test(c.textContent ?? ''),
    );
  if (!cell) throw new Error(`No row starting ${String(first)} in ${name}`);
  return within(cell.closest('tr')!)
    .getAllByRole('cell')
    .map((c) => c.textContent ?? '');
}

const planRequests = (api: ReturnType<typeof renderPrep>['api']) =>
  api.state.requests.filter((r) => r.url.pathname === '/api/prep/plan');

afterEach(() => vi.restoreAllMocks());

/** The first screen of a test waits for its lazy route chunk and the planner: allow for a busy machine. */
const FIRST = { timeout: 15_000 };

describe('Prep → Plan', () => {
  it('asks for the dates in the URL and shows plates, grams and batches as the hand sum gives them', async () => {
    const { api } = renderPrep(WEEK, { events });
    await screen.findByRole('heading', { level: 2, name: 'Plates per dessert' }, FIRST);
    expect(planRequests(api).map((r) => r.url.search)).toEqual(['?from=2026-03-23&to=2026-03-29']);

    // By hand (shared prep-plan test, demo catalogue): 20 guests + 10 % spare = ceil(22.0) = 22
    // plates; 2 of them changed. The board dinner (2 April) is outside the range.
    expect(row('Plates per dessert', 'Pistachio Frost')).toEqual(['Pistachio Frost', '22', '1']);
    expect(row('Events and their plates', /^Tue 24 Mar 19:30/)[2]).toBe(
      'Pistachio Frost: 22 (2 spare, 2 changed)',
    );
    // Ice cream base 60 g × 21 standard plates = 1,260 g on Monday (12 h rest before churning);
    // crumble 25 g × 21 plates (one guest has none) = 525 g on Tuesday; parfait 70 g × 22 = 1,540 g.
    const monday = 'Recipes to make on Monday 23 March 2026';
    const tuesday = 'Recipes to make on Tuesday 24 March 2026';
    expect(row(monday, 'Vanilla custard ice cream')[1]).toBe('1,260 g');
    expect(row(tuesday, 'Brown-butter almond crumble')[1]).toBe('525 g');
    expect(row(tuesday, 'Frozen pistachio parfait')[1]).toBe('1,540 g');
    // The replacement is made for the one changed plate: 60 g of crème fraîche cream.
    expect(row('Totals per recipe', 'Piped crème fraîche cream')[1]).toBe('60 g');
    // Batches against the equipment: 1,540 g of parfait in moulds that hold 1,680 g → 1 batch.
    expect(row(tuesday, 'Frozen pistachio parfait')[2]).toMatch(
      /^1 batch × 1,540 g.*up to 1,680 g/,
    );

    // The chef sees what the packs cost: pistachio paste 233.9 g → one 1 kg pack at €56.00.
    expect(row('Purchase list', 'Pistachio paste')).toEqual([
      'Pistachio paste, pure',
      '234 g',
      '1 × 1 kg',
      '€56.00',
      '€56.00',
      '€13.10',
    ]);
    expect(screen.getByRole('columnheader', { name: 'Pack price' })).toBeInTheDocument();
  });

  it('shows staff the plan with no cost column and no money at all', async () => {
    renderPrep(WEEK, { events, user: staffUser });
    const purchases = await screen.findByRole('table', { name: 'Purchase list' }, FIRST);
    expect(
      within(purchases)
        .getAllByRole('columnheader')
        .map((h) => h.textContent),
    ).toEqual(['Ingredient', 'Needed', 'To buy']);
    expect(row('Purchase list', 'Pistachio paste')).toEqual([
      'Pistachio paste, pure',
      '234 g',
      '1 × 1 kg',
    ]);
    expect(screen.queryByText(/€/)).not.toBeInTheDocument();
    expect(screen.queryByText('Purchase list', { selector: 'p' })).not.toBeInTheDocument();
  });

  it('opens on the next 7 days in the studio’s calendar, written into the URL', async () => {
    const { api, router } = renderPrep('/prep/plan', { events });
    const today = studioToday(TIME_ZONE);
    const expected = `?from=${today}&to=${addIsoDays(today, 6)}`;
    await waitFor(() => expect(router.state.location.search).toBe(expected), FIRST);
    await waitFor(() => expect(planRequests(api).map((r) => r.url.search)).toContain(expected));
  });

  it('changes the range from the form, and refuses a range that ends before it starts', async () => {
    const { api, router, user } = renderPrep(WEEK, { events });
    await screen.findByRole('heading', { level: 2, name: 'Plates per dessert' }, FIRST);
    const first = screen.getByLabelText('First event day');
    const last = screen.getByLabelText('Last event day');

    await user.clear(last);
    await user.type(last, '2026-03-20');
    await user.click(screen.getByRole('button', { name: 'Show plan' }));
    expect(
      await screen.findByText('The last day must be on or after the first day.'),
    ).toBeVisible();
    expect(router.state.location.search).toBe('?from=2026-03-23&to=2026-03-29');

    await user.clear(first);
    await user.type(first, '2026-03-30');
    await user.clear(last);
    await user.type(last, '2026-04-05');
    await user.click(screen.getByRole('button', { name: 'Show plan' }));
    await waitFor(() =>
      expect(router.state.location.search).toBe('?from=2026-03-30&to=2026-04-05'),
    );
    await waitFor(() =>
      expect(planRequests(api).at(-1)?.url.search).toBe('?from=2026-03-30&to=2026-04-05'),
    );
    // Now only the board dinner: Celebration Trio, 24 guests + 10 % → ceil(26.4) = 27 plates of each.
    await waitFor(() =>
      expect(row('Plates per dessert', 'Hazelnut Rum Cloud')).toEqual([
        'Hazelnut Rum Cloud',
        '27',
        '1',
      ]),
    );
  });

  it('says so when no confirmed event falls in the dates, and offers no downloads', async () => {
    renderPrep('/prep/plan?from=2026-04-06&to=2026-04-12', { events });
    expect(
      await screen.findByRole('heading', { name: 'No confirmed events in these dates' }, FIRST),
    ).toBeVisible();
    expect(screen.queryByRole('button', { name: /Purchase list/ })).not.toBeInTheDocument();
  });

  it('explains a range in the URL that cannot be planned, without asking the API', async () => {
    const { api } = renderPrep('/prep/plan?from=2026-02-30&to=2026-03-05', { events });
    expect(await screen.findByText(/Choose a real first day\./, {}, FIRST)).toBeVisible();
    expect(planRequests(api)).toEqual([]);
  });

  it('downloads the purchase list and the prep sheet with the signed-in token', async () => {
    const clicks: Array<{ name: string; href: string }> = [];
    vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (
      this: HTMLAnchorElement,
    ) {
      clicks.push({ name: this.download, href: this.href });
    });
    const { api, user } = renderPrep(WEEK, { events });
    await user.click(await screen.findByRole('button', { name: 'Purchase list (CSV)' }, FIRST));
    await waitFor(() =>
      expect(clicks.map((c) => c.name)).toEqual(['prep-plan-2026-03-23-2026-03-29.csv']),
    );
    await user.click(screen.getByRole('button', { name: 'Prep sheet (PDF)' }));
    await waitFor(() => expect(clicks).toHaveLength(2));
    expect(clicks[1]!.name).toBe('prep-sheet-2026-03-23-2026-03-29.pdf');
    const files = api.state.requests.filter((r) => /\.(csv|pdf)$/.test(r.url.pathname));
    expect(files.map((r) => `${r.url.pathname}${r.url.search}`)).toEqual([
      '/api/prep/plan.csv?from=2026-03-23&to=2026-03-29',
      '/api/prep/plan.pdf?from=2026-03-23&to=2026-03-29',
    ]);
    expect(files.every((r) => r.auth === 'Bearer token-for-u-chef-1')).toBe(true);
  });
});
