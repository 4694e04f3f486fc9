import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { studioToday } from '../../../features/prep/lib/dates';
import { staffUser } from '../../../testing/fixtures';
import { TIME_ZONE } from '../../../testing/prep-api';
import { ENGAGEMENT } from '../../../testing/prep-fixtures';
import { renderPrep } from '../../../testing/prep-render';

const events = [ENGAGEMENT];
// The ice-cream base of the 24 March dinner is made on Monday 23 March: it rests 12 h.
const MONDAY = '/prep/schedule?date=2026-03-23';
const CUSTARD = /^Done: Whisk yolks with sugar and dextrose/;

/** A gate the stand-in's tick handler waits on, to see the screen before the server answers. */
function gate() {
  let open!: () => void;
  const closed = new Promise<void>((resolve) => (open = resolve));
  return { closed, open };
}

const taskOf = (checkbox: HTMLElement) => checkbox.closest('li')!;
/** The first screen of a test waits for its lazy route chunk and the planner: allow for a busy machine. */
const FIRST = { timeout: 15_000 };

describe('Prep → Schedule', () => {
  it('lists the day from the URL in order, with times, waits and the safety cautions on the task', async () => {
    const { api } = renderPrep(MONDAY, { events });
    const list = await screen.findByRole('list', { name: 'Tasks for Monday 23 March 2026' }, FIRST);
    expect(
      api.state.requests
        .filter((r) => r.url.pathname === '/api/prep/schedule')
        .map((r) => r.url.search),
    ).toContain('?date=2026-03-23');
    const tasks = within(list).getAllByRole('listitem');
    const starts = tasks.map((t) => /^(\d\d:\d\d)/.exec(t.textContent ?? '')?.[1] ?? '');
    expect(starts.length).toBeGreaterThan(3);
    expect([...starts].sort()).toEqual(starts);

    const custard = taskOf(screen.getByRole('checkbox', { name: CUSTARD }));
    // Custard to 82–85 °C (common practice) and cooling 57 → 21 °C in 2 h, → 5 °C in 6 h
    // (FDA Food Code §3-501.14(A)): the shared caution, on the task itself.
    expect(within(custard).getByText(/Cook the custard to 82–85 °C/)).toBeVisible();
    expect(within(custard).getByText('Hands-on 15 min · 85 °C · 1 batch')).toBeVisible();
    expect(within(custard).getByText(/Latest start \d\d:\d\d/)).toBeVisible();

    const rest = taskOf(
      screen.getByRole('checkbox', { name: /^Done: Rest covered in the cold room/ }),
    );
    expect(within(rest).getByText(/No hands-on work · wait 12 h · 4 °C/)).toBeVisible();
    expect(within(rest).getByText(/Hold cold at 5 °C or below/)).toBeVisible();
    expect(screen.getByText(/tasks · .* hands-on · 0 of \d+ done/)).toBeVisible();
  });

  it('ticks a task at once in the signed-in name, saves it, and keeps it after the answer', async () => {
    const { api, user } = renderPrep(MONDAY, { events, user: staffUser });
    const checkbox = await screen.findByRole('checkbox', { name: CUSTARD }, FIRST);
    const wait = gate();
    api.state.tickGate = wait.closed;
    await user.click(checkbox);

    // Before the server answers: ticked, in Tomás's name, saving.
    expect(checkbox).toBeChecked();
    const task = taskOf(checkbox);
    // The tick is now, not on the schedule's day: the day is named before the time.
    expect(task).toHaveTextContent(/by Tomás Reyes at \w{3} \d{1,2} \w{3} \d\d:\d\d · saving…/);

    wait.open();
    await waitFor(() => expect(within(task).queryByText(/saving…/)).not.toBeInTheDocument());
    expect(checkbox).toBeChecked();
    expect([...api.state.ticks.values()]).toEqual([
      { by: 'Tomás Reyes', at: expect.any(String) as string, batches: 1 },
    ]);
    expect(screen.getByText(/1 of \d+ done/)).toBeVisible();
  });

  it('puts the tick back and says why when it cannot be saved', async () => {
    const { api, user } = renderPrep(MONDAY, { events, user: staffUser });
    const checkbox = await screen.findByRole('checkbox', { name: CUSTARD }, FIRST);
    const wait = gate();
    api.state.tickGate = wait.closed;
    api.state.tickFailure = {
      status: 404,
      message: 'There is no prep task with that key on today’s plan.',
    };
    await user.click(checkbox);
    expect(checkbox).toBeChecked();

    wait.open();
    const alert = await within(taskOf(checkbox)).findByRole('alert');
    expect(alert).toHaveTextContent(
      'The tick was not saved: There is no prep task with that key on today’s plan. Try again.',
    );
    expect(checkbox).not.toBeChecked();
    expect(api.state.ticks.size).toBe(0);
  });

  it('shows who ticked and when, and unticks from the keyboard', async () => {
    const { api, user } = renderPrep(MONDAY, { events });
    // Ticked by a colleague at 09:15 in Paris (08:15 UTC in March, CET = UTC+1).
    const key = api.schedule('2026-03-23').tasks.find((t) => t.stepIndex === 1)!.taskKey;
    api.state.ticks.set(key, { by: 'Tomás Reyes', at: '2026-03-23T08:15:00.000Z', batches: 1 });
    const checkbox = await screen.findByRole('checkbox', { name: CUSTARD }, FIRST);
    expect(checkbox).toBeChecked();
    expect(within(taskOf(checkbox)).getByText('by Tomás Reyes at 09:15')).toBeVisible();
    expect(within(taskOf(checkbox)).queryByText(/Make \d+ more/)).toBeNull();

    checkbox.focus();
    await user.keyboard(' ');
    await waitFor(() => expect(checkbox).not.toBeChecked());
    await waitFor(() => expect(api.state.ticks.size).toBe(0));
    expect(api.state.requests.some((r) => r.url.pathname === `/api/prep/tasks/${key}/done`)).toBe(
      true,
    );
  });

  it('says how many batches to add when orders joined a task after it was ticked', async () => {
    // 200 guests: more custard than the machine takes at once.
    const { api } = renderPrep(MONDAY, { events: [{ ...ENGAGEMENT, guestCount: 200 }] });
    const task = api.schedule('2026-03-23').tasks.find((t) => t.batches >= 2)!;
    expect(task, 'a task of several batches on Monday').toBeDefined();
    // The server keeps the tick when another order joins the batch, with the batches ticked.
    api.state.ticks.set(task.taskKey, {
      by: 'Tomás Reyes',
      at: '2026-03-23T08:15:00.000Z',
      batches: task.batches - 1,
    });
    const checkbox = await screen.findByRole(
      'checkbox',
      { name: new RegExp(`^Done: ${task.stepName.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}`) },
      FIRST,
    );
    expect(checkbox).toBeChecked();
    expect(within(taskOf(checkbox)).getByText(/^Ticked for/)).toHaveTextContent(
      `Ticked for ${task.batches - 1} batch${task.batches === 2 ? '' : 'es'}; orders confirmed since need ${task.batches}. Make 1 more batch.`,
    );
  });

  it('states a conflict in words at the top and on the task it concerns', async () => {
    // Checked from Monday 20:00: the base cannot rest 12 h and still be churned before plating.
    renderPrep(MONDAY, { events, now: '2026-03-23T20:00:00+01:00' });
    const title = await screen.findByText(/^\d+ conflicts?\b/, {}, FIRST);
    const conflicts = title.closest('[role="alert"]')!;
    expect(conflicts).toHaveTextContent(/Not enough time\./);
    expect(conflicts).toHaveTextContent(
      /“Vanilla custard ice cream” for order ord-engagement cannot be ready in time\./,
    );
    expect(conflicts).toHaveTextContent(
      /It needs 12 h for “Rest covered in the cold room overnight/,
    );
    const custard = taskOf(screen.getByRole('checkbox', { name: CUSTARD }));
    expect(within(custard).getByText('Not enough time — see the conflict above.')).toBeVisible();
  });

  it('opens on today in the studio’s calendar, and says when a day has nothing to prep', async () => {
    const { router } = renderPrep('/prep/schedule', { events });
    await waitFor(
      () => expect(router.state.location.search).toBe(`?date=${studioToday(TIME_ZONE)}`),
      FIRST,
    );
    await router.navigate('/prep/schedule?date=2026-03-30');
    expect(
      await screen.findByRole('heading', { name: 'Nothing to prep on this day' }, FIRST),
    ).toBeVisible();
  });

  it('moves to the next day with the day picker', async () => {
    const { router, user } = renderPrep(MONDAY, { events });
    await screen.findByRole('list', { name: 'Tasks for Monday 23 March 2026' }, FIRST);
    await user.click(screen.getByRole('button', { name: 'Next day' }));
    await waitFor(() => expect(router.state.location.search).toBe('?date=2026-03-24'));
    expect(
      await screen.findByRole('list', { name: 'Tasks for Tuesday 24 March 2026' }, FIRST),
    ).toBeVisible();
  });
});
