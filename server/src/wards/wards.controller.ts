import { Body, Controller, Get, Param, Patch } from '@nestjs/common';
import { type Ward, type WardPolicySettings } from '@lockstep/shared';
import { ApiOperation } from '@nestjs/swagger';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { ApiErrors } from '../common/openapi/api-errors.decorator.js';
import { ParseIdPipe } from '../common/pipes/parse-id.pipe.js';
import { UpdateWardContactsDto } from './dto/update-ward-contacts.dto.js';
import { WardsService } from './wards.service.js';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';

@Controller('wards')
export class WardsController {
  constructor(private readonly wards: WardsService) {}

  @ApiOperation({ summary: 'Every ward' })
  @Get()
  list(): Promise<Ward[]> {
    return this.wards.list();
  }

  /** Observation intervals, escalation thresholds, syringe-low and reconciliation settings, e-mail addresses. */
  @ApiOperation({ summary: 'A ward’s monitoring and escalation settings and e-mail addresses' })
  @ApiErrors(404)
  @Get(':wardId/policy')
  policy(@Param('wardId', ParseIdPipe) wardId: number): Promise<WardPolicySettings> {
    return this.wards.policy(wardId);
  }

  /** Clinical settings change through a proposed change that a charge nurse or a pharmacist signs off (ward-policy-changes.controller.ts). */
  @ApiOperation({ summary: 'Change a ward’s e-mail addresses (clinical settings change through POST /api/wards/{wardId}/policy-changes)' })
  @ApiErrors(404)
  @Patch(':wardId/policy')
  @Roles('admin')
  updatePolicy(
    @Param('wardId', ParseIdPipe) wardId: number,
    @Body() body: UpdateWardContactsDto,
    @CurrentUser() admin: AuthUser,
  ): Promise<WardPolicySettings> {
    return this.wards.updatePolicy(wardId, body, admin);
  }
}
