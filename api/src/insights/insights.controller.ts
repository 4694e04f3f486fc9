import { Controller, Get } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { Role } from '@nappe/shared';
import { Roles } from '../auth/decorators/roles.decorator.js';
import type { Dashboard } from './dashboard.types.js';
import { InsightsService } from './insights.service.js';

@ApiTags('insights')
@ApiBearerAuth()
@Controller('insights')
export class InsightsController {
  constructor(private readonly insights: InsightsService) {}

  @Roles(Role.Chef)
  @Get('dashboard')
  dashboard(): Promise<Dashboard> {
    return this.insights.dashboard();
  }
}
