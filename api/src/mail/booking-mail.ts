import { formatIsoDate, formatMoney } from '@nappe/shared';
import { escapeHtml, headerSafe } from './mail-text.js';

/**
 * The booking e-mails: our own words, plain text and HTML. They carry the reference, the date,
 * the number of guests and the money — never a guest's name, allergy or diet: those stay behind
 * the signed-in page the message links to.
 */

export interface MailContent {
  subject: string;
  text: string;
  html: string;
}

export interface OrderMailFacts {
  orderId: string;
  reference: string;
  clientName: string;
  menuName: string;
  eventDate: string;
  serviceTime: string;
  guestCount: number;
  currency: string;
}

export interface MailStudio {
  name: string;
  storefrontUrl: string;
}

function eventLink(studio: MailStudio, orderId: string): string {
  return `${studio.storefrontUrl.replace(/\/$/, '')}/my-events/${encodeURIComponent(orderId)}`;
}

/** Paragraphs → text and HTML, with one call to action. */
function compose(
  studio: MailStudio,
  facts: OrderMailFacts,
  subject: string,
  paragraphs: string[],
): MailContent {
  const link = eventLink(studio, facts.orderId);
  const greeting = `Dear ${facts.clientName},`;
  const what = `${facts.menuName} for ${facts.guestCount} ${facts.guestCount === 1 ? 'guest' : 'guests'} on ${formatIsoDate(facts.eventDate)} at ${facts.serviceTime} (booking ${facts.reference}).`;
  const closing = `See your event, its payments and documents: ${link}`;
  const signature = `— ${studio.name}`;
  const text = [greeting, what, ...paragraphs, closing, signature].join('\n\n') + '\n';
  const p = (s: string) =>
    `<p style="margin:0 0 14px;font:15px/1.5 Helvetica,Arial,sans-serif;color:#2B1E2F">${escapeHtml(s)}</p>`;
  const html = [
    '<!doctype html><html><body style="margin:0;padding:24px;background:#FBF6EE">',
    '<div style="max-width:560px;margin:0 auto;background:#ffffff;padding:28px;border-radius:8px">',
    `<h1 style="margin:0 0 18px;font:600 22px/1.3 Georgia,serif;color:#2B1E2F">${escapeHtml(subject)}</h1>`,
    p(greeting),
    p(what),
    ...paragraphs.map(p),
    `<p style="margin:22px 0"><a href="${escapeHtml(link)}" style="background:#2B1E2F;color:#FBF6EE;padding:10px 18px;border-radius:6px;text-decoration:none;font:600 15px Helvetica,Arial,sans-serif">See your event</a></p>`,
    p(signature),
    '</div></body></html>',
  ].join('');
  return { subject: headerSafe(subject, 250), text, html };
}

const money = (minor: number, currency: string) => formatMoney(minor, currency);

export function bookingReceivedMail(
  studio: MailStudio,
  facts: OrderMailFacts,
  paidMinor: number,
  paymentLabel: string,
): MailContent {
  return compose(studio, facts, `Booking received — ${facts.reference}`, [
    `Thank you: we received your ${paymentLabel.toLowerCase()} of ${money(paidMinor, facts.currency)}. Your booking is now with the chef, who will confirm it shortly.`,
    'Your receipt is attached. Your guests’ dietary details are kept on your event page, not in e-mails.',
  ]);
}

export function paymentReceivedMail(
  studio: MailStudio,
  facts: OrderMailFacts,
  paidMinor: number,
  paymentLabel: string,
  balanceMinor: number,
): MailContent {
  return compose(studio, facts, `Payment received — ${facts.reference}`, [
    `We received your ${paymentLabel.toLowerCase()} of ${money(paidMinor, facts.currency)}.`,
    balanceMinor > 0
      ? `Still to pay: ${money(balanceMinor, facts.currency)}.`
      : 'Your booking is paid in full.',
    'Your receipt is attached.',
  ]);
}

export function orderConfirmedMail(studio: MailStudio, facts: OrderMailFacts): MailContent {
  return compose(studio, facts, `Your event is confirmed — ${facts.reference}`, [
    'The chef has confirmed your event. The calendar file is attached.',
  ]);
}

export function cancellationMail(
  studio: MailStudio,
  facts: OrderMailFacts,
  refundMinor: number,
  policyMessage: string,
  byStudio: boolean,
): MailContent {
  return compose(studio, facts, `Booking cancelled — ${facts.reference}`, [
    byStudio
      ? 'The studio has cancelled this booking.'
      : 'Your booking is cancelled, as you asked.',
    policyMessage,
    refundMinor > 0
      ? `${money(refundMinor, facts.currency)} is refunded to the card you paid with; banks usually show it within 5–10 days.`
      : 'There is no refund to make.',
  ]);
}

export function declinedMail(
  studio: MailStudio,
  facts: OrderMailFacts,
  refundMinor: number,
): MailContent {
  return compose(studio, facts, `We cannot take your booking — ${facts.reference}`, [
    'We are sorry: the studio cannot take this booking.',
    refundMinor > 0
      ? `Everything you paid, ${money(refundMinor, facts.currency)}, is refunded to the card you paid with.`
      : 'Nothing was paid, so there is nothing to refund.',
  ]);
}

export function guestChangeMail(
  studio: MailStudio,
  facts: OrderMailFacts,
  previousGuestCount: number,
  change: { refundMinor: number; collectMinor: number; message: string },
): MailContent {
  const lines = [`The number of guests changed from ${previousGuestCount} to ${facts.guestCount}.`];
  lines.push(change.message);
  if (change.refundMinor > 0)
    lines.push(
      `${money(change.refundMinor, facts.currency)} is refunded to the card you paid with.`,
    );
  if (change.collectMinor > 0)
    lines.push(
      `To keep the new guests, please pay ${money(change.collectMinor, facts.currency)} from your event page.`,
    );
  return compose(studio, facts, `Guests updated — ${facts.reference}`, lines);
}
