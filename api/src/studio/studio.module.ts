import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AuthModule } from '../auth/auth.module.js';
import { KitchenModule } from '../kitchen/kitchen.module.js';
import { MailModule } from '../mail/mail.module.js';
import { SettingsChangeEntity } from './entities/settings-change.entity.js';
import { StaffInvitationEntity } from './entities/staff-invitation.entity.js';
import { StudioSettings } from './entities/studio-settings.entity.js';
import { StudioSettingsController } from './studio-settings.controller.js';
import { StudioSettingsService } from './studio-settings.service.js';
import { StudioController } from './studio.controller.js';
import {
  AcceptInvitationController,
  InvitationsController,
  TeamMembersController,
} from './team.controller.js';
import { TeamService } from './team.service.js';

@Module({
  imports: [
    TypeOrmModule.forFeature([StudioSettings, SettingsChangeEntity, StaffInvitationEntity]),
    AuthModule,
    KitchenModule,
    MailModule,
  ],
  controllers: [
    StudioController,
    StudioSettingsController,
    InvitationsController,
    TeamMembersController,
    AcceptInvitationController,
  ],
  providers: [StudioSettingsService, TeamService],
})
export class StudioModule {}
