import { randomUUID } from 'node:crypto';
import { Injectable } from '@nestjs/common';
import type { EntityManager } from 'typeorm';
import { Clock } from '../common/clock.js';
import type { MailContent } from './booking-mail.js';
import { OutboxMessageEntity, type OutboxAttachment } from './entities/outbox-message.entity.js';
import { headerSafe } from './mail-text.js';

/** local@domain with no spaces, commas, angle brackets, quotes or control characters. */
const SINGLE_ADDRESS = /^[^\s@,;:<>()"[\]\\]+@[^\s@,;:<>()"[\]\\]+\.[^\s@,;:<>()"[\]\\]+$/;

export interface OutgoingMail {
  kind: string;
  orderId: string | null;
  to: string;
  content: MailContent;
  attachments?: OutboxAttachment[];
}

/**
 * Writes e-mails to the outbox. Always called with the manager of the transaction that makes
 * the change the e-mail tells about, so the message exists exactly when the change does.
 */
@Injectable()
export class OutboxService {
  constructor(private readonly clock: Clock) {}

  async enqueue(manager: EntityManager, mail: OutgoingMail): Promise<void> {
    const now = this.clock.now();
    const to = mail.to.trim();
    // One plain address only: anything else (a list, a group, a display name) could widen the
    // recipients. It is kept, marked failed, rather than failing the change that caused it.
    const valid = SINGLE_ADDRESS.test(to);
    await manager.insert(OutboxMessageEntity, {
      id: randomUUID(),
      kind: mail.kind,
      orderId: mail.orderId,
      toAddress: headerSafe(to, 254),
      subject: headerSafe(mail.content.subject, 300),
      textBody: mail.content.text,
      htmlBody: mail.content.html,
      attachments: mail.attachments ?? [],
      status: valid ? 'pending' : 'failed',
      attempts: 0,
      nextAttemptAt: now,
      sentAt: null,
      lastError: valid ? null : 'The recipient is not a single e-mail address; not sent.',
      createdAt: now,
      updatedAt: now,
    });
  }
}
