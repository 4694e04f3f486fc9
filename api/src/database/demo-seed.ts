import { Role } from '@nappe/shared';
import type { DataSource } from 'typeorm';
import { StudioSettings } from '../studio/entities/studio-settings.entity.js';
import { User } from '../users/entities/user.entity.js';
import { seedDemoCatalogue } from './demo-catalogue-seed.js';
import { seedDemoOrders } from './demo-orders-seed.js';

/** The one password of every demo account; production refuses to seed them. */
export const DEMO_PASSWORD = 'plated-demo-2026';

/** Invented people of an invented studio. */
export const DEMO_ACCOUNTS = [
  { email: 'chef@nappe.test', name: 'Margaux Telford', role: Role.Chef },
  { email: 'staff@nappe.test', name: 'Idris Okafor', role: Role.Staff },
  { email: 'client@nappe.test', name: 'Selma Brandt', role: Role.Client },
] as const;

export const DEMO_STUDIO = {
  name: 'Atelier Ondine',
  tagline: 'Plated desserts, finished at your table',
  city: 'Ghent',
  currency: 'EUR',
  timeZone: 'Europe/Brussels',
} as const;

export interface SeedResult {
  seeded: boolean;
  reason?: string;
  accounts: string[];
}

export class SeedRefusedError extends Error {}

/**
 * Fills an empty database with the demo studio and its three accounts. Does nothing when any
 * user exists (it never overwrites real data), and refuses outright in production.
 */
export async function seedDemo(
  dataSource: DataSource,
  hashPassword: (password: string) => Promise<string>,
  nodeEnv = process.env.NODE_ENV,
): Promise<SeedResult> {
  if (nodeEnv === 'production') {
    throw new SeedRefusedError(
      'Refusing to create demo accounts with a published password when NODE_ENV=production.',
    );
  }
  const accounts = DEMO_ACCOUNTS.map((a) => a.email);
  if ((await dataSource.getRepository(User).count()) > 0) {
    return { seeded: false, reason: 'the database already has accounts', accounts };
  }
  const passwordHash = await hashPassword(DEMO_PASSWORD); // outside the transaction: slow work
  await dataSource.transaction(async (manager) => {
    await manager.update(StudioSettings, { id: 1 }, { ...DEMO_STUDIO });
    for (const account of DEMO_ACCOUNTS) {
      await manager.save(manager.create(User, { ...account, passwordHash }));
    }
  });
  await seedDemoCatalogue(dataSource); // renders its illustrations outside any transaction
  const client = DEMO_ACCOUNTS.find((a) => a.role === Role.Client)!;
  await seedDemoOrders(dataSource, client.email); // ledger rows marked seeded: no payment service
  return { seeded: true, accounts };
}
