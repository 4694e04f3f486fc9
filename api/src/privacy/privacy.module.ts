import { Module } from '@nestjs/common';
import { AuthModule } from '../auth/auth.module.js';
import { AccountController } from './account.controller.js';
import { AccountDeletionService } from './account-deletion.service.js';
import { AccountExportService } from './account-export.service.js';
import { GuestDataRetentionJob } from './guest-data-retention.job.js';

/**
 * Guest data is health data (DESIGN.md): the retention purge of past events' guest details, a
 * client's export of their data, and the deletion of their account.
 */
@Module({
  imports: [AuthModule],
  controllers: [AccountController],
  providers: [AccountExportService, AccountDeletionService, GuestDataRetentionJob],
  exports: [GuestDataRetentionJob],
})
export class PrivacyModule {}
