import { configure, screen, waitFor, within } from '@testing-library/react';
import { beforeAll, describe, expect, it } from 'vitest';
import { chefUser, staffUser } from '../../testing/fixtures';
import { renderStudio } from '../../testing/studio-render';

// The team rules mirrored here are the API's (api/src/studio/team.service.ts, checked in
// api/test/team.e2e-spec.ts): invitations by e-mail that work once for 7 days, role changes
// on the member's next request, at least one chef, and no chef removing their own account.

function region(name: string) {
  return within(screen.getByRole('region', { name }));
}

describe('Studio → Team: invitations and members', () => {
  beforeAll(async () => {
    configure({ asyncUtilTimeout: 15_000 });
    await import('./team');
  }, 30_000);

  it('lists pending invitations with their expiry, and invites a new member', async () => {
    const { user, api } = renderStudio('/studio/team');

    const pending = await screen.findByRole('list', { name: 'Pending invitations' });
    expect(within(pending).getByText('Léa Marchand')).toBeInTheDocument();
    expect(within(pending).getByText('lea.marchand@example.test')).toBeInTheDocument();
    // Sent 36 hours ago, the 7-day link has 132 hours left: 5 whole days.
    expect(await within(pending).findByText(/the link expires in 5 days \(/)).toBeInTheDocument();

    const invite = region('Invite a team member');
    await user.type(invite.getByLabelText('Name'), 'Sami Okafor');
    await user.type(invite.getByLabelText('E-mail'), 'Sami.Okafor@example.test');
    await user.click(invite.getByRole('button', { name: 'Send invitation' }));

    expect(
      await screen.findByText(
        'Invitation sent to sami.okafor@example.test. The link in the e-mail works once, for 7 days.',
      ),
    ).toBeInTheDocument();
    expect(api.state.requests.find((r) => r.method === 'POST')?.body).toEqual({
      name: 'Sami Okafor',
      email: 'Sami.Okafor@example.test',
      role: 'staff',
    });
    // The list is fetched again and shows the new invitation; the form is empty for the next.
    expect(
      await within(screen.getByRole('list', { name: 'Pending invitations' })).findByText(
        'Sami Okafor',
      ),
    ).toBeInTheDocument();
    expect(invite.getByLabelText('Name')).toHaveValue('');
  }, 60_000);

  it('checks the e-mail before sending, and shows the server’s refusal (409)', async () => {
    const { user, api } = renderStudio('/studio/team');
    await screen.findByRole('list', { name: 'Pending invitations' });
    const invite = region('Invite a team member');
    await user.type(invite.getByLabelText('Name'), 'Tomás');
    await user.type(invite.getByLabelText('E-mail'), 'not-an-address');
    await user.click(invite.getByRole('button', { name: 'Send invitation' }));
    expect(
      await invite.findByText('Enter an e-mail address like name@example.com.'),
    ).toBeInTheDocument();
    expect(api.state.requests).toEqual([]);

    await user.clear(invite.getByLabelText('E-mail'));
    await user.type(invite.getByLabelText('E-mail'), staffUser.email);
    await user.click(invite.getByRole('button', { name: 'Send invitation' }));
    const refusal = await invite.findByRole('alert');
    expect(within(refusal).getByText('No invitation sent')).toBeInTheDocument();
    expect(within(refusal).getByText('This person is already on the team.')).toBeInTheDocument();
  }, 60_000);

  it('withdraws an invitation only after confirming', async () => {
    const { user, api } = renderStudio('/studio/team');
    const pending = await screen.findByRole('list', { name: 'Pending invitations' });
    await user.click(
      within(pending).getByRole('button', {
        name: 'Withdraw the invitation to lea.marchand@example.test',
      }),
    );
    const dialog = await screen.findByRole('alertdialog', {
      name: 'Withdraw the invitation to Léa Marchand?',
    });
    expect(within(dialog).getByText(/stops working at once/)).toBeInTheDocument();
    // Cancelling changes nothing.
    await user.click(within(dialog).getByRole('button', { name: 'Cancel' }));
    expect(api.state.requests).toEqual([]);

    await user.click(
      within(pending).getByRole('button', {
        name: 'Withdraw the invitation to lea.marchand@example.test',
      }),
    );
    await user.click(
      within(await screen.findByRole('alertdialog')).getByRole('button', {
        name: 'Withdraw invitation',
      }),
    );
    expect(
      await screen.findByText('The invitation to lea.marchand@example.test was withdrawn.'),
    ).toBeInTheDocument();
    expect(api.state.requests).toEqual([
      { method: 'DELETE', path: '/api/studio/invitations/6f1b7c7e-3f0a-4a44-9c61-2f0f6b1e0a11' },
    ]);
    expect(
      await screen.findByText('No invitations are waiting to be accepted.'),
    ).toBeInTheDocument();
  }, 60_000);

  it('changes a member’s role after a dialog saying it applies on their next request', async () => {
    const { user, api } = renderStudio('/studio/team');
    const table = await screen.findByRole('table', { name: 'Accounts at the studio' });
    await user.click(within(table).getByRole('button', { name: `Make chef: ${staffUser.name}` }));

    const dialog = await screen.findByRole('alertdialog', {
      name: `Make ${staffUser.name} a chef?`,
    });
    expect(
      within(dialog).getByText('This applies on their next request: they need not sign out.'),
    ).toBeInTheDocument();
    await user.click(within(dialog).getByRole('button', { name: 'Make chef' }));

    expect(await screen.findByText(`${staffUser.name} is now a chef.`)).toBeInTheDocument();
    expect(api.state.requests).toEqual([
      { method: 'PATCH', path: `/api/users/${staffUser.id}/role`, body: { role: 'chef' } },
    ]);
    // The list is read again: the member now has the chef's badge and the opposite action.
    const row = (
      await within(table).findByRole('button', { name: `Make staff: ${staffUser.name}` })
    ).closest('tr')!;
    expect(within(row).getByText('Chef')).toBeInTheDocument();
  }, 60_000);

  it('removes a member after confirming; the chef has no action on their own account', async () => {
    const { user, api } = renderStudio('/studio/team');
    const table = await screen.findByRole('table', { name: 'Accounts at the studio' });

    const self = within(table).getByText(chefUser.email, { selector: 'span' }).closest('tr')!;
    expect(self).toHaveTextContent('You: another chef can change or remove your account');
    expect(within(self).queryByRole('button')).not.toBeInTheDocument();
    const client = within(table).getByText('Margaux Feld').closest('tr')!;
    expect(client).toHaveTextContent('No team actions: a client account');
    expect(within(client).queryByRole('button')).not.toBeInTheDocument();

    await user.click(within(table).getByRole('button', { name: `Remove ${staffUser.name}` }));
    const dialog = await screen.findByRole('alertdialog', {
      name: `Remove ${staffUser.name} from the team?`,
    });
    expect(
      within(dialog).getByText(/their open sessions end on their next request/),
    ).toBeInTheDocument();
    await user.click(within(dialog).getByRole('button', { name: 'Remove from the team' }));

    expect(
      await screen.findByText(`${staffUser.name} was removed from the team.`),
    ).toBeInTheDocument();
    expect(api.state.requests).toEqual([{ method: 'DELETE', path: `/api/users/${staffUser.id}` }]);
    await waitFor(() => expect(within(table).queryByText(staffUser.name)).not.toBeInTheDocument());
  }, 60_000);

  it('keeps the server’s refusal in the dialog (the last chef cannot become staff)', async () => {
    const otherChef = { ...staffUser, id: 'u-chef-2', name: 'Odile Brun', role: chefUser.role };
    // Seen by a second chef account that is not in the list, so the API's own count applies.
    const { user } = renderStudio(
      '/studio/team',
      { ...chefUser, id: 'u-chef-elsewhere' },
      {
        accounts: [{ ...otherChef, createdAt: '2025-01-01T09:00:00.000Z' }],
      },
    );
    const table = await screen.findByRole('table', { name: 'Accounts at the studio' });
    await user.click(within(table).getByRole('button', { name: 'Make staff: Odile Brun' }));
    const dialog = await screen.findByRole('alertdialog', { name: 'Make Odile Brun staff?' });
    await user.click(within(dialog).getByRole('button', { name: 'Make staff' }));
    expect(
      await within(dialog).findByText(
        'You cannot change this chef’s role: the studio needs at least one chef. Invite or promote another chef first.',
      ),
    ).toBeInTheDocument();
    expect(within(dialog).getByText('Not done')).toBeInTheDocument();
  }, 60_000);
});
