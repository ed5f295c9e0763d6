import { randomUUID } from 'node:crypto';
import { Injectable, UnauthorizedException } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import type { LoginResponse, SessionProfile } from '@lockstep/shared';
import { PasswordAttemptsService } from '../common/throttling/password-attempts.service.js';
import { UsersService } from '../users/users.service.js';
import type { AuthUser, JwtPayload } from './auth-user.js';
import type { LoginDto } from './dto/login.dto.js';
import { TokenRevocationService } from './token-revocation.service.js';

/** One message for every failed sign-in, so nobody can learn which usernames exist. */
const BAD_CREDENTIALS = 'Username or password is incorrect';

@Injectable()
export class AuthService {
  constructor(
    private readonly users: UsersService,
    private readonly jwt: JwtService,
    private readonly attempts: PasswordAttemptsService,
    private readonly revocations: TokenRevocationService,
  ) {}

  async login({ username, password }: LoginDto): Promise<LoginResponse> {
    const name = username.trim();
    const user = await this.attempts.check(name, () => this.users.verifyCredentials(name, password));
    if (!user) throw new UnauthorizedException(BAD_CREDENTIALS);
    const payload: JwtPayload = { sub: user.id, username: user.username, role: user.role };
    return { accessToken: await this.jwt.signAsync(payload, { jwtid: randomUUID() }), user: await this.users.profile(user.id) };
  }

  profile(user: AuthUser): Promise<SessionProfile> {
    return this.users.profile(user.id);
  }

  /** `token` is the caller's own, already verified by the guard (so it has a `jti` and an `exp`). */
  async logout(user: AuthUser, token: string): Promise<void> {
    const { jti, exp } = this.jwt.decode<JwtPayload>(token);
    if (!jti || !exp) throw new UnauthorizedException('This session cannot be signed out');
    await this.revocations.revoke(user, { jti, expiresAt: new Date(exp * 1000) });
  }
}
