import { Global, Module } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { ThrottlerModule } from '@nestjs/throttler';
import type { Env } from '../../config/env.validation.js';
import { PasswordAttemptsService } from './password-attempts.service.js';

/** Global so UsersService can count signature failures without its module importing this one. */
@Global()
@Module({
  imports: [
    ThrottlerModule.forRootAsync({
      inject: [ConfigService],
      useFactory: (config: ConfigService<Env, true>) => ({
        throttlers: [{ name: 'password-requests', ttl: 60_000, limit: config.get('PASSWORD_REQUESTS_PER_MINUTE', { infer: true }) }],
        // Only the 429 says anything: no X-RateLimit headers on every sign-in.
        setHeaders: false,
      }),
    }),
  ],
  providers: [PasswordAttemptsService],
  exports: [PasswordAttemptsService, ThrottlerModule],
})
export class ThrottlingModule {}
