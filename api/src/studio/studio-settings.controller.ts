import { Body, Controller, Get, Put } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { Role } from '@nappe/shared';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import type { Principal } from '../auth/principal.js';
import { ZodValidationPipe } from '../common/zod-validation.pipe.js';
import {
  studioSettingsBodySchema,
  type StudioSettingsBody,
  type StudioSettingsView,
} from './studio-settings.body.js';
import { StudioSettingsService } from './studio-settings.service.js';

@ApiTags('studio')
@ApiBearerAuth()
@Controller('studio/settings')
export class StudioSettingsController {
  constructor(private readonly settings: StudioSettingsService) {}

  @Roles(Role.Chef)
  @Get()
  get(): Promise<StudioSettingsView> {
    return this.settings.get();
  }

  @Roles(Role.Chef)
  @Put()
  update(
    @CurrentUser() user: Principal,
    @Body(new ZodValidationPipe(studioSettingsBodySchema)) body: StudioSettingsBody,
  ): Promise<StudioSettingsView> {
    return this.settings.update(user.id, body);
  }
}
