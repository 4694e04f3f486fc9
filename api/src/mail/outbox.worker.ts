import {
  Inject,
  Injectable,
  Logger,
  type OnApplicationBootstrap,
  type OnApplicationShutdown,
} from '@nestjs/common';
import type Mail from 'nodemailer/lib/mailer/index.js';
import { DataSource, In, LessThanOrEqual, type EntityManager } from 'typeorm';
import { Clock } from '../common/clock.js';
import { Env } from '../config/env.js';
import { DocumentsService } from '../documents/documents.service.js';
import { OutboxMessageEntity } from './entities/outbox-message.entity.js';
import { MAIL_TRANSPORT, type MailTransport } from './mail-transport.js';
import { lockFor, OUTBOX_CLAIM } from '../database/serialized-writes.js';

/** After this many failed attempts a message is marked `failed` (about 13 hours of retries). */
export const OUTBOX_MAX_ATTEMPTS = 20;
/** A message left `sending` this long (the process died mid-send) is tried again. */
const STUCK_SENDING_MS = 10 * 60_000;

/** 30 s, 1 min, 2 min … doubling, at most 1 hour. */
export function outboxBackoffMs(attempts: number): number {
  return Math.min(30_000 * 2 ** Math.max(0, attempts - 1), 3_600_000);
}

export interface DrainReport {
  sent: number;
  retrying: number;
  failed: number;
}

/**
 * Sends the outbox: claims due messages in a transaction (`sending`), sends each outside any
 * transaction, then marks it `sent` — or puts it back with a later attempt time. A message is
 * claimed by one drain only, so concurrent drains never send it twice. Runs on a timer started
 * with the app (not in tests, which call `drainOutbox()`), stopped on shutdown.
 */
@Injectable()
export class OutboxWorker implements OnApplicationBootstrap, OnApplicationShutdown {
  private readonly logger = new Logger(OutboxWorker.name);
  private timer: NodeJS.Timeout | undefined;
  private running: Promise<unknown> = Promise.resolve();

  constructor(
    private readonly dataSource: DataSource,
    private readonly clock: Clock,
    private readonly env: Env,
    @Inject(MAIL_TRANSPORT) private readonly transport: MailTransport,
    private readonly documents: DocumentsService,
  ) {}

  onApplicationBootstrap(): void {
    if (this.env.OUTBOX_WORKER_ENABLED) this.start();
  }

  async onApplicationShutdown(): Promise<void> {
    this.stop();
    await this.running.catch(() => undefined);
  }

  start(): void {
    if (this.timer) return;
    this.timer = setInterval(() => {
      this.running = this.drainOutbox().catch((error: unknown) =>
        this.logger.error(`Outbox drain failed: ${String(error)}`),
      );
    }, this.env.OUTBOX_INTERVAL_MS);
    this.timer.unref();
  }

  stop(): void {
    if (this.timer) clearInterval(this.timer);
    this.timer = undefined;
  }

  /** Sends every message that is due now; returns what happened. */
  async drainOutbox(limit = 25): Promise<DrainReport> {
    const report: DrainReport = { sent: 0, retrying: 0, failed: 0 };
    const claimed = await this.dataSource.transaction((m) => this.claim(m, limit));
    for (const message of claimed) {
      try {
        await this.transport.sendMail(await this.toMail(message));
        await this.dataSource.transaction(async (m) => {
          const now = this.clock.now();
          await m.update(
            OutboxMessageEntity,
            { id: message.id, status: 'sending' },
            { status: 'sent', sentAt: now, lastError: null, updatedAt: now },
          );
        });
        report.sent += 1;
      } catch (error) {
        const failed = message.attempts >= OUTBOX_MAX_ATTEMPTS;
        const now = this.clock.now();
        const reason = (error instanceof Error ? error.message : String(error)).slice(0, 500);
        await this.dataSource.transaction((m) =>
          m.update(
            OutboxMessageEntity,
            { id: message.id, status: 'sending' },
            {
              status: failed ? 'failed' : 'pending',
              nextAttemptAt: new Date(now.getTime() + outboxBackoffMs(message.attempts)),
              lastError: reason,
              updatedAt: now,
            },
          ),
        );
        if (failed) report.failed += 1;
        else report.retrying += 1;
        this.logger.warn(
          `E-mail ${message.id} (${message.kind}) not sent, attempt ${message.attempts}: ${reason}`,
        );
      }
    }
    return report;
  }

  private async claim(m: EntityManager, limit: number): Promise<OutboxMessageEntity[]> {
    // One claim at a time, across API processes too (PostgreSQL): a message due now is marked
    // `sending` by exactly one drain, which alone sends it.
    await lockFor(m, OUTBOX_CLAIM);
    const now = this.clock.now();
    const stuckBefore = new Date(now.getTime() - STUCK_SENDING_MS);
    const due = await m.find(OutboxMessageEntity, {
      where: [
        { status: 'pending', nextAttemptAt: LessThanOrEqual(now) },
        { status: 'sending', updatedAt: LessThanOrEqual(stuckBefore) },
      ],
      order: { createdAt: 'ASC' },
      take: limit,
    });
    if (due.length === 0) return [];
    await m.update(
      OutboxMessageEntity,
      { id: In(due.map((d) => d.id)) },
      { status: 'sending', updatedAt: now },
    );
    for (const message of due) {
      message.attempts += 1;
      await m.update(OutboxMessageEntity, { id: message.id }, { attempts: message.attempts });
    }
    return due;
  }

  private async toMail(message: OutboxMessageEntity): Promise<Mail.Options> {
    const attachments: Mail.Attachment[] = [];
    for (const attachment of message.attachments) {
      try {
        if (attachment.kind === 'receipt') {
          const doc = await this.documents.receipt(attachment.orderId, attachment.paymentId);
          attachments.push({
            filename: doc.filename,
            content: doc.content,
            contentType: 'application/pdf',
          });
        } else {
          const doc = await this.documents.eventFile(attachment.orderId);
          attachments.push({
            filename: doc.filename,
            content: doc.content,
            contentType: 'text/calendar; charset=utf-8',
          });
        }
      } catch (error) {
        // The message still goes: the document is always on the signed-in event page.
        this.logger.warn(`Attachment of e-mail ${message.id} left out: ${String(error)}`);
      }
    }
    return {
      from: this.env.MAIL_FROM,
      to: message.toAddress,
      subject: message.subject,
      text: message.textBody,
      html: message.htmlBody,
      attachments,
      disableFileAccess: true,
      disableUrlAccess: true,
    };
  }
}
