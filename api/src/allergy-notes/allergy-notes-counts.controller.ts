import { Controller, Get, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiQuery, ApiTags } from '@nestjs/swagger';
import { Role, type AllergyCounts } from '@nappe/shared';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { ZodValidationPipe } from '../common/zod-validation.pipe.js';
import { allergyCountsQuerySchema } from './allergy-notes.dto.js';
import { AllergyNotesService } from './allergy-notes.service.js';

/**
 * `GET /api/allergy-notes/counts?orderIds=a,b,c` (chef, staff): for the Allergy notes list, how
 * many guests of each order have requirements and how many plates still conflict — numbers only.
 */
@ApiTags('allergy notes')
@ApiBearerAuth()
@Controller('allergy-notes')
export class AllergyNotesCountsController {
  constructor(private readonly notes: AllergyNotesService) {}

  @Roles(Role.Chef, Role.Staff)
  @Get('counts')
  @ApiQuery({ name: 'orderIds', description: 'Order ids, comma-separated (at most 100).' })
  counts(
    @Query('orderIds', new ZodValidationPipe(allergyCountsQuerySchema)) orderIds: string[],
  ): Promise<AllergyCounts[]> {
    return this.notes.counts(orderIds);
  }
}
