import * as argon2 from 'argon2';
import { Role } from '@nappe/shared';
import { demoUuid } from '../../src/database/demo-catalogue-seed.js';
import { DEMO_ACCOUNTS, DEMO_PASSWORD, seedDemo } from '../../src/database/demo-seed.js';
import { createBookingApp, type BookingApp } from './booking.js';
import { signIn } from './test-app.js';

export interface DemoStudio extends BookingApp {
  chef: string;
  staff: string;
  client: string;
}

/**
 * The seeded demo studio (catalogue, accounts, bookings counted from the real today) on a
 * controlled clock started at the real now, with the three demo accounts signed in.
 */
export async function createDemoStudio(): Promise<DemoStudio> {
  const app = await createBookingApp({ THROTTLE_LIMIT: '10000' }, new Date().toISOString());
  const hash = (p: string) =>
    argon2.hash(p, { type: argon2.argon2id, memoryCost: 19456, timeCost: 2, parallelism: 1 });
  await seedDemo(app.t.dataSource, hash, 'test');
  const token = async (role: Role) =>
    (await signIn(app.t, DEMO_ACCOUNTS.find((a) => a.role === role)!.email, DEMO_PASSWORD)).token;
  return {
    ...app,
    chef: await token(Role.Chef),
    staff: await token(Role.Staff),
    client: await token(Role.Client),
  };
}

/** The database id of a demo record (orders, recipes, desserts, menus). */
export const demoId = demoUuid;
