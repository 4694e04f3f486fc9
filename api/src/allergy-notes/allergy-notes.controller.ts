import {
  Body,
  Controller,
  Delete,
  Get,
  Param,
  ParseIntPipe,
  Put,
  StreamableFile,
} from '@nestjs/common';
import { ApiBearerAuth, ApiGoneResponse, ApiTags } from '@nestjs/swagger';
import { GUEST_DETAILS_GONE } from '../privacy/guest-retention.js';
import {
  Role,
  type AccessLogEntry,
  type AllergyNotes,
  type Briefing,
  type GuestNote,
} from '@nappe/shared';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import type { Principal } from '../auth/principal.js';
import { ZodValidationPipe } from '../common/zod-validation.pipe.js';
import { substitutionBodySchema, type SubstitutionBody } from './allergy-notes.dto.js';
import { AllergyNotesService } from './allergy-notes.service.js';

/**
 * Allergy notes of an order: the client who entered the guests, the chef and staff read them;
 * the chef records substitutions. Every opening by the studio is logged.
 */
@ApiTags('allergy notes')
@ApiBearerAuth()
@Controller('orders')
export class AllergyNotesController {
  constructor(private readonly notes: AllergyNotesService) {}

  @Roles(Role.Client, Role.Chef, Role.Staff)
  @Get(':id/allergy-notes')
  @ApiGoneResponse(GUEST_DETAILS_GONE)
  get(@CurrentUser() user: Principal, @Param('id') id: string): Promise<AllergyNotes> {
    return this.notes.notes(user, id);
  }

  @Roles(Role.Chef)
  @Put(':id/guests/:guestId/substitutions/:dessertId')
  @ApiGoneResponse(GUEST_DETAILS_GONE)
  put(
    @CurrentUser() user: Principal,
    @Param('id') id: string,
    @Param('guestId', ParseIntPipe) guestId: number,
    @Param('dessertId') dessertId: string,
    @Body(new ZodValidationPipe(substitutionBodySchema)) body: SubstitutionBody,
  ): Promise<GuestNote> {
    return this.notes.putSubstitution(user, id, guestId, dessertId, body);
  }

  @Roles(Role.Chef)
  @Delete(':id/guests/:guestId/substitutions/:dessertId')
  @ApiGoneResponse(GUEST_DETAILS_GONE)
  remove(
    @CurrentUser() user: Principal,
    @Param('id') id: string,
    @Param('guestId', ParseIntPipe) guestId: number,
    @Param('dessertId') dessertId: string,
  ): Promise<GuestNote> {
    return this.notes.deleteSubstitution(user, id, guestId, dessertId);
  }

  @Roles(Role.Chef, Role.Staff)
  @Get(':id/briefing')
  @ApiGoneResponse(GUEST_DETAILS_GONE)
  briefing(@CurrentUser() user: Principal, @Param('id') id: string): Promise<Briefing> {
    return this.notes.briefing(user, id);
  }

  @Roles(Role.Chef, Role.Staff)
  @Get(':id/briefing.pdf')
  @ApiGoneResponse(GUEST_DETAILS_GONE)
  async briefingPdf(
    @CurrentUser() user: Principal,
    @Param('id') id: string,
  ): Promise<StreamableFile> {
    const doc = await this.notes.briefingPdf(user, id);
    return new StreamableFile(doc.content, {
      type: 'application/pdf',
      disposition: `inline; filename="${doc.filename}"`,
    });
  }

  @Roles(Role.Chef)
  @Get(':id/access-log')
  accessLog(@CurrentUser() user: Principal, @Param('id') id: string): Promise<AccessLogEntry[]> {
    return this.notes.accessLog(user, id);
  }
}
