import nodemailer from 'nodemailer';
import type Mail from 'nodemailer/lib/mailer/index.js';
import type { Env } from '../config/env.js';

/** What the outbox needs of a mail transport. Tests provide their own (a failing one, a JSON one). */
export interface MailTransport {
  sendMail(message: Mail.Options): Promise<unknown>;
}

export const MAIL_TRANSPORT = Symbol('MAIL_TRANSPORT');

/**
 * One SMTP transport from the environment. A local sink (no credentials) gets `secure: false,
 * ignoreTLS: true`; with credentials STARTTLS is required. Timeouts keep a hanging server from
 * holding the worker.
 */
export function smtpTransport(env: Env): MailTransport {
  const withAuth = env.SMTP_USER !== undefined && env.SMTP_USER !== '';
  return nodemailer.createTransport({
    host: env.SMTP_HOST,
    port: env.SMTP_PORT,
    secure: false,
    ignoreTLS: !withAuth,
    requireTLS: withAuth,
    auth: withAuth ? { user: env.SMTP_USER!, pass: env.SMTP_PASS ?? '' } : undefined,
    connectionTimeout: 10_000,
    greetingTimeout: 10_000,
    socketTimeout: 20_000,
  });
}
