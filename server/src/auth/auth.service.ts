import { Injectable, UnauthorizedException } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import type { LoginResponse } from '@lockstep/shared';
import { PasswordAttemptsService } from '../common/throttling/password-attempts.service.js';
import { UsersService } from '../users/users.service.js';
import type { JwtPayload } from './auth-user.js';
import type { LoginDto } from './dto/login.dto.js';

/** One message for every failed sign-in, so nobody can learn which usernames exist. */
export const BAD_CREDENTIALS = 'Username or password is incorrect';

@Injectable()
export class AuthService {
  constructor(
    private readonly users: UsersService,
    private readonly jwt: JwtService,
    private readonly attempts: PasswordAttemptsService,
  ) {}

  async login({ username, password }: LoginDto): Promise<LoginResponse> {
    const name = username.trim();
    const user = await this.attempts.check(name, () => this.users.verifyCredentials(name, password));
    if (!user) throw new UnauthorizedException(BAD_CREDENTIALS);
    const payload: JwtPayload = { sub: user.id, username: user.username, role: user.role };
    return { accessToken: await this.jwt.signAsync(payload), user };
  }
}
