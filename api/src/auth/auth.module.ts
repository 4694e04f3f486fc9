import { Module } from '@nestjs/common';
import { JwtModule } from '@nestjs/jwt';
import { PassportModule } from '@nestjs/passport';
import { TypeOrmModule } from '@nestjs/typeorm';
import { Env } from '../config/env.js';
import { MailModule } from '../mail/mail.module.js';
import { User } from '../users/entities/user.entity.js';
import { AuthController } from './auth.controller.js';
import { AuthService } from './auth.service.js';
import { AuthSession } from './entities/auth-session.entity.js';
import { PasswordResetTokenEntity } from './entities/password-reset-token.entity.js';
import { PasswordResetController } from './password-reset.controller.js';
import { PasswordResetService } from './password-reset.service.js';
import { PasswordService } from './password.service.js';
import { JWT_AUDIENCE, JWT_ISSUER } from './principal.js';
import { JwtStrategy } from './strategies/jwt.strategy.js';

@Module({
  imports: [
    PassportModule,
    TypeOrmModule.forFeature([User, AuthSession, PasswordResetTokenEntity]),
    MailModule,
    JwtModule.registerAsync({
      inject: [Env],
      useFactory: (env: Env) => ({
        secret: env.JWT_SECRET,
        signOptions: {
          algorithm: 'HS256',
          expiresIn: env.JWT_ACCESS_TTL_SECONDS,
          issuer: JWT_ISSUER,
          audience: JWT_AUDIENCE,
        },
        verifyOptions: { algorithms: ['HS256'], issuer: JWT_ISSUER, audience: JWT_AUDIENCE },
      }),
    }),
  ],
  controllers: [AuthController, PasswordResetController],
  providers: [AuthService, PasswordService, JwtStrategy, PasswordResetService],
  exports: [AuthService, PasswordService],
})
export class AuthModule {}
