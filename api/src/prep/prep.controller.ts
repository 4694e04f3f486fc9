import {
  Controller,
  Delete,
  Get,
  HttpCode,
  HttpStatus,
  Param,
  Post,
  Query,
  StreamableFile,
} from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { Role, type PrepDaySchedule, type PrepPlanView, type ScheduledTask } from '@nappe/shared';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import type { Principal } from '../auth/principal.js';
import { planCsv, renderLabelsPdf, renderPlanPdf } from './prep-documents.js';
import { PrepService } from './prep.service.js';

const text = (q: unknown): string | undefined =>
  typeof q === 'string' && q !== '' ? q : undefined;

/** Prep: Plan, Schedule, Labels. Chef and staff read; staff see no costs. */
@ApiTags('prep')
@ApiBearerAuth()
@Controller('prep')
export class PrepController {
  constructor(private readonly prep: PrepService) {}

  @Roles(Role.Chef, Role.Staff)
  @Get('plan')
  plan(
    @CurrentUser() user: Principal,
    @Query('from') from: unknown,
    @Query('to') to: unknown,
  ): Promise<PrepPlanView> {
    return this.prep.plan(user, text(from), text(to));
  }

  @Roles(Role.Chef, Role.Staff)
  @Get('plan.csv')
  async planCsv(
    @CurrentUser() user: Principal,
    @Query('from') from: unknown,
    @Query('to') to: unknown,
  ): Promise<StreamableFile> {
    const plan = await this.prep.plan(user, text(from), text(to));
    return new StreamableFile(Buffer.from(planCsv(plan, plan.costsShown), 'utf8'), {
      type: 'text/csv; charset=utf-8',
      disposition: `attachment; filename="prep-plan-${plan.range.from}-${plan.range.to}.csv"`,
    });
  }

  @Roles(Role.Chef, Role.Staff)
  @Get('plan.pdf')
  async planPdf(
    @CurrentUser() user: Principal,
    @Query('from') from: unknown,
    @Query('to') to: unknown,
  ): Promise<StreamableFile> {
    const plan = await this.prep.plan(user, text(from), text(to));
    return new StreamableFile(await renderPlanPdf(plan, plan.costsShown), {
      type: 'application/pdf',
      disposition: `inline; filename="prep-sheet-${plan.range.from}-${plan.range.to}.pdf"`,
    });
  }

  @Roles(Role.Chef, Role.Staff)
  @Get('schedule')
  schedule(@Query('date') date: unknown): Promise<PrepDaySchedule> {
    return this.prep.schedule(text(date));
  }

  @Roles(Role.Chef, Role.Staff)
  @Post('tasks/:taskKey/done')
  @HttpCode(HttpStatus.OK)
  tick(@CurrentUser() user: Principal, @Param('taskKey') taskKey: string): Promise<ScheduledTask> {
    return this.prep.tick(user, taskKey);
  }

  @Roles(Role.Chef, Role.Staff)
  @Delete('tasks/:taskKey/done')
  untick(@Param('taskKey') taskKey: string): Promise<ScheduledTask> {
    return this.prep.untick(taskKey);
  }

  @Roles(Role.Chef, Role.Staff)
  @Get('labels.pdf')
  async labels(@Query('date') date: unknown): Promise<StreamableFile> {
    const { date: day, labels } = await this.prep.labels(text(date));
    return new StreamableFile(await renderLabelsPdf(day, labels), {
      type: 'application/pdf',
      disposition: `inline; filename="component-labels-${day}.pdf"`,
    });
  }
}
