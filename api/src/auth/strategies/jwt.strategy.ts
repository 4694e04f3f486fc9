import { createSecretKey } from 'node:crypto';
import { Injectable, UnauthorizedException } from '@nestjs/common';
import { PassportStrategy } from '@nestjs/passport';
import { ExtractJwt, Strategy } from 'passport-jwt';
import { Env } from '../../config/env.js';
import { AuthService } from '../auth.service.js';
import { JWT_AUDIENCE, JWT_ISSUER, type AccessTokenClaims, type Principal } from '../principal.js';

/**
 * Access tokens: HS256 only (an explicit allow-list, so `alg: none` and key confusion fail),
 * our issuer and audience, not expired, read from the Authorization header only. The session
 * and the user are loaded on every request, so logout and role changes apply at once.
 */
@Injectable()
export class JwtStrategy extends PassportStrategy(Strategy, 'jwt') {
  constructor(
    env: Env,
    private readonly auth: AuthService,
  ) {
    super({
      jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(),
      // A KeyObject made once: given a string, jsonwebtoken first tries it as a public key and
      // builds the secret key only after that throws — on every request (3 % of the CPU of a
      // booking under load, measured with --cpu-prof). jsonwebtoken takes a KeyObject; the
      // passport-jwt types say string | Buffer only.
      secretOrKey: createSecretKey(Buffer.from(env.JWT_SECRET, 'utf8')) as unknown as Buffer,
      algorithms: ['HS256'],
      issuer: JWT_ISSUER,
      audience: JWT_AUDIENCE,
      ignoreExpiration: false,
    });
  }

  async validate(claims: AccessTokenClaims): Promise<Principal> {
    if (typeof claims.sub !== 'string' || typeof claims.sid !== 'string')
      throw new UnauthorizedException();
    const principal = await this.auth.principalFor(claims);
    if (!principal) throw new UnauthorizedException('Your session has ended. Sign in again.');
    return principal;
  }
}
