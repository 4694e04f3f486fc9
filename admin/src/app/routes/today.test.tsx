import { addIsoDays } from '@nappe/shared';
import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { studioToday } from '../../features/prep/lib/dates';
import { longDate, shortDate } from '../../features/prep/lib/format';
import { chefUser, staffUser } from '../../testing/fixtures';
import { TIME_ZONE } from '../../testing/prep-api';
import { eventsFrom } from '../../testing/prep-fixtures';
import { renderPrep } from '../../testing/prep-render';

const FIRST = { timeout: 15_000 };
const today = studioToday(TIME_ZONE);
const { tonight, later } = eventsFrom(today);

const section = async (name: string) =>
  within((await screen.findByRole('heading', { level: 2, name }, FIRST)).closest('section')!);

describe('Today', () => {
  it('shows staff tonight’s event with its briefing, the day’s tasks to tick and the recipes at today’s batches', async () => {
    const { api, user } = renderPrep('/', { events: [tonight, later], user: staffUser });

    const services = await section('Services today');
    const event = (await services.findByText('Noor Haddad', {}, FIRST)).closest('li')!;
    expect(event).toHaveTextContent('19:30');
    expect(event).toHaveTextContent('Garden Supper');
    expect(event).toHaveTextContent('20 guests');
    expect(within(event).getByRole('link', { name: /^Allergy briefing/ })).toHaveAttribute(
      'href',
      '/allergy-notes/ord-tonight/briefing',
    );
    const coming = within(services.getByRole('list', { name: 'Events coming up' }));
    expect(coming.getByText('Ambroos Claes')).toBeVisible();

    // The event day makes the parfait (frozen 6 h): its freeze task carries the frozen-storage
    // caution (≤ −18 °C, USDA FSIS).
    const prep = await section('Prep today');
    const freeze = await prep.findByRole('checkbox', { name: /^Done: Freeze/ }, FIRST);
    const task = freeze.closest('li')!;
    expect(task).toHaveTextContent('Frozen pistachio parfait');
    expect(task).toHaveTextContent(/Store frozen at −18 °C \(0 °F\) or below/);
    await user.click(freeze);
    await waitFor(() => expect(task).toHaveTextContent(/by Tomás Reyes at \d\d:\d\d/));
    await waitFor(() => expect(api.state.ticks.size).toBe(1));

    // The parfait keeps 7 days, so tonight's run also serves the dinner in 3 days. By hand:
    // 22 plates × 70 g + Celebration Trio 24 guests + 10 % = 27 plates × 70 g = 1,540 + 1,890 =
    // 3,430 g; moulds hold 1,680 g → ceil(3,430 ÷ 1,680) = 3 batches of 1,143.3 g.
    const recipes = await section('Recipes for today’s batches');
    const parfait = (await recipes.findByText('Frozen pistachio parfait', {}, FIRST)).closest(
      'li',
    )!;
    expect(parfait).toHaveTextContent('3,430 g in 3 batches of 1,143 g');
    expect(
      within(parfait).getByRole('link', { name: /Scaled to one batch \(1,143 g\)/ }),
    ).toHaveAttribute('href', '/kitchen/recipes/rec-pistachio-parfait/scale?grams=1143');
    expect(parfait).toHaveTextContent(/Store frozen at −18 °C/);

    // Staff: no money, no chef-only line.
    expect(screen.queryByText(/€/)).not.toBeInTheDocument();
    expect(screen.queryByText(/waiting for your decision/)).not.toBeInTheDocument();
    expect(api.state.requests.some((r) => r.url.searchParams.get('status') === 'requested')).toBe(
      false,
    );
  });

  it('gives the chef a line of requests waiting for a decision, linking to Orders', async () => {
    // Six events in the coming week: five are listed, the sixth is pointed to.
    const week = [1, 2, 3, 4, 5, 6].map((n) => ({
      ...later,
      id: `ord-week-${n}`,
      reference: `N-2026-03${n}0`,
      eventDate: addIsoDays(today, n),
    }));
    renderPrep('/', { events: [tonight, ...week], user: chefUser, waitingRequests: 2 });
    const requests = await screen.findByRole('complementary', { name: 'Requests' }, FIRST);
    expect(requests).toHaveTextContent('2 requests waiting for your decision');
    expect(within(requests).getByRole('link', { name: /Review in Orders/ })).toHaveAttribute(
      'href',
      '/orders?status=requested',
    );
    const services = await section('Services today');
    const coming = await services.findByRole('list', { name: 'Events coming up' }, FIRST);
    expect(within(coming).getAllByRole('listitem')).toHaveLength(5);
    expect(services.getByText(/and 1 more event in the next 7 days/)).toBeVisible();
    expect(services.getByRole('link', { name: 'see the Plan' })).toHaveAttribute(
      'href',
      `/prep/plan?from=${today}&to=${addIsoDays(today, 7)}`,
    );
  });

  it('says when there is nothing to prep today and shows the next prep day', async () => {
    const { api } = renderPrep('/', { events: [later], user: staffUser });
    const prep = await section('Prep today');
    expect(await prep.findByText('Nothing to prep today.', {}, FIRST)).toBeVisible();
    const next = api.plan(today, later.eventDate).schedule.days.find((d) => d.date > today)!;
    expect(
      await prep.findByRole('heading', { name: `Next prep day: ${longDate(next.date)}` }, FIRST),
    ).toBeVisible();
    expect(prep.getByRole('list', { name: `Tasks for ${longDate(next.date)}` })).toBeVisible();
    expect(prep.queryByRole('checkbox')).not.toBeInTheDocument();
    expect(
      await screen.findByRole('heading', { name: `Recipes for ${shortDate(next.date)}` }),
    ).toBeVisible();
    const services = await section('Services today');
    expect(services.getByText('No services today.')).toBeVisible();
  });
});
