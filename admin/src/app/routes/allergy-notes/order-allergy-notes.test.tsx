import { configure, screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { harvestDinner } from '../../../testing/allergy-notes-fixtures';
import { renderAllergyNotes } from '../../../testing/allergy-notes-render';
import { chefUser, staffUser } from '../../../testing/fixtures';

// Whole routes, lazy chunks and all, on a busy 2-core machine: give first renders time.
configure({ asyncUtilTimeout: 15_000 });

/**
 * What is flagged follows Regulation (EU) No 1169/2011, Annex II: item 8 "Nuts, namely:
 * almonds …, pistachio nuts" (a tree-nut allergy); gelatin is of animal origin, so not
 * vegetarian (common practice, no source). The fixture catalogue is in
 * src/testing/allergy-notes-fixtures.ts.
 */

const URL = '/allergy-notes/o-harvest';

/** The card of one guest (an article named by the guest's heading). */
async function guestCard(label: string) {
  return within(await screen.findByRole('article', { name: label }));
}

/** One dessert's section inside a guest's card. */
function plate(card: ReturnType<typeof within>, dessert: string) {
  return within(card.getByRole('region', { name: dessert }));
}

describe('Event allergy notes', () => {
  it('names the allergen and the component that carries it, with the ingredient, and keeps "may contain" apart', async () => {
    renderAllergyNotes(URL, chefUser, { orders: [harvestDinner()] });
    const guest = await guestCard('Table 2, seat 1');
    expect(guest.getByText('Table 2')).toBeVisible();
    expect(guest.getByText('Allergy: Tree nuts')).toBeVisible();
    const pear = plate(guest, 'Pear, Almond and Pistachio');
    expect(pear.getByText('Conflicts — to resolve')).toBeVisible();
    const rows = pear.getByRole('list', {
      name: 'Conflicts of Pear, Almond and Pistachio for Table 2, seat 1',
    });
    const items = within(rows)
      .getAllByRole('listitem')
      .map((li) => li.textContent);
    expect(items).toEqual([
      'Toasted almond crumble — contains tree nuts (almonds)From Ground almonds',
      'Pistachio tuile — contains tree nuts (pistachios)From Pistachios, shelled',
    ]);
    // The supplier's "may contain hazelnuts" on the almonds is an advisory, not a conflict.
    const advisories = pear.getByRole('list', { name: 'Advisories' });
    expect(
      within(advisories).getByText('Tree nuts: may contain hazelnuts (cross-contact)'),
    ).toBeVisible();
    expect(
      within(advisories).getByText('In Toasted almond crumble (Ground almonds).'),
    ).toBeVisible();
    // The mousse has no nuts: one line, not a section.
    expect(
      guest.getByText('Standard plate, nothing conflicts: Chocolate Mousse Slice.'),
    ).toBeVisible();
    expect(screen.getByText(/cross-contact is the kitchen’s responsibility/)).toBeVisible();
  });

  it('shows a client’s note exactly as entered, as text, never as markup', async () => {
    const { container } = renderAllergyNotes(URL, chefUser, { orders: [harvestDinner()] });
    const guest = await guestCard('Table 2, seat 1');
    expect(
      guest.getByText('<b>Carries an auto-injector</b> — please tell the server'),
    ).toBeVisible();
    expect(guest.getByText('The client’s note, as entered (not medical advice)')).toBeVisible();
    expect(container.querySelector('article b')).toBeNull();
  });

  it('a note alone does not change the plate: the diet conflict stands, with the component named', async () => {
    renderAllergyNotes(URL, chefUser, { orders: [harvestDinner()] });
    const jonas = await guestCard('Jonas');
    const mousse = plate(jonas, 'Chocolate Mousse Slice');
    expect(mousse.getByText('Changed — still conflicts')).toBeVisible();
    expect(mousse.getByText('Set chocolate mousse')).toBeVisible();
    expect(mousse.getAllByText('— not vegetarian')[0]).toBeVisible();
    expect(mousse.getAllByText('From Gelatin powder (pork)')[0]).toBeVisible();
    expect(mousse.getByText('Ask about a sorbet instead')).toBeVisible();
    expect(
      mousse.getByText('A note alone does not change the plate: the conflicts above still stand.'),
    ).toBeVisible();
    // Mireille (sesame) meets nothing on this menu.
    const mireille = await guestCard('Mireille');
    expect(mireille.getByText('Every plate fits')).toBeVisible();
  });

  it('the chef records a substitution; the plate is checked again and the result is shown', async () => {
    const { user, api } = renderAllergyNotes(URL, chefUser, { orders: [harvestDinner()] });
    const guest = await guestCard('Table 2, seat 1');
    const glance = within(screen.getByRole('list', { name: 'This event at a glance' }));
    expect(glance.getByText('2 plates to resolve')).toBeVisible();

    // Replace the almond crumble with the oat crumble: the tuile still carries pistachios.
    await user.click(
      guest.getByRole('button', {
        name: 'Record a change: Table 2, seat 1, Pear, Almond and Pistachio',
      }),
    );
    const form = within(
      await screen.findByRole('form', {
        name: 'Change Table 2, seat 1’s Pear, Almond and Pistachio',
      }),
    );
    await user.selectOptions(
      form.getByRole('combobox', { name: 'What happens to Toasted almond crumble' }),
      'replace',
    );
    await user.selectOptions(
      form.getByRole('combobox', { name: 'Replace Toasted almond crumble with' }),
      'Oat crumble',
    );
    await user.click(form.getByRole('button', { name: 'Save and check again' }));

    const pear = plate(guest, 'Pear, Almond and Pistachio');
    expect(
      await pear.findByText(
        'Checked again: Table 2, seat 1’s Pear, Almond and Pistachio still conflicts (Pistachio tuile).',
      ),
    ).toBeVisible();
    expect(pear.getByText('Changed — still conflicts')).toBeVisible();
    // The form is gone: the focus is on what the re-check found.
    await waitFor(() => expect(pear.getByRole('status')).toHaveFocus());
    expect(pear.getByText('Replace Toasted almond crumble with Oat crumble')).toBeVisible();
    const still = pear.getByRole('list', {
      name: 'Still conflicting on Table 2, seat 1’s changed Pear, Almond and Pistachio',
    });
    expect(within(still).getByText('Pistachio tuile')).toBeVisible();
    expect(within(still).getByText('— contains tree nuts (pistachios)')).toBeVisible();
    expect(api.state.requests.at(-1)).toEqual({
      method: 'PUT',
      path: '/api/orders/o-harvest/guests/0/substitutions/d-pear',
      body: {
        leaveOut: [],
        replace: [{ componentRecipeId: 'r-almond-crumble', replacementRecipeId: 'r-oat-crumble' }],
      },
    });

    // Also leave out the tuile: now nothing conflicts, and the count follows.
    await user.click(
      guest.getByRole('button', {
        name: 'Edit the change: Table 2, seat 1, Pear, Almond and Pistachio',
      }),
    );
    const edit = within(await screen.findByRole('form', { name: /Change Table 2, seat 1/ }));
    expect(edit.getByRole('combobox', { name: 'Replace Toasted almond crumble with' })).toHaveValue(
      'r-oat-crumble',
    );
    await user.selectOptions(
      edit.getByRole('combobox', { name: 'What happens to Pistachio tuile' }),
      'leave_out',
    );
    await user.type(edit.getByLabelText(/Note for the kitchen/), 'Extra pear slices');
    await user.click(edit.getByRole('button', { name: 'Save and check again' }));
    expect(
      await pear.findByText(
        'Checked again: nothing on Table 2, seat 1’s changed Pear, Almond and Pistachio conflicts now.',
      ),
    ).toBeVisible();
    expect(pear.getByText('Changed — cleared')).toBeVisible();
    expect(pear.getByText('Checked again: nothing on the changed plate conflicts.')).toBeVisible();
    expect(pear.getByText('Extra pear slices')).toBeVisible();
    expect(glance.getByText('1 plate to resolve')).toBeVisible();
    expect(guest.getByText('Every plate fits')).toBeVisible();
  });

  it('checks the form before sending and keeps what was chosen when the server refuses', async () => {
    const { user, api } = renderAllergyNotes(URL, chefUser, {
      orders: [harvestDinner()],
      fail: {
        put: { status: 409, message: 'This booking is closed; its plates can no longer change.' },
      },
    });
    const guest = await guestCard('Table 2, seat 1');
    await user.click(
      guest.getByRole('button', {
        name: 'Record a change: Table 2, seat 1, Pear, Almond and Pistachio',
      }),
    );
    const form = within(await screen.findByRole('form', { name: /Change Table 2, seat 1/ }));
    await user.click(form.getByRole('button', { name: 'Save and check again' }));
    expect(
      await form.findByText(
        'Say what changes: a component to leave out, one to replace, or a note.',
      ),
    ).toBeVisible();
    await user.selectOptions(
      form.getByRole('combobox', { name: 'What happens to Toasted almond crumble' }),
      'replace',
    );
    await user.click(form.getByRole('button', { name: 'Save and check again' }));
    expect(
      await form.findByText('Choose the recipe that takes the place of Toasted almond crumble.'),
    ).toBeVisible();
    expect(api.state.requests.filter((r) => r.method === 'PUT')).toEqual([]);

    await user.selectOptions(
      form.getByRole('combobox', { name: 'What happens to Toasted almond crumble' }),
      'leave_out',
    );
    await user.click(form.getByRole('button', { name: 'Save and check again' }));
    const alert = within(await form.findByRole('alert'));
    expect(alert.getByText('Not saved')).toBeVisible();
    expect(
      alert.getByText('This booking is closed; its plates can no longer change.'),
    ).toBeVisible();
    expect(
      form.getByRole('combobox', { name: 'What happens to Toasted almond crumble' }),
    ).toHaveValue('leave_out');
  });

  it('asks before removing a substitution, then shows the plate conflicting again', async () => {
    const { user, api } = renderAllergyNotes(URL, chefUser, { orders: [harvestDinner()] });
    const jonas = await guestCard('Jonas');
    const mousse = plate(jonas, 'Chocolate Mousse Slice');
    await user.click(mousse.getByRole('button', { name: 'Remove the change' }));
    let dialog = within(await screen.findByRole('alertdialog'));
    expect(dialog.getByText('Remove the change to Jonas’s Chocolate Mousse Slice?')).toBeVisible();
    await user.click(dialog.getByRole('button', { name: 'Keep the change' }));
    await waitFor(() => expect(screen.queryByRole('alertdialog')).toBeNull());
    expect(api.state.requests.filter((r) => r.method === 'DELETE')).toEqual([]);

    await user.click(mousse.getByRole('button', { name: 'Remove the change' }));
    dialog = within(await screen.findByRole('alertdialog'));
    await user.click(dialog.getByRole('button', { name: 'Remove the change' }));
    expect(
      await mousse.findByText('Change removed: Jonas’s Chocolate Mousse Slice conflicts again.'),
    ).toBeVisible();
    expect(mousse.getByText('Conflicts — to resolve')).toBeVisible();
    expect(mousse.queryByText('Ask about a sorbet instead')).toBeNull();
    expect(api.state.requests.filter((r) => r.method === 'DELETE')).toEqual([
      { method: 'DELETE', path: '/api/orders/o-harvest/guests/1/substitutions/d-mousse' },
    ]);
  });

  it('shows the chef who opened the guests’ data, one opening per visit', async () => {
    const { api } = renderAllergyNotes(URL, chefUser, { orders: [harvestDinner()] });
    const heading = await screen.findByRole('heading', { name: 'Who opened the guests’ data' });
    const log = within(heading.closest('section')!);
    expect(await log.findByText('Opened the allergy notes')).toBeVisible();
    expect(log.getByText('Inès Carreau')).toBeVisible();
    // The loader's read is not repeated on mount: the API logs each read as an opening.
    expect(api.state.accessLog).toHaveLength(1);
  });

  it('gives staff everything read-only: no control to change a plate, no access log', async () => {
    const { api } = renderAllergyNotes(URL, staffUser, { orders: [harvestDinner()] });
    const guest = await guestCard('Table 2, seat 1');
    expect(guest.getByText('Toasted almond crumble')).toBeVisible();
    expect(
      screen.getByText('Read-only: the chef records the changes to a guest’s plate.'),
    ).toBeVisible();
    expect(
      screen.queryByRole('button', { name: /Record a change|Edit the change|Remove the change/ }),
    ).toBeNull();
    expect(screen.queryByRole('form')).toBeNull();
    expect(screen.queryByRole('combobox')).toBeNull();
    expect(screen.queryByRole('heading', { name: 'Who opened the guests’ data' })).toBeNull();
    // Only reads went out: staff never reach the write routes (the API answers them 403).
    expect(api.state.requests.filter((r) => r.method !== 'GET')).toEqual([]);
    // The staff view still names the change the chef made, and its reason.
    expect(screen.getByText('Ask about a sorbet instead')).toBeVisible();
  });

  it('says in the server’s words when the guest details were removed after the retention date', async () => {
    renderAllergyNotes(URL, staffUser, {
      orders: [harvestDinner()],
      fail: {
        notes: {
          status: 410,
          message:
            'Guest details removed after 30 days: the event is past the studio’s retention date.',
        },
      },
    });
    const alert = within(await screen.findByRole('alert'));
    expect(
      alert.getByText(
        'Guest details removed after 30 days: the event is past the studio’s retention date.',
      ),
    ).toBeVisible();
  });

  it('explains in words when the notes cannot be opened', async () => {
    renderAllergyNotes('/allergy-notes/o-missing', chefUser, { orders: [harvestDinner()] });
    const alert = within(await screen.findByRole('alert'));
    expect(alert.getByText('These allergy notes could not be loaded')).toBeVisible();
    expect(
      alert.getByText('This booking could not be found. It may have been removed.'),
    ).toBeVisible();
  });
});
