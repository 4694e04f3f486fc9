import { Module } from '@nestjs/common';
import { DocumentsService } from './documents.service.js';

/** Receipts and event files, rendered on request. */
@Module({ providers: [DocumentsService], exports: [DocumentsService] })
export class DocumentsModule {}
