import { Body, Controller, HttpCode, Param, Post } from '@nestjs/common';
import { CLINICAL_ROLES, type FlagResponse } from '@lockstep/shared';
import { ApiOperation } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { ApiErrors } from '../common/openapi/api-errors.decorator.js';
import { ParseIdPipe } from '../common/pipes/parse-id.pipe.js';
import { AcknowledgeFlagDto } from './dto/acknowledge-flag.dto.js';
import { FlagsService } from './flags.service.js';

@Controller('flags')
export class FlagsController {
  constructor(private readonly flags: FlagsService) {}

  /** A flag stays open until someone caring for the patient says what was done. */
  @ApiOperation({ summary: 'Acknowledge a flag, saying what was done' })
  @ApiErrors(404, 409)
  @Post(':id/acknowledge')
  @HttpCode(200)
  @Roles(...CLINICAL_ROLES)
  acknowledge(
    @Param('id', ParseIdPipe) id: number,
    @Body() body: AcknowledgeFlagDto,
    @CurrentUser() user: AuthUser,
  ): Promise<FlagResponse> {
    return this.flags.acknowledge(id, body.note, user);
  }
}
