import { Body, Controller, Get, Headers, HttpCode, Param, Post, Query } from '@nestjs/common';
import { WARD_POLICY_APPROVER_ROLES, type WardPolicyChange } from '@lockstep/shared';
import { ApiHeader, ApiOperation } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { SignedRequestDto } from '../common/dto/signature.dto.js';
import { ApiErrors } from '../common/openapi/api-errors.decorator.js';
import { ParseIdPipe } from '../common/pipes/parse-id.pipe.js';
import { DeclineWardPolicyChangeDto, ProposeWardPolicyChangeDto, WardPolicyChangesQueryDto } from './dto/ward-policy-change.dto.js';
import { WardPolicyChangesService } from './ward-policy-changes.service.js';

/** The `Idempotency-Key` header every write takes; each route says what a repeat does. */
const idempotencyKey = (repeat: string) => ({
  name: 'Idempotency-Key',
  required: false,
  description: `Sent by the client with each write; ${repeat}`,
});

/** Changes to a ward's clinical settings: an admin proposes, a charge nurse or a pharmacist signs off or declines. */
@Controller('wards')
export class WardPolicyChangesController {
  constructor(private readonly changes: WardPolicyChangesService) {}

  @ApiOperation({ summary: 'Proposed changes to ward policies, newest first' })
  @Get('policy-changes')
  @Roles('admin', ...WARD_POLICY_APPROVER_ROLES)
  list(@Query() query: WardPolicyChangesQueryDto): Promise<WardPolicyChange[]> {
    return this.changes.list(query);
  }

  @ApiOperation({
    summary: 'Propose a change to a ward’s clinical settings (signed); it applies when a charge nurse or a pharmacist signs it off',
  })
  @ApiHeader(idempotencyKey('the same proposal sent again with the same key answers the change it made, and records nothing'))
  @ApiErrors(404, 409)
  @Post(':wardId/policy-changes')
  @Roles('admin')
  propose(
    @Param('wardId', ParseIdPipe) wardId: number,
    @Body() body: ProposeWardPolicyChangeDto,
    @CurrentUser() admin: AuthUser,
    @Headers('idempotency-key') key?: string,
  ): Promise<WardPolicyChange> {
    return this.changes.propose(wardId, body, admin, key);
  }

  @ApiOperation({
    summary: 'Sign off a proposed ward policy change (signed; a charge nurse or pharmacist who did not propose it): it applies',
  })
  @ApiHeader(idempotencyKey('a sign-off repeated after it succeeded is 409 (already applied), and nothing changes'))
  @ApiErrors(404, 409)
  @Post('policy-changes/:changeId/sign-off')
  @HttpCode(200)
  @Roles(...WARD_POLICY_APPROVER_ROLES)
  signOff(
    @Param('changeId', ParseIdPipe) changeId: number,
    @Body() body: SignedRequestDto,
    @CurrentUser() approver: AuthUser,
  ): Promise<WardPolicyChange> {
    return this.changes.signOff(changeId, body.signature.password, approver);
  }

  @ApiOperation({ summary: 'Decline a proposed ward policy change, with the reason (signed); nothing changes' })
  @ApiHeader(idempotencyKey('a decline repeated after it succeeded is 409 (already declined), and nothing changes'))
  @ApiErrors(404, 409)
  @Post('policy-changes/:changeId/decline')
  @HttpCode(200)
  @Roles(...WARD_POLICY_APPROVER_ROLES)
  decline(
    @Param('changeId', ParseIdPipe) changeId: number,
    @Body() body: DeclineWardPolicyChangeDto,
    @CurrentUser() approver: AuthUser,
  ): Promise<WardPolicyChange> {
    return this.changes.decline(changeId, body, approver);
  }
}
