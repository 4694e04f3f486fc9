import { screen, waitFor, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { studioToday } from '../../../features/prep/lib/dates';
import { staffUser } from '../../../testing/fixtures';
import { TIME_ZONE } from '../../../testing/prep-api';
import { ENGAGEMENT } from '../../../testing/prep-fixtures';
import { renderPrep } from '../../../testing/prep-render';
import { server } from '../../../testing/server';

const events = [ENGAGEMENT];
const FIRST = { timeout: 15_000 };

afterEach(() => vi.restoreAllMocks());

describe('Prep → Labels', () => {
  it('previews each component made on the day as the PDF prints it, allergens in bold', async () => {
    const { api } = renderPrep('/prep/labels?date=2026-03-24', { events, user: staffUser });
    const parfait = await screen.findByRole(
      'article',
      { name: 'Label: Frozen pistachio parfait' },
      FIRST,
    );
    // The components made that day are those of the plan over the next 21 days (as the PDF).
    expect(
      api.state.requests
        .filter((r) => r.url.pathname === '/api/prep/plan')
        .map((r) => r.url.search),
    ).toContain('?from=2026-03-24&to=2026-04-14');
    expect(parfait).toHaveTextContent(/Made on 2026-03-24 \d\d:\d\d/);
    expect(parfait).toHaveTextContent(/Use by 2026-03-\d\d \d\d:\d\d/);
    // Frozen storage at −18 °C or below (USDA FSIS, "Freezing and Food Safety").
    expect(parfait).toHaveTextContent(
      'Storage: frozen — Keep frozen at −18 °C or below (USDA FSIS).',
    );
    // Regulation (EU) 1169/2011 Art. 21: allergens emphasised in the ingredient list.
    await waitFor(() => expect(parfait).toHaveTextContent(/Ingredients: cream \(milk\)/));
    const bold = [...parfait.querySelectorAll('strong')].map((b) => b.textContent);
    expect(bold).toEqual(expect.arrayContaining(['milk', 'egg', 'pistachio']));
    expect(bold).not.toContain('sugar');

    const crumble = screen.getByRole('article', { name: 'Label: Brown-butter almond crumble' });
    expect(crumble).toHaveTextContent('Storage: dry');
    await waitFor(() =>
      expect([...crumble.querySelectorAll('strong')].map((b) => b.textContent)).toEqual(
        expect.arrayContaining(['wheat', 'almonds']),
      ),
    );
    expect(screen.getByText(/labels to print/)).toBeVisible();
  });

  it('downloads the Component labels PDF of that day with the signed-in token', async () => {
    const clicks: string[] = [];
    vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (
      this: HTMLAnchorElement,
    ) {
      clicks.push(this.download);
    });
    const { api, user } = renderPrep('/prep/labels?date=2026-03-24', { events, user: staffUser });
    await user.click(await screen.findByRole('button', { name: 'Component labels (PDF)' }, FIRST));
    await waitFor(() => expect(clicks).toEqual(['component-labels-2026-03-24.pdf']));
    const pdf = api.state.requests.find((r) => r.url.pathname === '/api/prep/labels.pdf')!;
    expect(pdf.url.search).toBe('?date=2026-03-24');
    expect(pdf.auth).toBe('Bearer token-for-u-staff-1');
  });

  it('says why a download failed and keeps the page', async () => {
    const { user } = renderPrep('/prep/labels?date=2026-03-24', { events });
    server.use(
      http.get('/api/prep/labels.pdf', () =>
        HttpResponse.json(
          { statusCode: 400, message: 'Write the date as a real date, like 2026-06-21.' },
          { status: 400 },
        ),
      ),
    );
    await user.click(await screen.findByRole('button', { name: 'Component labels (PDF)' }, FIRST));
    expect(await screen.findByRole('alert')).toHaveTextContent(
      'The download failed: Write the date as a real date, like 2026-06-21.',
    );
    expect(screen.getByRole('article', { name: 'Label: Frozen pistachio parfait' })).toBeVisible();
  });

  it('opens on today, and says when nothing is made on a day', async () => {
    const { router } = renderPrep('/prep/labels', { events });
    await waitFor(
      () => expect(router.state.location.search).toBe(`?date=${studioToday(TIME_ZONE)}`),
      FIRST,
    );
    await router.navigate('/prep/labels?date=2026-03-30');
    const empty = await screen.findByRole(
      'heading',
      { name: 'Nothing is made on this day' },
      FIRST,
    );
    expect(empty).toBeVisible();
    expect(screen.queryByRole('button', { name: /Component labels/ })).not.toBeInTheDocument();
    expect(within(document.body).queryByRole('article')).not.toBeInTheDocument();
  });
});
