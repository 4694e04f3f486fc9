import { Body, Controller, HttpCode, HttpStatus, Post } from '@nestjs/common';
import { ApiAcceptedResponse, ApiNoContentResponse, ApiTags } from '@nestjs/swagger';
import { normalizeIp, Throttle } from '@nestjs/throttler';
import type { Request } from 'express';
import { Public } from './decorators/public.decorator.js';
import {
  ConfirmPasswordResetDto,
  PasswordResetRequestedDto,
  RequestPasswordResetDto,
} from './dto/password-reset.dto.js';
import { PasswordResetService, RESET_REQUESTED_MESSAGE } from './password-reset.service.js';

/**
 * Link requests per address (OWASP ASVS 5.0 V6.3.1; QUALITY.md Abuse). Keyed on the client
 * address alone — not address and account as sign-in is — so one address cannot send links to
 * many accounts; each account is also capped at 3 e-mails an hour by the service.
 */
const requestLimit = {
  default: {
    limit: () => Number(process.env.PASSWORD_RESET_THROTTLE_LIMIT ?? 5),
    ttl: 15 * 60_000,
    getTracker: (req: Record<string, unknown>) =>
      normalizeIp((req as unknown as Request).ip ?? 'unknown'),
  },
};
/** New-password attempts per minute per address, like sign-in. */
const confirmLimit = {
  default: { limit: () => Number(process.env.AUTH_THROTTLE_LIMIT ?? 10), ttl: 60_000 },
};

@ApiTags('auth')
@Controller('auth/password-reset')
export class PasswordResetController {
  constructor(private readonly resets: PasswordResetService) {}

  /** Always 202 with the same body, in the same time, whether or not the address has an account. */
  @Public()
  @Throttle(requestLimit)
  @Post()
  @HttpCode(HttpStatus.ACCEPTED)
  @ApiAcceptedResponse({ type: PasswordResetRequestedDto })
  async request(@Body() body: RequestPasswordResetDto): Promise<PasswordResetRequestedDto> {
    await this.resets.request(body.email);
    return { message: RESET_REQUESTED_MESSAGE };
  }

  /** Sets the new password from the link's token; every session of the account ends. */
  @Public()
  @Throttle(confirmLimit)
  @Post('confirm')
  @HttpCode(HttpStatus.NO_CONTENT)
  @ApiNoContentResponse()
  confirm(@Body() body: ConfirmPasswordResetDto): Promise<void> {
    return this.resets.confirm(body.token, body.password);
  }
}
