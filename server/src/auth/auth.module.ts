import { Module } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { APP_GUARD } from '@nestjs/core';
import { JwtModule } from '@nestjs/jwt';
import { PassportModule } from '@nestjs/passport';
import { PasswordRateGuard } from '../common/throttling/password-rate.guard.js';
import { ThrottlingModule } from '../common/throttling/throttling.module.js';
import type { Env } from '../config/env.validation.js';
import { UsersModule } from '../users/users.module.js';
import { AuthController } from './auth.controller.js';
import { AuthService } from './auth.service.js';
import { JwtAuthGuard } from './guards/jwt-auth.guard.js';
import { RolesGuard } from './guards/roles.guard.js';
import { JwtStrategy } from './jwt.strategy.js';
import { TokenRevocationService } from './token-revocation.service.js';
import { LockoutsController } from './lockouts.controller.js';
import { LockoutsService } from './lockouts.service.js';

@Module({
  imports: [
    UsersModule,
    ThrottlingModule,
    PassportModule,
    JwtModule.registerAsync({
      inject: [ConfigService],
      useFactory: (config: ConfigService<Env, true>) => ({
        secret: config.get('JWT_SECRET', { infer: true }),
        signOptions: { expiresIn: config.get('JWT_EXPIRES_IN_SECONDS', { infer: true }) },
      }),
    }),
  ],
  controllers: [AuthController, LockoutsController],
  providers: [
    AuthService,
    LockoutsService,
    TokenRevocationService,
    JwtStrategy,
    // Order matters: limit password-carrying requests before any work, authenticate, then check the role.
    { provide: APP_GUARD, useClass: PasswordRateGuard },
    { provide: APP_GUARD, useClass: JwtAuthGuard },
    { provide: APP_GUARD, useClass: RolesGuard },
  ],
})
export class AuthModule {}
