import { Role } from '@nappe/shared';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { GuestDataAccessEntity } from '../src/allergy-notes/entities/guest-data-access.entity.js';
import { OrderEntity } from '../src/orders/entities/order.entity.js';
import { bearer } from './factories/booking.js';
import { createDemoStudio, demoId, type DemoStudio } from './factories/demo-studio.js';
import { pdfText } from './factories/pdf-text.js';
import { makeSignedInUser } from './factories/test-app.js';

/**
 * Allergy notes over the seeded demo studio. Reference for what is flagged: Regulation (EU)
 * No 1169/2011, Annex II — item 8 "Nuts, namely: almonds (Amygdalus communis L.), hazelnuts,
 * … pistachio nuts"; item 1 cereals containing gluten (wheat, rye…). Gelatin is of animal
 * origin and so not vegetarian (common practice, no source).
 */

let d: DemoStudio;
beforeAll(async () => {
  d = await createDemoStudio();
});
afterAll(async () => d.t.close());

const wedding = () => demoId('order-plan-wedding');
const birthday = () => demoId('order-birthday-garden');
const pistachioFrost = () => demoId('des-pistachio-frost');

interface Plate {
  dessertId: string;
  dessertName: string;
  resolved: boolean;
  conflicts: Array<{
    kind: string;
    allergen?: string;
    diet?: string;
    components: Array<{ recipeName: string; lines: Array<{ ingredientName: string }> }>;
  }>;
  substitution: { described: string[] } | null;
  afterSubstitution: { clear: boolean } | null;
}
interface Notes {
  guests: Array<{ guestId: number; label: string; plates: Plate[] }>;
  unresolved: Array<{ guestId: number; dessertName: string; messages: string[] }>;
}

async function notes(id: string, token: string): Promise<Notes> {
  return (await d.t.http.get(`/api/orders/${id}/allergy-notes`).set(bearer(token)).expect(200))
    .body as Notes;
}

describe('allergy notes', () => {
  it('flags a tree-nut allergy against the almond crumble, naming the crumble and the almonds', async () => {
    const body = await notes(wedding(), d.chef);
    const guest = body.guests.find((g) => g.label === 'Table 3, seat 4')!;
    const frost = guest.plates.find((p) => p.dessertId === pistachioFrost())!;
    expect(frost.resolved).toBe(false);
    const nuts = frost.conflicts.find((c) => c.kind === 'allergen' && c.allergen === 'nuts')!;
    const crumble = nuts.components.find((c) => c.recipeName === 'Brown-butter almond crumble');
    expect(crumble?.lines.map((l) => l.ingredientName)).toContain('Almond flour, blanched');
    // Pistachio is Annex II item 8 as well: the parfait is named too.
    expect(nuts.components.map((c) => c.recipeName)).toContain('Frozen pistachio parfait');
    // The seeded substitution on the crumble bowl (rye crumble instead) already resolves that plate.
    const bowl = guest.plates.find((p) => p.dessertName === 'Vanilla Crumble Bowl')!;
    expect(bowl.conflicts.length).toBeGreaterThan(0);
    expect(bowl.substitution?.described).toEqual([
      'Replace Brown-butter almond crumble with Brown-butter rye crumble',
    ]);
    expect(bowl.resolved).toBe(true);
    // A vegetarian against the pork-gelatin parfait.
    const veg = body.guests.find((g) => g.label === 'Table 6, seat 2')!;
    const vegFrost = veg.plates.find((p) => p.dessertId === pistachioFrost())!;
    expect(vegFrost.conflicts).toEqual([
      expect.objectContaining({
        kind: 'diet',
        diet: 'vegetarian',
        components: [expect.objectContaining({ recipeName: 'Frozen pistachio parfait' })],
      }),
    ]);
  });

  it('clears the flag after a substitution, re-checked against that guest, and audits it', async () => {
    const res = await d.t.http
      .put(`/api/orders/${wedding()}/guests/0/substitutions/${pistachioFrost()}`)
      .set(bearer(d.chef))
      .send({
        leaveOut: [demoId('rec-pistachio-parfait')],
        replace: [
          {
            componentRecipeId: demoId('rec-almond-crumble'),
            replacementRecipeId: demoId('rec-rye-crumble'),
          },
        ],
        note: 'A second quenelle of ice cream instead of the parfait',
      })
      .expect(200);
    const plate = (res.body as { plates: Plate[] }).plates.find(
      (p) => p.dessertId === pistachioFrost(),
    )!;
    expect(plate.afterSubstitution?.clear).toBe(true);
    expect(plate.resolved).toBe(true);
    const after = await notes(wedding(), d.chef);
    expect(
      after.unresolved.filter((u) => u.guestId === 0 && u.dessertName === 'Pistachio Frost'),
    ).toEqual([]);
    const detail = await d.t.http.get(`/api/orders/${wedding()}`).set(bearer(d.chef)).expect(200);
    const summaries = (detail.body.timeline as Array<{ summary: string }>).map((e) => e.summary);
    expect(summaries.some((s) => /Substitution for Table 3, seat 4, Pistachio Frost/.test(s))).toBe(
      true,
    );

    // Removing it brings the conflict back, and is audited as well.
    await d.t.http
      .delete(`/api/orders/${wedding()}/guests/0/substitutions/${pistachioFrost()}`)
      .set(bearer(d.chef))
      .expect(200);
    const again = await notes(wedding(), d.chef);
    expect(
      again.unresolved.some((u) => u.guestId === 0 && u.dessertName === 'Pistachio Frost'),
    ).toBe(true);
  });

  it('rejects a substitution of a component the dessert does not have, with a readable 400', async () => {
    const res = await d.t.http
      .put(`/api/orders/${wedding()}/guests/0/substitutions/${pistachioFrost()}`)
      .set(bearer(d.chef))
      .send({ leaveOut: [demoId('rec-rum-syrup')] })
      .expect(400);
    expect(res.body.message).toMatch(/has no component/);
    await d.t.http
      .put(`/api/orders/${wedding()}/guests/0/substitutions/${pistachioFrost()}`)
      .set(bearer(d.chef))
      .send({})
      .expect(400);
    await d.t.http
      .put(`/api/orders/${wedding()}/guests/99/substitutions/${pistachioFrost()}`)
      .set(bearer(d.chef))
      .send({ note: 'x' })
      .expect(404);
  });

  it('gives staff a briefing by table (JSON and PDF) and logs every opening', async () => {
    const res = await d.t.http
      .get(`/api/orders/${wedding()}/briefing`)
      .set(bearer(d.staff))
      .expect(200);
    const tables = res.body.tables as Array<{
      table: string;
      guests: Array<{ guest: string; dessert: string; change: string; why: string[] }>;
    }>;
    const t3 = tables.find((t) => t.table === '3')!;
    const bowl = t3.guests.find((g) => g.dessert === 'Vanilla Crumble Bowl')!;
    expect(bowl.change).toBe('Replace Brown-butter almond crumble with Brown-butter rye crumble');
    expect(bowl.why.join(' ')).toMatch(/Brown-butter almond crumble/);
    const pdf = await d.t.http
      .get(`/api/orders/${wedding()}/briefing.pdf`)
      .set(bearer(d.staff))
      .buffer(true)
      .parse((r, cb) => {
        const chunks: Buffer[] = [];
        r.on('data', (c: Buffer) => chunks.push(c));
        r.on('end', () => cb(null, Buffer.concat(chunks)));
      })
      .expect(200);
    expect(pdf.headers['content-type']).toBe('application/pdf');
    const text = pdfText(pdf.body as Buffer).join(' ');
    expect(text).toContain('Allergy briefing');
    expect(text).toContain('Table 3');

    await d.t.http.get(`/api/orders/${wedding()}`).set(bearer(d.staff)).expect(200);
    const log = await d.t.http
      .get(`/api/orders/${wedding()}/access-log`)
      .set(bearer(d.chef))
      .expect(200);
    const entries = log.body as Array<{ role: string; what: string; name: string }>;
    expect(entries).toEqual(
      expect.arrayContaining([
        expect.objectContaining({ role: 'staff', what: 'briefing', name: 'Idris Okafor' }),
        expect.objectContaining({ role: 'staff', what: 'briefing_pdf' }),
        expect.objectContaining({ role: 'staff', what: 'guest_list' }),
        expect.objectContaining({ role: 'chef', what: 'allergy_notes' }),
      ]),
    );
    const rows = await d.t.dataSource
      .getRepository(GuestDataAccessEntity)
      .countBy({ orderId: wedding() });
    expect(rows).toBe(entries.length);
    await d.t.http.get(`/api/orders/${wedding()}/access-log`).set(bearer(d.staff)).expect(403);
  });

  it('guards: 401 without a token, 404 for another client, 403 for staff writes', async () => {
    await d.t.http.get(`/api/orders/${wedding()}/allergy-notes`).expect(401);
    const other = await makeSignedInUser(d.t, Role.Client);
    await d.t.http
      .get(`/api/orders/${wedding()}/allergy-notes`)
      .set(bearer(other.token))
      .expect(404);
    // The client who entered the guests reads them; that opening is not the studio's, so not logged.
    const before = await d.t.dataSource.getRepository(GuestDataAccessEntity).count();
    await d.t.http.get(`/api/orders/${wedding()}/allergy-notes`).set(bearer(d.client)).expect(200);
    expect(await d.t.dataSource.getRepository(GuestDataAccessEntity).count()).toBe(before);
    await d.t.http.get(`/api/orders/${wedding()}/briefing`).set(bearer(d.client)).expect(403);
    await d.t.http.get(`/api/orders/${wedding()}/allergy-notes`).set(bearer(d.staff)).expect(200);
    await d.t.http
      .put(`/api/orders/${wedding()}/guests/0/substitutions/${pistachioFrost()}`)
      .set(bearer(d.staff))
      .send({ note: 'staff should not' })
      .expect(403);
    await d.t.http
      .delete(`/api/orders/${wedding()}/guests/0/substitutions/${pistachioFrost()}`)
      .set(bearer(d.staff))
      .expect(403);
    await d.t.http
      .post(`/api/orders/${birthday()}/confirm`)
      .set(bearer(d.staff))
      .send({})
      .expect(403);
    await d.t.http.post('/api/recipes').set(bearer(d.staff)).send({}).expect(403);
  });
});

describe('the confirmation gate', () => {
  it('blocks an unresolved conflict, then a too-short lead time, and allows an override with a reason', async () => {
    const id = birthday();
    const blocked = await d.t.http
      .post(`/api/orders/${id}/confirm`)
      .set(bearer(d.chef))
      .send({})
      .expect(409);
    expect(blocked.body.message).toMatch(/still conflict/);
    expect(blocked.body.conflicts).toEqual([
      expect.objectContaining({
        guest: 'Table 1, seat 3',
        dessertName: 'Pistachio Frost',
        messages: [expect.stringMatching(/Brown-butter almond crumble/)],
      }),
    ]);
    // Resolve it: no parfait, rye crumble.
    await d.t.http
      .put(`/api/orders/${id}/guests/0/substitutions/${pistachioFrost()}`)
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

    // Now move the clock to the morning of the event (07:00 or 08:00 in Brussels): the vanilla
    // ice cream base needs at least 6 h of rest before churning, then hours in the freezer, so
    // it cannot be ready for a 20:00 service less one hour of plating.
    const order = await d.t.dataSource.getRepository(OrderEntity).findOneByOrFail({ id });
    d.clock.set(new Date(`${order.eventDate}T06:00:00Z`));
    try {
      const late = await d.t.http
        .post(`/api/orders/${id}/confirm`)
        .set(bearer(d.chef))
        .send({})
        .expect(409);
      expect(late.body.conflicts).toEqual([]);
      expect(late.body.leadTime.length).toBeGreaterThan(0);
      expect(late.body.leadTime[0]).toMatchObject({ kind: 'lead_time' });
      expect(late.body.message).toContain(late.body.leadTime[0].message);

      await d.t.http
        .post(`/api/orders/${id}/confirm`)
        .set(bearer(d.chef))
        .send({ overrideReason: 'ok' })
        .expect(400);
      const ok = await d.t.http
        .post(`/api/orders/${id}/confirm`)
        .set(bearer(d.chef))
        .send({ overrideReason: 'Ice cream comes from the freezer stock made last week' })
        .expect(200);
      expect(ok.body.status).toBe('confirmed');
      const override = (ok.body.timeline as Array<{ summary: string; reason: string | null }>).find(
        (e) => e.summary.startsWith('Confirmed despite'),
      );
      expect(override?.reason).toBe('Ice cream comes from the freezer stock made last week');
    } finally {
      d.clock.set(new Date());
    }
  });
});
