import { Body, Controller, HttpCode, Param, Post } from '@nestjs/common';
import type { FlagResponse } from '@lockstep/shared';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { ParseIdPipe } from '../common/pipes/parse-id.pipe.js';
import { AcknowledgeFlagDto } from './dto/acknowledge-flag.dto.js';
import { FlagsService } from './flags.service.js';

@Controller('flags')
export class FlagsController {
  constructor(private readonly flags: FlagsService) {}

  /** A flag stays open until someone caring for the patient says what was done. */
  @Post(':id/acknowledge')
  @HttpCode(200)
  @Roles('nurse', 'charge_nurse', 'prescriber', 'pharmacist')
  acknowledge(@Param('id', ParseIdPipe) id: number, @Body() body: AcknowledgeFlagDto, @CurrentUser() user: AuthUser): Promise<FlagResponse> {
    return this.flags.acknowledge(id, body.note, user);
  }
}
