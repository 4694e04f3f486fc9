import { ApiProperty } from '@nestjs/swagger';
import { Role, type AuthSession, type AuthUser } from '@nappe/shared';

export class AuthUserDto implements AuthUser {
  @ApiProperty() id: string;
  @ApiProperty() email: string;
  @ApiProperty() name: string;
  @ApiProperty({ enum: Role, enumName: 'Role' }) role: Role;
}

export class AuthSessionDto implements AuthSession {
  @ApiProperty() accessToken: string;
  @ApiProperty({ enum: ['Bearer'] }) tokenType: 'Bearer';
  @ApiProperty({ description: 'Seconds until the access token expires' }) expiresIn: number;
  @ApiProperty({ type: AuthUserDto }) user: AuthUserDto;
}
