import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { renderWithClient } from '../testing/render.js';
import { FormErrorAlert } from './form-error-alert.js';

// role="alert" is announced by screen readers as it appears (WAI-ARIA 1.2, alert role).
describe('FormErrorAlert', () => {
  it('one message: a title and a sentence', () => {
    renderWithClient(
      <FormErrorAlert title="No connection" messages={['Check your connection.']} />,
    );
    const alert = screen.getByRole('alert');
    expect(alert).toHaveTextContent('No connection');
    expect(alert).toHaveTextContent('Check your connection.');
    expect(within(alert).queryByRole('list')).not.toBeInTheDocument();
  });

  it('several messages: a list, one item each', () => {
    const messages = ['Tell us your name.', 'The name must fit on one line.'];
    renderWithClient(<FormErrorAlert title="Please check the form" messages={messages} />);
    const items = within(screen.getByRole('alert')).getAllByRole('listitem');
    expect(items.map((item) => item.textContent)).toEqual(messages);
  });

  it('no message: the title alone', () => {
    renderWithClient(<FormErrorAlert title="Something went wrong" messages={[]} />);
    expect(screen.getByRole('alert')).toHaveTextContent(/^Something went wrong$/);
  });
});
