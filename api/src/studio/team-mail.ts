import type { MailContent } from '../mail/booking-mail.js';
import { escapeHtml } from '../mail/mail-text.js';

export interface InvitationMailFacts {
  studioName: string;
  inviteeName: string;
  inviterName: string;
  role: 'staff' | 'chef';
  link: string;
  expiresAt: Date;
}

/** The invitation e-mail: who invites, for which role, the one-time link and when it expires. */
export function invitationMail(f: InvitationMailFacts): MailContent {
  const expires = f.expiresAt.toISOString().slice(0, 16).replace('T', ' ');
  const role = f.role === 'chef' ? 'a chef' : 'a member of the kitchen and service team';
  const lines = [
    `Hello ${f.inviteeName},`,
    `${f.inviterName} invites you to join ${f.studioName} on Nappe as ${role}.`,
    `Choose your password here (the link works once, until ${expires} UTC):`,
    f.link,
    'If you did not expect this, ignore this e-mail: nothing happens without the link.',
  ];
  return {
    subject: `${f.studioName}: your invitation to the team`,
    text: lines.join('\n\n'),
    html: [
      `<p>${escapeHtml(lines[0]!)}</p>`,
      `<p>${escapeHtml(lines[1]!)}</p>`,
      `<p>${escapeHtml(lines[2]!)}</p>`,
      `<p><a href="${escapeHtml(f.link)}">${escapeHtml(f.link)}</a></p>`,
      `<p>${escapeHtml(lines[4]!)}</p>`,
    ].join('\n'),
  };
}
