import { ApiProperty } from '@nestjs/swagger';
import { EMAIL_MAX_LENGTH, PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH } from '@nappe/shared';
import { Transform } from 'class-transformer';
import { IsEmail, IsString, Matches, MaxLength } from 'class-validator';
import { CodePointLength, PASSWORD_LENGTH_MESSAGE } from './register.dto.js';

/** The one answer to a link that cannot be used, whatever the reason (unknown, expired, used, replaced). */
export const RESET_LINK_UNUSABLE_MESSAGE =
  'This reset link has expired or was already used. Ask for a new one.';

/** The token in the link: 32 random bytes in base64url, no padding (RFC 4648 §5) — 43 characters. */
export const RESET_TOKEN_PATTERN = /^[A-Za-z0-9_-]{43}$/;

export class RequestPasswordResetDto {
  @ApiProperty({ example: 'imogen@example.com' })
  @Transform(({ value }: { value: unknown }) =>
    typeof value === 'string' ? value.trim().toLowerCase() : value,
  )
  @IsEmail({}, { message: 'Enter an e-mail address like name@example.com.' })
  @MaxLength(EMAIL_MAX_LENGTH)
  email: string;
}

/** The new password follows exactly the registration rules (length here, guessability in the service). */
export class ConfirmPasswordResetDto {
  @ApiProperty({ description: 'The token from the link in the e-mail' })
  @IsString({ message: RESET_LINK_UNUSABLE_MESSAGE })
  @Matches(RESET_TOKEN_PATTERN, { message: RESET_LINK_UNUSABLE_MESSAGE })
  token: string;

  @ApiProperty({ minLength: PASSWORD_MIN_LENGTH, maxLength: PASSWORD_MAX_LENGTH })
  @IsString()
  @CodePointLength(PASSWORD_MIN_LENGTH, PASSWORD_MAX_LENGTH, { message: PASSWORD_LENGTH_MESSAGE })
  password: string;
}

/** The same body for every request, whether or not an account uses the address. */
export class PasswordResetRequestedDto {
  @ApiProperty() message: string;
}
