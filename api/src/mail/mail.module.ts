import { Module } from '@nestjs/common';
import { Env } from '../config/env.js';
import { DocumentsModule } from '../documents/documents.module.js';
import { MAIL_TRANSPORT, smtpTransport } from './mail-transport.js';
import { OutboxService } from './outbox.service.js';
import { OutboxWorker } from './outbox.worker.js';

/** E-mail through an outbox: written with the change, sent by the worker with retries. */
@Module({
  imports: [DocumentsModule],
  providers: [
    { provide: MAIL_TRANSPORT, inject: [Env], useFactory: smtpTransport },
    OutboxService,
    OutboxWorker,
  ],
  exports: [OutboxService, OutboxWorker],
})
export class MailModule {}
