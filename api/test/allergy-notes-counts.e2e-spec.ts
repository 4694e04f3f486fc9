import { Role } from '@nappe/shared';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { GuestDataAccessEntity } from '../src/allergy-notes/entities/guest-data-access.entity.js';
import { bearer } from './factories/booking.js';
import { createDemoStudio, demoId, type DemoStudio } from './factories/demo-studio.js';
import { makeSignedInUser } from './factories/test-app.js';

/**
 * The counts behind the Allergy notes list, over the seeded demo studio. The expected numbers
 * are counted by hand from the seed (api/src/database/demo-orders-seed.ts) with what conflicts
 * per Regulation (EU) No 1169/2011, Annex II: item 8 "Nuts, namely: almonds …, hazelnuts …,
 * pistachio nuts"; gelatin is of animal origin, so not vegetarian, and aged rum is alcohol
 * (common practice, no source).
 */

let d: DemoStudio;
beforeAll(async () => {
  d = await createDemoStudio();
});
afterAll(async () => d.t.close());

const wedding = () => demoId('order-plan-wedding');
const gardenParty = () => demoId('order-plan-garden-party');
const engagement = () => demoId('order-plan-engagement');
const pistachioFrost = () => demoId('des-pistachio-frost');

interface Counts {
  orderId: string;
  guestsWithRequirements: number;
  unresolvedPlates: number;
  unresolvedGuests: number;
  substitutions: number;
  advisoryCount: number;
  problem: string | null;
}

async function counts(ids: string[], token: string): Promise<Counts[]> {
  const res = await d.t.http
    .get('/api/allergy-notes/counts')
    .query({ orderIds: ids.join(',') })
    .set(bearer(token))
    .expect(200);
  return res.body as Counts[];
}

describe('GET /api/allergy-notes/counts', () => {
  it('counts guests with requirements and the plates still conflicting, in the order asked', async () => {
    const body = await counts([gardenParty(), wedding(), engagement()], d.chef);
    expect(body.map((c) => c.orderId)).toEqual([gardenParty(), wedding(), engagement()]);
    const [garden, wed, engaged] = body;
    // Garden party: Yusuf (vegetarian) has the gelatin parfait left out, so he is resolved;
    // Elise (tree nuts) still meets almonds in the crumble and pistachio in the parfait.
    expect(garden).toMatchObject({
      guestsWithRequirements: 2,
      unresolvedPlates: 1,
      unresolvedGuests: 1,
      substitutions: 1,
      problem: null,
    });
    // Wedding: the nut-allergic guest's crumble bowl is changed, but the hazelnut sponge and
    // the pistachio parfait still conflict (2); no alcohol against the rum syrup (1); the
    // vegetarian against the gelatin parfait (1).
    expect(wed).toMatchObject({
      guestsWithRequirements: 3,
      unresolvedPlates: 4,
      unresolvedGuests: 3,
      substitutions: 1,
      problem: null,
    });
    // Engagement: Amira's plate is changed (no parfait, rye crumble); Bastien (vegetarian) is not.
    expect(engaged).toMatchObject({
      guestsWithRequirements: 2,
      unresolvedPlates: 1,
      unresolvedGuests: 1,
      substitutions: 1,
    });
    expect(garden!.advisoryCount).toBeGreaterThanOrEqual(1); // hazelnut traces, "may contain"
  });

  it('follows a substitution: the count drops when the plate clears, and comes back when removed', async () => {
    const path = `/api/orders/${gardenParty()}/guests/1/substitutions/${pistachioFrost()}`;
    await d.t.http
      .put(path)
      .set(bearer(d.chef))
      .send({
        leaveOut: [demoId('rec-pistachio-parfait')],
        replace: [
          {
            componentRecipeId: demoId('rec-almond-crumble'),
            replacementRecipeId: demoId('rec-rye-crumble'),
          },
        ],
      })
      .expect(200);
    const [after] = await counts([gardenParty()], d.staff);
    expect(after).toMatchObject({ unresolvedPlates: 0, unresolvedGuests: 0, substitutions: 2 });
    await d.t.http.delete(path).set(bearer(d.chef)).expect(200);
    const [again] = await counts([gardenParty()], d.staff);
    expect(again).toMatchObject({ unresolvedPlates: 1, unresolvedGuests: 1, substitutions: 1 });
  });

  it('leaves out ids it does not know and repeats none', async () => {
    const body = await counts(
      [wedding(), '00000000-0000-4000-8000-000000000000', wedding()],
      d.chef,
    );
    expect(body.map((c) => c.orderId)).toEqual([wedding()]);
  });

  it('is numbers only, so reading it is not logged as an opening of guest data', async () => {
    const repo = d.t.dataSource.getRepository(GuestDataAccessEntity);
    const before = await repo.count();
    const res = await d.t.http
      .get('/api/allergy-notes/counts')
      .query({ orderIds: wedding() })
      .set(bearer(d.staff))
      .expect(200);
    expect(await repo.count()).toBe(before);
    const text = JSON.stringify(res.body);
    expect(text).not.toContain('Table 3, seat 4');
    expect(text).not.toContain('nuts');
  });

  it('guards and validates: 401, 403 for clients, 400 with words for bad input', async () => {
    await d.t.http.get('/api/allergy-notes/counts').query({ orderIds: wedding() }).expect(401);
    await d.t.http
      .get('/api/allergy-notes/counts')
      .query({ orderIds: wedding() })
      .set(bearer(d.client))
      .expect(403);
    const other = await makeSignedInUser(d.t, Role.Client);
    await d.t.http
      .get('/api/allergy-notes/counts')
      .query({ orderIds: wedding() })
      .set(bearer(other.token))
      .expect(403);
    const missing = await d.t.http.get('/api/allergy-notes/counts').set(bearer(d.chef)).expect(400);
    expect(missing.body.message.join(' ')).toMatch(/orderIds=/);
    const empty = await d.t.http
      .get('/api/allergy-notes/counts')
      .query({ orderIds: ' , ' })
      .set(bearer(d.chef))
      .expect(400);
    expect(empty.body.message.join(' ')).toMatch(/at least one order/);
    const many = Array.from({ length: 101 }, (_, i) => `id-${i}`).join(',');
    const tooMany = await d.t.http
      .get('/api/allergy-notes/counts')
      .query({ orderIds: many })
      .set(bearer(d.chef))
      .expect(400);
    expect(tooMany.body.message.join(' ')).toMatch(/at most 100/);
  });
});
