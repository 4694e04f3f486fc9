import type { MailContent } from '../mail/booking-mail.js';
import { escapeHtml, headerSafe } from '../mail/mail-text.js';

export interface PasswordResetMailFacts {
  studioName: string;
  /** The studio's IANA time zone: the expiry time is said in it. */
  timeZone: string;
  personName: string;
  email: string;
  link: string;
  expiresAt: Date;
  validMinutes: number;
}

/** "14:35 CET" in the studio's zone (UTC if the zone is not one Intl knows). */
function clockTime(at: Date, timeZone: string): string {
  const options: Intl.DateTimeFormatOptions = {
    hour: '2-digit',
    minute: '2-digit',
    hourCycle: 'h23',
    timeZoneName: 'short',
  };
  try {
    return new Intl.DateTimeFormat('en-GB', { ...options, timeZone }).format(at);
  } catch {
    return new Intl.DateTimeFormat('en-GB', { ...options, timeZone: 'UTC' }).format(at);
  }
}

/**
 * The password-reset e-mail: for which account, the one-time link, how long it works, and what
 * to do if the person did not ask (nothing: the password stays as it is).
 */
export function passwordResetMail(f: PasswordResetMailFacts): MailContent {
  const until = clockTime(f.expiresAt, f.timeZone);
  const lines = [
    `Hello ${f.personName},`,
    `Someone asked to choose a new password for your ${f.studioName} account (${f.email}). If it was you, choose it here. The link works once, for ${f.validMinutes} minutes (until ${until}):`,
    f.link,
    'Choosing a new password signs you out on every device; sign in again with the new one.',
    'If you did not ask for this, ignore this e-mail: your password stays as it is, and nothing happens without the link.',
  ];
  return {
    subject: headerSafe(`${f.studioName}: choose a new password`, 250),
    text: lines.join('\n\n') + '\n',
    html: [
      `<p>${escapeHtml(lines[0]!)}</p>`,
      `<p>${escapeHtml(lines[1]!)}</p>`,
      `<p><a href="${escapeHtml(f.link)}">${escapeHtml(f.link)}</a></p>`,
      `<p>${escapeHtml(lines[3]!)}</p>`,
      `<p>${escapeHtml(lines[4]!)}</p>`,
    ].join('\n'),
  };
}
