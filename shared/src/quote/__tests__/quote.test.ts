import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { addIsoDays } from '../../availability/iso-date.js';
import type { Menu } from '../../kitchen/types.js';
import {
  EventDatePassedError,
  EventPassedError,
  FinalGuestCountDeadlineError,
  GuestCountOutOfRangeError,
  InvalidBookingInputError,
  MenuNotOfferedError,
} from '../../orders/booking-errors.js';
import {
  DEFAULT_STUDIO_SETTINGS,
  type CancellationTier,
  type StudioSettings,
} from '../../settings/studio-settings.js';
import {
  computeQuote,
  declineRefund,
  describeCancellationPolicy,
  quoteFromSnapshot,
  refundFor,
  requote,
  snapshotPricing,
  type OrderMoney,
  type PricingSnapshot,
} from '../quote.js';

const menu = (over: Partial<Menu> = {}): Menu => ({
  id: 'menu-test',
  name: 'Test Supper',
  dessertIds: ['d1'],
  pricePerGuestMinor: 950,
  minGuests: 8,
  maxGuests: 60,
  leadDays: 4,
  active: true,
  ...over,
});
const settings = (over: Partial<StudioSettings> = {}): StudioSettings => ({
  ...DEFAULT_STUDIO_SETTINGS,
  ...over,
});

/** Every number anywhere in a value is an integer (NaN and fractions fail). */
function numbersIn(value: unknown, out: number[] = []): number[] {
  if (typeof value === 'number') out.push(value);
  else if (Array.isArray(value)) value.forEach((v) => numbersIn(v, out));
  else if (value && typeof value === 'object')
    Object.values(value).forEach((v) => numbersIn(v, out));
  return out;
}

describe('a quote, worked by hand', () => {
  it('prices including tax (EU consumer prices): 40 guests × €9.50 at 21 %, 30 % deposit', () => {
    const q = computeQuote({
      menu: menu(),
      settings: settings(),
      guestCount: 40,
      eventDate: '2026-07-01',
      today: '2026-05-01',
    });
    expect(q.lines).toEqual([
      {
        description: 'Test Supper, per guest',
        quantity: 40,
        unitPriceMinor: 950,
        amountMinor: 38000,
      },
    ]);
    expect(q.subtotalMinor).toBe(38000);
    // Tax inside a gross price = gross × r/(1 + r) (HMRC VAT Notice 700's VAT fraction;
    // Directive 2006/112/EC Art. 73/78): 38000 × 21/121 = 6595.04 → 6595.
    expect(q.taxMinor).toBe(6595);
    expect(q.netMinor).toBe(31405);
    expect(q.totalMinor).toBe(38000);
    expect(q.paymentPlan).toBe('deposit_and_balance');
    expect(q.depositMinor).toBe(11400); // 30 % of 38000
    expect(q.balanceMinor).toBe(26600);
    expect(q.balanceDueDate).toBe('2026-06-17'); // 14 days before 1 July
    expect(q.notes.join(' ')).toContain('€65.95 of the total is tax');
    expect(q.notes.join(' ')).toContain('balance of €266.00 is due by Wednesday 17 June 2026');
  });

  it('tax added (HMRC VAT Notice 700 standard rate 20 %): 12 guests × £25.00 net', () => {
    const q = computeQuote({
      menu: menu({ pricePerGuestMinor: 2500, minGuests: 1 }),
      settings: settings({
        currency: 'GBP',
        taxRateBp: 2000,
        pricesIncludeTax: false,
        depositPercent: 25,
      }),
      guestCount: 12,
      eventDate: '2026-09-12',
      today: '2026-06-01',
    });
    expect(q.netMinor).toBe(30000);
    expect(q.taxMinor).toBe(6000); // net × 20 %
    expect(q.totalMinor).toBe(36000);
    expect(q.depositMinor).toBe(9000);
    expect(q.balanceMinor).toBe(27000);
    expect(q.notes[1]).toBe('Tax at 20 % is added: £60.00.');
  });

  it('a currency without minor units (JPY) and one with three (KWD)', () => {
    const yen = computeQuote({
      menu: menu({ pricePerGuestMinor: 3000, minGuests: 1 }),
      settings: settings({ currency: 'JPY', taxRateBp: 1000, timeZone: 'Asia/Tokyo' }),
      guestCount: 25,
      eventDate: '2026-10-10',
      today: '2026-06-01',
    });
    expect(yen.totalMinor).toBe(75000); // ¥75,000
    expect(yen.taxMinor).toBe(6818); // 75000 × 10/110 = 6818.18…
    expect(yen.depositMinor).toBe(22500);
    const dinar = computeQuote({
      menu: menu({ pricePerGuestMinor: 12_345, minGuests: 1 }), // 12.345 KWD
      settings: settings({ currency: 'KWD', taxRateBp: 0, depositPercent: 33 }),
      guestCount: 7,
      eventDate: '2026-10-10',
      today: '2026-06-01',
    });
    expect(dinar.totalMinor).toBe(86_415);
    expect(dinar.taxMinor).toBe(0);
    expect(dinar.depositMinor).toBe(28_517); // 86415 × 0.33 = 28516.95 → 28517
    expect(dinar.notes[0]).toMatch(/KWD\s12\.345 per guest/);
    expect(dinar.notes[1]).toBe('No tax is charged.');
  });

  it('when the balance would already be due, the deposit is the whole total and the quote says so', () => {
    const base = { menu: menu(), settings: settings(), guestCount: 10, eventDate: '2026-07-01' };
    const tenDays = computeQuote({ ...base, today: '2026-06-21' });
    expect(tenDays.paymentPlan).toBe('full');
    expect(tenDays.depositMinor).toBe(tenDays.totalMinor);
    expect(tenDays.balanceMinor).toBe(0);
    expect(tenDays.balanceDueDate).toBeNull();
    expect(tenDays.notes[2]).toBe(
      'The event is 10 days away and the balance is due 14 days before it, so the deposit is the whole total: €95.00 is paid when you book.',
    );
    // Exactly 14 days away: the balance would be due today — paid in full too.
    expect(computeQuote({ ...base, today: '2026-06-17' }).paymentPlan).toBe('full');
    // 15 days away: deposit now, balance tomorrow.
    const fifteen = computeQuote({ ...base, today: '2026-06-16' });
    expect(fifteen.paymentPlan).toBe('deposit_and_balance');
    expect(fifteen.balanceDueDate).toBe('2026-06-17');
  });

  it('a 100 % deposit setting means payment in full', () => {
    const q = computeQuote({
      menu: menu(),
      settings: settings({ depositPercent: 100 }),
      guestCount: 10,
      eventDate: '2026-07-01',
      today: '2026-01-01',
    });
    expect(q.paymentPlan).toBe('full');
    expect(q.notes[2]).toBe('The whole total (€95.00) is paid when you book.');
  });

  it('refuses what cannot be quoted, in words', () => {
    const base = {
      menu: menu(),
      settings: settings(),
      eventDate: '2026-07-01',
      today: '2026-05-01',
    };
    expect(() => computeQuote({ ...base, guestCount: 7 })).toThrowError(GuestCountOutOfRangeError);
    expect(() => computeQuote({ ...base, guestCount: 7 })).toThrowError(
      '“Test Supper” is served to at least 8 guests; you asked for 7.',
    );
    expect(() => computeQuote({ ...base, guestCount: 61 })).toThrowError(/at most 60 guests/);
    expect(() => computeQuote({ ...base, guestCount: 10.5 })).toThrowError(
      InvalidBookingInputError,
    );
    expect(() =>
      computeQuote({ ...base, guestCount: 10, menu: menu({ active: false }) }),
    ).toThrowError(MenuNotOfferedError);
    expect(() => computeQuote({ ...base, guestCount: 10, eventDate: '2026-04-30' })).toThrowError(
      EventDatePassedError,
    );
    expect(() => computeQuote({ ...base, guestCount: 10, eventDate: '2026-02-30' })).toThrowError(
      /real date/,
    );
    expect(() =>
      computeQuote({ ...base, guestCount: 10, menu: menu({ pricePerGuestMinor: 9.5 }) }),
    ).toThrowError(
      'The price setting pricePerGuestMinor must be valid (a whole number of minor units (cents)); got 9.5.',
    );
  });

  it('an order keeps its snapshot: later price or policy changes do not touch it', () => {
    const pricing = snapshotPricing(menu(), settings());
    const later = snapshotPricing(
      menu({ pricePerGuestMinor: 1200 }),
      settings({ depositPercent: 50 }),
    );
    const q = quoteFromSnapshot(pricing, {
      guestCount: 20,
      eventDate: '2026-07-01',
      today: '2026-05-01',
    });
    expect(q.totalMinor).toBe(19000);
    expect(q.depositMinor).toBe(5700);
    expect(later.pricePerGuestMinor).toBe(1200);
  });
});

// ---------------------------------------------------------------- properties

const tierArb: fc.Arbitrary<CancellationTier[]> = fc
  .uniqueArray(fc.integer({ min: 1, max: 120 }), { minLength: 0, maxLength: 4 })
  .chain((days) =>
    fc
      .array(fc.integer({ min: 0, max: 100 }), {
        minLength: days.length + 1,
        maxLength: days.length + 1,
      })
      .map((percents) => {
        const sortedDays = [...days].sort((a, b) => b - a).concat(0);
        const sortedPct = [...percents].sort((a, b) => b - a);
        return sortedDays.map((d, i) => ({ daysBefore: d, refundPercent: sortedPct[i]! }));
      }),
  );

const pricingArb: fc.Arbitrary<PricingSnapshot> = fc.record({
  menuId: fc.constant('m'),
  menuName: fc.constant('Menu'),
  pricePerGuestMinor: fc.integer({ min: 0, max: 10_000_000 }),
  minGuests: fc.constant(1),
  maxGuests: fc.constant(5000),
  currency: fc.constantFrom('EUR', 'JPY', 'KWD'),
  taxRateBp: fc.integer({ min: 0, max: 10_000 }),
  pricesIncludeTax: fc.boolean(),
  depositPercent: fc.integer({ min: 1, max: 100 }),
  balanceDueDaysBefore: fc.integer({ min: 0, max: 90 }),
  finalGuestCountDaysBefore: fc.integer({ min: 0, max: 30 }),
  cancellationTiers: tierArb,
});

describe('quote properties', () => {
  it('deposit + balance = total, tax ≤ total, net + tax = total, every number an integer', () => {
    fc.assert(
      fc.property(
        pricingArb,
        fc.integer({ min: 1, max: 5000 }),
        fc.integer({ min: 0, max: 400 }),
        (pricing, guests, daysAhead) => {
          const q = quoteFromSnapshot(pricing, {
            guestCount: guests,
            eventDate: addIsoDays('2026-01-01', daysAhead),
            today: '2026-01-01',
          });
          expect(q.depositMinor + q.balanceMinor).toBe(q.totalMinor);
          expect(q.netMinor + q.taxMinor).toBe(q.totalMinor);
          expect(q.depositMinor).toBeGreaterThanOrEqual(0);
          expect(q.balanceMinor).toBeGreaterThanOrEqual(0);
          expect(q.taxMinor).toBeLessThanOrEqual(q.totalMinor);
          for (const n of numbersIn(q)) expect(Number.isSafeInteger(n)).toBe(true);
        },
      ),
    );
  });
});

// ---------------------------------------------------------------- refunds

const pricing = snapshotPricing(menu(), settings());
const order = (over: Partial<OrderMoney> = {}): OrderMoney => ({
  pricing,
  eventDate: '2026-07-01',
  guestCount: 40,
  paidMinor: 11400,
  ...over,
});

describe('refund for a cancellation, by the policy tiers (30 → 100 %, 14 → 50 %, 0 → 0 %)', () => {
  it('says the tier in plain words', () => {
    const r = refundFor(order(), '2026-06-11');
    expect(r.daysBeforeEvent).toBe(20);
    expect(r.refundMinor).toBe(5700);
    expect(r.keptMinor).toBe(5700);
    expect(r.message).toBe(
      'Cancelled 20 days before the event: 50 % of what you paid is refunded (€57.00 of €114.00).',
    );
  });

  it('tier edges: a tier applies from its day inclusive', () => {
    const pct = (date: string) => refundFor(order(), date).refundPercent;
    expect(pct('2026-05-01')).toBe(100); // 61 days
    expect(pct('2026-06-01')).toBe(100); // 30 days
    expect(pct('2026-06-02')).toBe(50); // 29 days
    expect(pct('2026-06-17')).toBe(50); // 14 days
    expect(pct('2026-06-18')).toBe(0); // 13 days
    expect(refundFor(order(), '2026-07-01').message).toBe(
      'Cancelled on the day of the event: no refund under the cancellation policy (0 % of what you paid).',
    );
    expect(() => refundFor(order(), '2026-07-02')).toThrowError(EventPassedError);
  });

  it('rounds half up and never refunds more than was paid', () => {
    expect(refundFor(order({ paidMinor: 11401 }), '2026-06-11').refundMinor).toBe(5701);
    expect(refundFor(order({ paidMinor: 0 }), '2026-05-01').message).toBe(
      'Cancelled 61 days before the event: nothing was paid, so there is nothing to refund.',
    );
    expect(() => refundFor(order({ paidMinor: 1.5 }), '2026-05-01')).toThrowError(
      InvalidBookingInputError,
    );
  });

  it('a chef’s decline refunds everything', () => {
    const r = declineRefund(order({ paidMinor: 38000 }));
    expect(r.refundMinor).toBe(38000);
    expect(r.message).toContain('everything you paid (€380.00) is refunded');
  });

  it('refund ≤ paid, refund + kept = paid, earlier cancellation never refunds less', () => {
    fc.assert(
      fc.property(
        pricingArb,
        fc.integer({ min: 1, max: 5000 }),
        fc.integer({ min: 0, max: 1e12 }),
        fc.integer({ min: 0, max: 200 }),
        fc.integer({ min: 0, max: 200 }),
        (p, guests, paid, d1, d2) => {
          const o: OrderMoney = {
            pricing: p,
            eventDate: '2026-12-31',
            guestCount: guests,
            paidMinor: paid,
          };
          const early = refundFor(o, addIsoDays('2026-12-31', -Math.max(d1, d2)));
          const late = refundFor(o, addIsoDays('2026-12-31', -Math.min(d1, d2)));
          for (const r of [early, late]) {
            expect(r.refundMinor).toBeLessThanOrEqual(paid);
            expect(r.refundMinor + r.keptMinor).toBe(paid);
            for (const n of numbersIn(r)) expect(Number.isSafeInteger(n)).toBe(true);
          }
          expect(early.refundMinor).toBeGreaterThanOrEqual(late.refundMinor);
        },
      ),
    );
  });
});

describe('the policy in plain words', () => {
  it('the default three tiers', () => {
    expect(describeCancellationPolicy(DEFAULT_STUDIO_SETTINGS.cancellationTiers)).toEqual([
      'Cancel 30 days or more before the event: 100 % of what you paid is refunded.',
      'Cancel 14 to 29 days before the event: 50 % of what you paid is refunded.',
      'Cancel less than 14 days before the event, up to the day itself: nothing is refunded.',
    ]);
  });

  it('single-day tiers and a one-tier policy', () => {
    expect(
      describeCancellationPolicy([
        { daysBefore: 0, refundPercent: 0 },
        { daysBefore: 2, refundPercent: 80 },
        { daysBefore: 1, refundPercent: 20 },
      ]),
    ).toEqual([
      'Cancel 2 days or more before the event: 80 % of what you paid is refunded.',
      'Cancel 1 day before the event: 20 % of what you paid is refunded.',
      'Cancel on the day of the event: nothing is refunded.',
    ]);
    expect(describeCancellationPolicy([{ daysBefore: 0, refundPercent: 100 }])).toEqual([
      'Cancel at any time up to the day of the event: 100 % of what you paid is refunded.',
    ]);
  });
});

// ---------------------------------------------------------------- change of guest count

describe('a change of guest count', () => {
  it('an increase tops the deposit up to the new deposit', () => {
    // 40 → 50 guests at €9.50: total €380 → €475; new deposit 30 % = €142.50; paid €114.
    const r = requote(order(), 50, '2026-06-01');
    expect(r.change).toBe('increase');
    expect(r.collectNowMinor).toBe(2850);
    expect(r.balanceAfterMinor).toBe(33250);
    expect(r.message).toBe(
      'From 40 guests to 50: the total rises from €380.00 to €475.00. To pay now: €28.50. Still to pay: €332.50 by Wednesday 17 June 2026.',
    );
  });

  it('an increase after full payment collects the difference', () => {
    const r = requote(order({ paidMinor: 38000 }), 44, '2026-06-20');
    expect(r.collectNowMinor).toBe(3800);
    expect(r.balanceAfterMinor).toBe(0);
  });

  it('a decrease refunds the removed guests’ share of what was paid, by today’s tier', () => {
    // 40 → 30 guests, 30 days before: tier 100 %. Paid €114 (deposit); share of the 10 removed
    // guests = 114 × 95/380 = €28.50, all refunded.
    const early = requote(order(), 30, '2026-06-01');
    expect(early.change).toBe('decrease');
    expect(early.refundNowMinor).toBe(2850);
    expect(early.retainedNowMinor).toBe(0);
    expect(early.creditedAfterMinor).toBe(8550); // = 30 % of the new €285 total
    expect(early.balanceAfterMinor).toBe(19950);
    // 20 days before: 50 % of that share.
    const mid = requote(order(), 30, '2026-06-11');
    expect(mid.refundNowMinor).toBe(1425);
    expect(mid.retainedNowMinor).toBe(1425);
    expect(mid.paidAfterMinor).toBe(11400 - 1425);
    expect(mid.message).toContain(
      'Of the €28.50 you paid for the 10 guests removed, 50 % is refunded under the cancellation policy: €14.25; €14.25 is kept.',
    );
    // The kept amount is not refunded again if the order is later cancelled.
    const cancelLater = refundFor(
      order({
        guestCount: 30,
        paidMinor: mid.paidAfterMinor,
        retainedMinor: mid.retainedAfterMinor,
      }),
      '2026-06-11',
    );
    expect(cancelLater.refundableBaseMinor).toBe(8550);
    expect(cancelLater.refundMinor).toBe(4275);
  });

  it('no change changes nothing', () => {
    const r = requote(order(), 40, '2026-06-01');
    expect(r.change).toBe('none');
    expect(r.collectNowMinor + r.refundNowMinor).toBe(0);
  });

  it('after the final-count deadline only the chef may change it, and never after the event', () => {
    // Deadline: 7 days before 1 July = 24 June.
    expect(requote(order(), 30, '2026-06-24').change).toBe('decrease');
    expect(() => requote(order(), 30, '2026-06-25')).toThrowError(FinalGuestCountDeadlineError);
    expect(() => requote(order(), 30, '2026-06-25')).toThrowError(
      /was due by 2026-06-24 \(7 days before the event\)/,
    );
    expect(requote(order(), 30, '2026-06-25', { allowAfterDeadline: true }).change).toBe(
      'decrease',
    );
    expect(() => requote(order(), 30, '2026-07-02', { allowAfterDeadline: true })).toThrowError(
      EventPassedError,
    );
    expect(() => requote(order(), 5, '2026-06-01')).toThrowError(GuestCountOutOfRangeError);
  });

  it('keeps the books straight for any change (integers; credited + balance = new total)', () => {
    fc.assert(
      fc.property(
        pricingArb,
        fc.integer({ min: 1, max: 5000 }),
        fc.integer({ min: 1, max: 5000 }),
        fc.integer({ min: 0, max: 1000 }),
        fc.integer({ min: 0, max: 200 }),
        (p, before, after, paidPermille, daysAhead) => {
          const eventDate = '2026-12-31';
          const today = addIsoDays(eventDate, -daysAhead);
          const total = quoteFromSnapshot(p, { guestCount: before, eventDate, today }).totalMinor;
          const paid = Math.floor((total * paidPermille) / 1000);
          const o: OrderMoney = { pricing: p, eventDate, guestCount: before, paidMinor: paid };
          const r = requote(o, after, today, { allowAfterDeadline: true });
          expect(r.creditedAfterMinor + r.balanceAfterMinor).toBe(r.quote.totalMinor);
          expect(r.balanceAfterMinor).toBeGreaterThanOrEqual(0);
          expect(r.refundNowMinor).toBeLessThanOrEqual(paid);
          expect(r.paidAfterMinor).toBe(paid + r.collectNowMinor - r.refundNowMinor);
          expect(r.paidAfterMinor - r.retainedAfterMinor).toBe(r.creditedAfterMinor);
          expect(r.collectNowMinor === 0 || r.refundNowMinor === 0).toBe(true);
          for (const n of numbersIn(r)) expect(Number.isSafeInteger(n)).toBe(true);
        },
      ),
    );
  });
});
