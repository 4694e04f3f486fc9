import { expect, type Locator } from '@playwright/test';

/**
 * Ticks one of our Chakra checkboxes as a person does: a click on its visible label (Chakra's
 * `Checkbox.Root` is the `<label>`; the real input inside is visually hidden). Unlike
 * `check({ force: true })`, which clicks wherever the input was when the action began, this click
 * waits until the label is visible, stable and the one receiving the pointer, so content loading
 * above it (the booking terms replacing their placeholder) cannot move it from under the click.
 */
export async function tick(checkbox: Locator): Promise<void> {
  await checkbox.locator('xpath=ancestor::label[1]').click();
  await expect(checkbox).toBeChecked();
}
