import { configure, screen, waitFor, within } from '@testing-library/react';
import { beforeAll, describe, expect, it } from 'vitest';
import { staffUser } from '../../../testing/fixtures';
import { renderStudio } from '../../../testing/studio-render';

// The messages checked here are the shared settings schema's own (shared/src/settings/), the
// ones the API answers with (api/test/studio-settings.e2e-spec.ts checks the same words).

async function field(label: string | RegExp) {
  return (await screen.findByLabelText(label)) as HTMLInputElement;
}

function section(name: string) {
  return within(screen.getByRole('region', { name }));
}

describe('Studio → Settings', () => {
  beforeAll(async () => {
    // Whole-route tests on a busy 2-core machine: screens can take longer than the default wait.
    configure({ asyncUtilTimeout: 15_000 });
    await import('./settings');
  }, 30_000);

  it('shows every setting, the policy in words, and saves the changes in one PUT', async () => {
    const { user, api } = renderStudio('/studio/settings');

    expect(await field('Studio name')).toHaveValue('Atelier Verjus');
    expect(await field('Tax rate')).toHaveValue('20');
    expect(screen.getByRole('radio', { name: /Include tax/ })).toBeChecked();
    expect(await field('Time zone')).toHaveValue('Europe/Paris');
    expect(
      screen.getByText('Cancelled 30 days or more before the event: 100 % refunded.'),
    ).toBeVisible();
    expect(screen.getByText('Cancelled 14 to 29 days before: 50 % refunded.')).toBeVisible();
    expect(screen.getByText('Cancelled 0 to 13 days before: no refund.')).toBeVisible();

    const spare = await field('Spare plates');
    await user.clear(spare);
    await user.type(spare, '8');
    await user.clear(await field('Tax rate'));
    await user.type(await field('Tax rate'), '5,5');
    const calendar = section('Kitchen and calendar');
    await user.type(calendar.getByLabelText('Add a closed day'), '2030-01-01');
    await user.click(calendar.getByRole('button', { name: 'Add' }));
    expect(calendar.getByText('Tue 1 January 2030')).toBeInTheDocument();
    expect(screen.getByText('Unsaved changes')).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Save settings' }));

    expect(
      await screen.findByText('Settings saved: tax rate, closed days, spare plates.'),
    ).toBeInTheDocument();
    const puts = api.state.requests.filter((r) => r.method === 'PUT');
    expect(puts).toHaveLength(1);
    // "5,5" % is 550 basis points; closed days are kept in date order.
    expect(puts[0]!.body).toMatchObject({
      sparePercent: 8,
      taxRateBp: 550,
      blackoutDates: ['2030-01-01', '2030-12-25'],
      name: 'Atelier Verjus',
      workingHours: { start: '07:00', end: '19:00' },
    });
    expect(screen.queryByText('Unsaved changes')).not.toBeInTheDocument();
  }, 60_000);

  it('checks the values before sending, with the schema’s messages beside the fields', async () => {
    const { user, api } = renderStudio('/studio/settings');

    const deposit = await field('Deposit');
    await user.clear(deposit);
    await user.type(deposit, '0');
    const capacity = await field('Daily plate capacity');
    await user.clear(capacity);
    await user.type(capacity, '12.5');
    await user.clear(await field('Tax rate'));
    await user.type(await field('Tax rate'), '101');
    const closing = await field('Closing time');
    await user.clear(closing);
    await user.type(closing, '06:00');
    const policy = section('Cancellation policy');
    // The last tier now starts 3 days before: nothing covers the last days, and cancelling
    // at 3 days refunds more than cancelling at 14.
    const lastDays = policy.getByRole('textbox', { name: 'From, days before (tier 3)' });
    await user.clear(lastDays);
    await user.type(lastDays, '3');
    const lastRefund = policy.getByRole('textbox', { name: 'Refund, % (tier 3)' });
    await user.clear(lastRefund);
    await user.type(lastRefund, '60');

    await user.click(screen.getByRole('button', { name: 'Save settings' }));

    expect(await screen.findByText('The deposit must be 1 % or more.')).toBeInTheDocument();
    expect(
      screen.getByText('The daily plate capacity must be a whole number.'),
    ).toBeInTheDocument();
    expect(screen.getByText('The tax rate must be 100 % or less.')).toBeInTheDocument();
    expect(
      screen.getByText(
        'Working hours must end after they start on the same day (for example 07:00–19:00).',
      ),
    ).toBeInTheDocument();
    expect(
      policy.getByText(
        'Add a last tier that starts 0 days before the event, so a cancellation on any date up to the event has a rule.',
      ),
    ).toBeInTheDocument();
    expect(
      policy.getByText(
        'Cancelling earlier must never refund less: from 14 days before, the refund is 50 %, but from 3 days before it is 60 %.',
      ),
    ).toBeInTheDocument();
    expect(
      screen.getByText('Some settings need a change: see the messages beside the fields.'),
    ).toBeInTheDocument();
    // The first field in error (the tax rate, in the Money section) has the focus; nothing was sent.
    await waitFor(() => expect(document.activeElement).toHaveAccessibleName('Tax rate'));
    expect(api.state.requests).toEqual([]);

    // Fixing one field clears its message as soon as it is right.
    await user.clear(deposit);
    await user.type(deposit, '30');
    await waitFor(() =>
      expect(screen.queryByText('The deposit must be 1 % or more.')).not.toBeInTheDocument(),
    );
  }, 60_000);

  it('puts the server’s 400 messages beside their fields, and the rest above the save button', async () => {
    const { user, api } = renderStudio('/studio/settings');
    await field('Studio name');
    api.state.refuseNextSettings = [
      'depositPercent: The deposit must be 1 % or more.',
      'cancellationTiers[1].refundPercent: The refund must be 100 % or less.',
      'taxRateBp: The tax rate (in basis points, 2100 = 21 %) must be 10000 or less.',
      'Unrecognized key: "status"',
    ];
    await user.click(screen.getByRole('button', { name: 'Save settings' }));

    expect(await screen.findByText('The server did not accept these settings')).toBeInTheDocument();
    expect(screen.getByText('Unrecognized key: "status"')).toBeInTheDocument();
    const deposit = await field('Deposit');
    expect(deposit).toHaveAttribute('aria-invalid', 'true');
    expect(screen.getByText('The deposit must be 1 % or more.')).toBeInTheDocument();
    // Basis points in the server's words; per cent beside the per-cent field.
    expect(screen.getByText('The tax rate must be 100 % or less.')).toBeInTheDocument();
    const policy = section('Cancellation policy');
    expect(policy.getByText('The refund must be 100 % or less.')).toBeInTheDocument();
    expect(policy.getByRole('textbox', { name: 'Refund, % (tier 2)' })).toHaveAttribute(
      'aria-invalid',
      'true',
    );
    // Nothing typed was lost.
    expect(await field('Studio name')).toHaveValue('Atelier Verjus');
  }, 60_000);

  it('asks before leaving with unsaved changes, and keeps them on "Stay"', async () => {
    const { user, router } = renderStudio('/studio/settings');
    const name = await field('Studio name');
    await user.type(name, ' & Fils');

    await router.navigate('/studio/team');
    const dialog = await screen.findByRole('alertdialog', { name: 'Leave without saving?' });
    await user.click(within(dialog).getByRole('button', { name: 'Stay and keep editing' }));
    expect(router.state.location.pathname).toBe('/studio/settings');
    expect(await field('Studio name')).toHaveValue('Atelier Verjus & Fils');

    await user.click(screen.getByRole('button', { name: 'Discard changes' }));
    expect(await field('Studio name')).toHaveValue('Atelier Verjus');
  }, 60_000);

  it('warns that prices are not converted when the currency changes', async () => {
    const { user } = renderStudio('/studio/settings');
    await user.selectOptions(await field('Currency'), 'GBP');
    expect(screen.getByText('Prices are not converted')).toBeInTheDocument();
    expect(screen.getByText(/will be read in GBP/)).toBeInTheDocument();
  }, 60_000);

  it('refuses a closed day listed twice at once', async () => {
    const { user } = renderStudio('/studio/settings');
    await field('Studio name');
    const calendar = section('Kitchen and calendar');
    await user.type(calendar.getByLabelText('Add a closed day'), '2030-12-25');
    await user.click(calendar.getByRole('button', { name: 'Add' }));
    expect(calendar.getByText('Wed 25 December 2030 is already closed.')).toBeInTheDocument();
    await user.click(calendar.getByRole('button', { name: 'Remove Wed 25 December 2030' }));
    expect(
      calendar.getByText('No closed days: every day can be booked, up to the daily capacity.'),
    ).toBeInTheDocument();
  }, 60_000);

  it('is the chef’s: staff get an explanation', async () => {
    renderStudio('/studio/settings', staffUser);
    expect(
      await screen.findByRole('heading', { level: 1, name: 'Not available for your role' }),
    ).toBeInTheDocument();
  });
});
