import { describe, expect, it } from 'vitest';
import {
  changeGuestCountSchema,
  contactPhoneSchema,
  createOrderSchema,
  createQuoteSchema,
  orderReasonSchema,
  type CreateOrderInput,
} from '../order-schemas.js';

const valid: CreateOrderInput = {
  menuId: 'menu-garden-supper',
  eventDate: '2026-06-21',
  serviceTime: '19:30',
  venueAddressLines: ['Orangery of the Old Mill', 'Molenstraat 12', '9000 Ghent'],
  occasion: 'Fortieth birthday dinner',
  contactPhone: '+32 470 12 34 56',
  guestCount: 40,
  guestRequirements: [
    { label: 'Ana', table: '4', allergens: ['nuts'] },
    { label: 'Table 2, seat 5', diets: ['vegan'] },
  ],
  guestDataConsent: true,
  acceptTerms: true,
};

const messages = (r: { success: boolean; error?: { issues: { message: string }[] } }) =>
  r.error?.issues.map((i) => i.message) ?? [];

describe('create order', () => {
  it('accepts a complete booking and normalises the phone', () => {
    const parsed = createOrderSchema.parse(valid);
    expect(parsed.contactPhone).toBe('+32470123456');
    expect(parsed.guestRequirements[0]).toMatchObject({
      label: 'Ana',
      allergens: ['nuts'],
      diets: [],
    });
  });

  it.each([
    ['price', { pricePerGuestMinor: 1 }],
    ['total', { totalMinor: 1 }],
    ['status', { status: 'confirmed' }],
    ['user id', { userId: 'u-2' }],
    ['paid at', { paidAt: '2026-01-01' }],
  ])('refuses a %s sent by the client (OWASP API3: mass assignment)', (_, extra) => {
    const r = createOrderSchema.safeParse({ ...valid, ...extra });
    expect(r.success).toBe(false);
    expect(messages(r)[0]).toMatch(
      /not accepted here: .*\. Prices, totals and the booking status are worked out by the studio\.$/,
    );
  });

  it('guests from 1 to 5000, whole people', () => {
    expect(createOrderSchema.safeParse({ ...valid, guestCount: 5000 }).success).toBe(true);
    expect(
      messages(createOrderSchema.safeParse({ ...valid, guestCount: 0, guestRequirements: [] })),
    ).toEqual(['At least one guest.']);
    expect(messages(createOrderSchema.safeParse({ ...valid, guestCount: 5001 }))).toEqual([
      'For more than 5,000 guests, please contact the studio.',
    ]);
    expect(messages(createOrderSchema.safeParse({ ...valid, guestCount: 2.5 }))).toContain(
      'Count guests in whole people.',
    );
    expect(createOrderSchema.safeParse({ ...valid, guestCount: '40' }).success).toBe(false);
  });

  it('dates and times are real and written the ISO way', () => {
    for (const eventDate of ['2026-02-30', '21/06/2026', '2026-6-21', '2026-06-21T19:30']) {
      expect(messages(createOrderSchema.safeParse({ ...valid, eventDate }))).toEqual([
        'Use a real date written like 2026-06-21 (year-month-day).',
      ]);
    }
    for (const serviceTime of ['7:30pm', '24:00', '19:60', '1930']) {
      expect(messages(createOrderSchema.safeParse({ ...valid, serviceTime }))).toEqual([
        'Write the time like 19:30 (24-hour clock).',
      ]);
    }
    expect(createOrderSchema.safeParse({ ...valid, serviceTime: '00:00' }).success).toBe(true);
    expect(createOrderSchema.safeParse({ ...valid, serviceTime: '23:59' }).success).toBe(true);
  });

  it('text is capped and on one line', () => {
    expect(messages(createOrderSchema.safeParse({ ...valid, venueAddressLines: [] }))).toEqual([
      'Enter the venue’s address.',
    ]);
    expect(
      createOrderSchema.safeParse({ ...valid, venueAddressLines: Array(7).fill('x') }).success,
    ).toBe(false);
    expect(messages(createOrderSchema.safeParse({ ...valid, occasion: 'x'.repeat(121) }))).toEqual([
      'Keep the occasion under 120 characters.',
    ]);
    expect(
      messages(createOrderSchema.safeParse({ ...valid, occasion: 'Dinner\r\nBcc: a@b.test' })),
    ).toEqual(['Keep the occasion on one line.']);
    expect(messages(createOrderSchema.safeParse({ ...valid, occasion: '   ' }))).toEqual([
      'Enter the occasion.',
    ]);
  });

  it('guest requirements use the conflicts schema, fit the party and need consent', () => {
    expect(
      createOrderSchema.safeParse({
        ...valid,
        guestRequirements: [{ label: 'Ana', allergens: ['bananas'] }],
      }).success,
    ).toBe(false);
    expect(
      messages(
        createOrderSchema.safeParse({
          ...valid,
          guestCount: 1,
          guestRequirements: valid.guestRequirements,
        }),
      ),
    ).toEqual([
      'You listed requirements for 2 guests but the party is 1. Raise the number of guests or remove some entries.',
    ]);
    expect(
      messages(createOrderSchema.safeParse({ ...valid, guestDataConsent: undefined })),
    ).toEqual([
      'Please confirm that your guests agreed to share their allergies and diets with the studio.',
    ]);
    // No requirements, no consent needed.
    expect(
      createOrderSchema.safeParse({ ...valid, guestRequirements: [], guestDataConsent: undefined })
        .success,
    ).toBe(true);
  });

  it('the terms must be accepted', () => {
    expect(messages(createOrderSchema.safeParse({ ...valid, acceptTerms: false }))).toEqual([
      'Please accept the booking terms and the cancellation policy to continue.',
    ]);
  });
});

describe('contact phone, leniently (ITU-T E.164: at most 15 digits)', () => {
  it.each([
    ['+32 470 12 34 56', '+32470123456'],
    ['0032 470-12.34.56', '+32470123456'],
    ['(415) 555-0134', '4155550134'],
    ['+44 20 7946 0958', '+442079460958'],
  ])('%s → %s', (input, out) => {
    expect(contactPhoneSchema.parse(input)).toBe(out);
  });

  it.each(['12345', '+1234567890123456', 'call me', '+32 470 12 34 56 ext 2'])(
    'refuses %s',
    (input) => {
      expect(contactPhoneSchema.safeParse(input).success).toBe(false);
    },
  );
});

describe('quote and guest-count requests', () => {
  it('create quote: ids, a date and a count only', () => {
    expect(
      createQuoteSchema.parse({
        menuId: 'menu-garden-supper',
        eventDate: '2026-06-21',
        guestCount: 12,
      }),
    ).toEqual({ menuId: 'menu-garden-supper', eventDate: '2026-06-21', guestCount: 12 });
    const withPrice = createQuoteSchema.safeParse({
      menuId: 'm',
      eventDate: '2026-06-21',
      guestCount: 12,
      totalMinor: 100,
    });
    expect(messages(withPrice)).toEqual([
      'This field is not accepted here: totalMinor. Prices, totals and the booking status are worked out by the studio.',
    ]);
    expect(
      messages(createQuoteSchema.safeParse({ eventDate: '2026-06-21', guestCount: 12 })),
    ).toEqual(['Choose a menu.']);
  });

  it('change guest count: strict, requirements optional but must fit', () => {
    expect(changeGuestCountSchema.parse({ guestCount: 30 })).toEqual({ guestCount: 30 });
    expect(changeGuestCountSchema.safeParse({ guestCount: 30, refundMinor: 5 }).success).toBe(
      false,
    );
    expect(
      changeGuestCountSchema.safeParse({
        guestCount: 1,
        guestRequirements: valid.guestRequirements,
        guestDataConsent: true,
      }).success,
    ).toBe(false);
  });

  it('a reason is optional and capped', () => {
    expect(orderReasonSchema.parse({})).toEqual({});
    expect(orderReasonSchema.safeParse({ reason: 'x'.repeat(501) }).success).toBe(false);
    expect(orderReasonSchema.safeParse({ reason: 'ok', status: 'cancelled' }).success).toBe(false);
  });
});
