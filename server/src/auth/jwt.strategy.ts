import { createSecretKey } from 'node:crypto';
import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { PassportStrategy } from '@nestjs/passport';
import { ExtractJwt, Strategy } from 'passport-jwt';
import type { Env } from '../config/env.validation.js';
import { UsersService } from '../users/users.service.js';
import type { AuthUser, JwtPayload } from './auth-user.js';
import { TokenRevocationService } from './token-revocation.service.js';

@Injectable()
export class JwtStrategy extends PassportStrategy(Strategy) {
  constructor(
    config: ConfigService<Env, true>,
    private readonly users: UsersService,
    private readonly revocations: TokenRevocationService,
  ) {
    super({
      jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(),
      ignoreExpiration: false,
      // A key object, not the string: given a string, jsonwebtoken first tries (and fails) to read
      // it as a public key on every request, about 40 times the cost of the check itself. The
      // types say string | Buffer; jsonwebtoken takes a KeyObject too.
      secretOrKey: createSecretKey(Buffer.from(config.get('JWT_SECRET', { infer: true }))) as unknown as Buffer,
    });
  }

  /**
   * Refuses a session signed out of (and a token without a session id, which Lockstep never
   * issues), then reads the live row so a deactivated user or changed role takes effect at once.
   */
  async validate(payload: JwtPayload): Promise<AuthUser | null> {
    if (!payload.jti || (await this.revocations.isRevoked(payload.jti))) return null;
    const user = await this.users.findActiveSessionUser(payload.sub);
    return user ?? null;
  }
}
