import { Role } from '@nappe/shared';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, makeSignedInUser, makeUser, type TestApp } from './factories/test-app.js';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => t.close());

describe('GET /api/users (chef only)', () => {
  it('is 401 without a token and 403 for a client or staff member', async () => {
    await t.http.get('/api/users').expect(401);
    const client = await makeSignedInUser(t, Role.Client);
    await t.http.get('/api/users').set('Authorization', `Bearer ${client.token}`).expect(403);
    const staff = await makeSignedInUser(t, Role.Staff);
    await t.http.get('/api/users').set('Authorization', `Bearer ${staff.token}`).expect(403);
  });

  it('lists accounts page by page for the chef, without password hashes', async () => {
    const chef = await makeSignedInUser(t, Role.Chef);
    for (let i = 0; i < 4; i += 1) await makeUser(t, { name: `Guest ${i}` });
    const first = await t.http
      .get('/api/users?page=1&pageSize=2')
      .set('Authorization', `Bearer ${chef.token}`)
      .expect(200);
    expect(first.body.items).toHaveLength(2);
    expect(first.body.total).toBeGreaterThanOrEqual(5);
    expect(first.body).toMatchObject({ page: 1, pageSize: 2 });
    expect(Object.keys(first.body.items[0]).sort()).toEqual([
      'createdAt',
      'email',
      'id',
      'name',
      'role',
    ]);
    const second = await t.http
      .get('/api/users?page=2&pageSize=2')
      .set('Authorization', `Bearer ${chef.token}`)
      .expect(200);
    expect(second.body.items[0].id).not.toBe(first.body.items[0].id);
  });

  it('caps the page size and refuses repeated or malformed parameters (400)', async () => {
    const chef = await makeSignedInUser(t, Role.Chef);
    const auth = { Authorization: `Bearer ${chef.token}` };
    await t.http.get('/api/users?pageSize=101').set(auth).expect(400);
    await t.http.get('/api/users?page=0').set(auth).expect(400);
    await t.http.get('/api/users?page=1&page=2').set(auth).expect(400);
    await t.http.get('/api/users?page=abc').set(auth).expect(400);
    await t.http.get('/api/users?sort=password_hash').set(auth).expect(400);
  });
});
