import {
  Body,
  Controller,
  Delete,
  Get,
  Header,
  HttpCode,
  HttpStatus,
  Res,
  StreamableFile,
} from '@nestjs/common';
import {
  ApiBearerAuth,
  ApiBody,
  ApiConflictResponse,
  ApiForbiddenResponse,
  ApiOkResponse,
  ApiOperation,
  ApiProduces,
  ApiTags,
} from '@nestjs/swagger';
import { Throttle } from '@nestjs/throttler';
import { Role } from '@nappe/shared';
import type { Response } from 'express';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { REFRESH_COOKIE, REFRESH_COOKIE_PATH, type Principal } from '../auth/principal.js';
import { ZodValidationPipe } from '../common/zod-validation.pipe.js';
import { Env } from '../config/env.js';
import { AccountDeletionService } from './account-deletion.service.js';
import { AccountExportService } from './account-export.service.js';
import { deleteAccountBodySchema, type DeleteAccountBody } from './privacy.dto.js';
import type { AccountDeletionResult } from './privacy.types.js';

/** Password confirmations per minute for one address and account, like sign-in (ASVS V6.3.1). */
const confirmLimit = {
  default: { limit: () => Number(process.env.AUTH_THROTTLE_LIMIT ?? 10), ttl: 60_000 },
};

/** The signed-in client's own data: a copy of it (GDPR Art. 15/20) and erasure (Art. 17). */
@ApiTags('my data')
@ApiBearerAuth()
@Controller('me')
export class AccountController {
  constructor(
    private readonly exports: AccountExportService,
    private readonly deletion: AccountDeletionService,
    private readonly env: Env,
  ) {}

  @Roles(Role.Client)
  @Get('export')
  @Header('Cache-Control', 'no-store')
  @ApiOperation({
    summary: 'Download everything held about me (JSON attachment)',
    description:
      'Account, sessions, consents, orders with their guests (while held), payments and refunds, audit trail, openings of guest data by the studio, e-mails sent. Nothing about other clients.',
  })
  @ApiProduces('application/json')
  @ApiOkResponse({ description: 'A JSON file, sent with Content-Disposition: attachment.' })
  async export(@CurrentUser() user: Principal): Promise<StreamableFile> {
    const { filename, data } = await this.exports.export(user);
    return new StreamableFile(Buffer.from(`${JSON.stringify(data, null, 2)}\n`, 'utf8'), {
      type: 'application/json; charset=utf-8',
      disposition: `attachment; filename="${filename}"`,
    });
  }

  @Roles(Role.Client)
  @Throttle(confirmLimit)
  @Delete()
  @HttpCode(HttpStatus.OK)
  @ApiOperation({
    summary: 'Delete my account',
    description:
      'Erases name, e-mail, password, sessions, guest details and each booking’s contact details; keeps payments and refunds with an anonymous reference (the studio’s bookkeeping duty). Signs out everywhere.',
  })
  @ApiBody({
    schema: {
      type: 'object',
      required: ['password'],
      properties: { password: { type: 'string', description: 'The current password' } },
    },
  })
  @ApiOkResponse({ description: 'Deleted: what was erased and what is kept, and why.' })
  @ApiForbiddenResponse({ description: 'The password is not the current one; nothing changed.' })
  @ApiConflictResponse({
    description:
      'An upcoming booking (requested, confirmed, or a checkout still open) blocks deletion: cancel it first. The body lists them in `upcoming`.',
  })
  async remove(
    @CurrentUser() user: Principal,
    @Body(new ZodValidationPipe(deleteAccountBodySchema)) body: DeleteAccountBody,
    @Res({ passthrough: true }) res: Response,
  ): Promise<AccountDeletionResult> {
    const result = await this.deletion.delete(user, body.password);
    res.clearCookie(REFRESH_COOKIE, {
      httpOnly: true,
      secure: this.env.COOKIE_SECURE,
      sameSite: 'strict',
      path: REFRESH_COOKIE_PATH,
    });
    res.setHeader('Cache-Control', 'no-store');
    return result;
  }
}
