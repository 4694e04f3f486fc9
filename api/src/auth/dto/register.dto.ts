import { ApiProperty } from '@nestjs/swagger';
import {
  EMAIL_MAX_LENGTH,
  NAME_MAX_LENGTH,
  PASSWORD_MAX_LENGTH,
  PASSWORD_MIN_LENGTH,
  passwordLength,
} from '@nappe/shared';
import { Transform } from 'class-transformer';
import {
  IsEmail,
  IsString,
  Matches,
  MaxLength,
  MinLength,
  registerDecorator,
  type ValidationOptions,
} from 'class-validator';

/** What registration (and choosing a new password) says about a password's length. */
export const PASSWORD_LENGTH_MESSAGE = `Use at least ${PASSWORD_MIN_LENGTH} characters (at most ${PASSWORD_MAX_LENGTH}) — a few words make a good passphrase.`;

/** Length in Unicode code points (what a person counts), per the shared password rule. */
export function CodePointLength(
  min: number,
  max: number,
  options?: ValidationOptions,
): PropertyDecorator {
  return (target, propertyName) =>
    registerDecorator({
      name: 'codePointLength',
      target: target.constructor,
      propertyName: propertyName as string,
      options: {
        message: `password must be between ${min} and ${max} characters`,
        ...options,
      },
      validator: {
        validate: (value: unknown) =>
          typeof value === 'string' && passwordLength(value) >= min && passwordLength(value) <= max,
      },
    });
}

export class RegisterDto {
  @ApiProperty({ example: 'Imogen Vale', maxLength: NAME_MAX_LENGTH })
  @Transform(({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value))
  @IsString()
  @MinLength(1, { message: 'Tell us your name.' })
  @MaxLength(NAME_MAX_LENGTH)
  @Matches(/^[^\r\n]*$/, { message: 'The name must fit on one line.' })
  name: string;

  @ApiProperty({ example: 'imogen@example.com' })
  @Transform(({ value }: { value: unknown }) =>
    typeof value === 'string' ? value.trim().toLowerCase() : value,
  )
  @IsEmail({}, { message: 'Enter an e-mail address like name@example.com.' })
  @MaxLength(EMAIL_MAX_LENGTH)
  email: string;

  @ApiProperty({ minLength: PASSWORD_MIN_LENGTH, maxLength: PASSWORD_MAX_LENGTH })
  @IsString()
  @CodePointLength(PASSWORD_MIN_LENGTH, PASSWORD_MAX_LENGTH, { message: PASSWORD_LENGTH_MESSAGE })
  password: string;
}
