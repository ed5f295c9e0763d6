import { Body, Controller, Get, HttpCode, Post, Req } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { Request } from 'express';
import { ExtractJwt } from 'passport-jwt';
import type { DemoAccounts, LoginResponse, SessionProfile } from '@lockstep/shared';
import { ApiOperation } from '@nestjs/swagger';
import { ApiError } from '../common/openapi/api-errors.decorator.js';
import type { Env } from '../config/env.validation.js';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '../database/seed/demo-staff.js';
import type { AuthUser } from './auth-user.js';
import { AuthService } from './auth.service.js';
import { CurrentUser } from './decorators/current-user.decorator.js';
import { Public } from './decorators/public.decorator.js';
import { LoginDto } from './dto/login.dto.js';

@Controller('auth')
export class AuthController {
  constructor(
    private readonly auth: AuthService,
    private readonly config: ConfigService<Env, true>,
  ) {}

  @ApiOperation({ summary: 'Sign in: a bearer token for every other route' })
  @ApiError(401, 'The username or password is wrong')
  @Public()
  @Post('login')
  @HttpCode(200)
  login(@Body() body: LoginDto): Promise<LoginResponse> {
    return this.auth.login(body);
  }

  @ApiOperation({ summary: 'Sign out: this session’s token is refused from now on' })
  @Post('logout')
  @HttpCode(204)
  async logout(@CurrentUser() user: AuthUser, @Req() request: Request): Promise<void> {
    await this.auth.logout(user, ExtractJwt.fromAuthHeaderAsBearerToken()(request) ?? '');
  }

  @ApiOperation({ summary: 'The signed-in user, with the wards they are assigned to' })
  @Get('me')
  me(@CurrentUser() user: AuthUser): Promise<SessionProfile> {
    return this.auth.profile(user);
  }

  /** Lets the sign-in page offer the demo accounts; empty outside demo mode. */
  @ApiOperation({ summary: 'The demo accounts and their password for the sign-in page; empty unless DEMO=true' })
  @Public()
  @Get('demo-accounts')
  demoAccounts(): DemoAccounts {
    if (!this.config.get('DEMO', { infer: true })) return { demo: false, password: null, accounts: [] };
    return { demo: true, password: DEMO_PASSWORD, accounts: DEMO_ACCOUNTS };
  }
}
