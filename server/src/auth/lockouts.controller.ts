import { Controller, Delete, Get, HttpCode, Param } from '@nestjs/common';
import { ApiOperation } from '@nestjs/swagger';
import { ApiErrors } from '../common/openapi/api-errors.decorator.js';
import type { AuthUser } from './auth-user.js';
import { CurrentUser } from './decorators/current-user.decorator.js';
import { Roles } from './decorators/roles.decorator.js';
import { LockoutsService } from './lockouts.service.js';
import { type Lockout } from '@lockstep/shared';

/** Usernames and addresses locked after wrong passwords, and the admin's unlock. */
@Controller('auth/lockouts')
@Roles('admin')
export class LockoutsController {
  constructor(private readonly lockouts: LockoutsService) {}

  @ApiOperation({ summary: 'Usernames and network addresses locked after wrong passwords' })
  @Get()
  list(): Lockout[] {
    return this.lockouts.list();
  }

  @ApiOperation({ summary: 'Unlock a username' })
  @ApiErrors(404)
  @Delete('usernames/:username')
  @HttpCode(204)
  unlockUsername(@Param('username') username: string, @CurrentUser() admin: AuthUser): Promise<void> {
    return this.lockouts.unlock('username', username, admin);
  }

  @ApiOperation({ summary: 'Unlock a network address' })
  @ApiErrors(404)
  @Delete('addresses/:address')
  @HttpCode(204)
  unlockAddress(@Param('address') address: string, @CurrentUser() admin: AuthUser): Promise<void> {
    return this.lockouts.unlock('address', address, admin);
  }
}
