import { expect, test } from '@playwright/test';
import { demo, DEMO_PASSWORD, urls } from '../support/env';

// The running system's API, through the same proxy the apps use.
test('health is 200, /api/users is 401 without a token and 403 for a client, 200 for the chef', async ({
  request,
}) => {
  const api = `${urls.storefront}/api`;
  expect((await request.get(`${api}/health`)).status()).toBe(200);
  expect((await request.get(`${api}/users`)).status()).toBe(401);
  const login = async (email: string) => {
    const res = await request.post(`${api}/auth/login`, {
      data: { email, password: DEMO_PASSWORD },
    });
    expect(res.status()).toBe(200);
    return ((await res.json()) as { accessToken: string }).accessToken;
  };
  const client = await login(demo.client);
  expect(
    (
      await request.get(`${api}/users`, { headers: { Authorization: `Bearer ${client}` } })
    ).status(),
  ).toBe(403);
  const chef = await login(demo.chef);
  const list = await request.get(`${api}/users`, { headers: { Authorization: `Bearer ${chef}` } });
  expect(list.status()).toBe(200);
  expect(((await list.json()) as { total: number }).total).toBeGreaterThanOrEqual(3);
});
