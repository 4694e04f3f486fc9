import { ApiProperty } from '@nestjs/swagger';
import { EMAIL_MAX_LENGTH, PASSWORD_MAX_LENGTH } from '@nappe/shared';
import { Transform } from 'class-transformer';
import { IsEmail, IsString, MaxLength, MinLength } from 'class-validator';

const trimLower = ({ value }: { value: unknown }): unknown =>
  typeof value === 'string' ? value.trim().toLowerCase() : value;

export class LoginDto {
  @ApiProperty({ example: 'chef@nappe.test' })
  @Transform(trimLower)
  @IsEmail({}, { message: 'Enter an e-mail address like name@example.com.' })
  @MaxLength(EMAIL_MAX_LENGTH)
  email: string;

  @ApiProperty({ example: 'plated-demo-2026' })
  @IsString()
  @MinLength(1, { message: 'Enter your password.' })
  @MaxLength(PASSWORD_MAX_LENGTH)
  password: string;
}
