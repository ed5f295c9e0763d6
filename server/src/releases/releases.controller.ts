import { Body, Controller, Param, Post } from '@nestjs/common';
import { PHARMACY_ROLES, type SyringeReleaseResponse } from '@lockstep/shared';
import { ApiOperation } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { ApiErrors } from '../common/openapi/api-errors.decorator.js';
import { ParseIdPipe } from '../common/pipes/parse-id.pipe.js';
import { CreateReleaseDto } from './dto/create-release.dto.js';
import { ReleasesService } from './releases.service.js';

@Controller('orders/:orderId/releases')
export class ReleasesController {
  constructor(private readonly releases: ReleasesService) {}

  @ApiOperation({ summary: 'Release a labelled syringe for a verified or active order' })
  @ApiErrors(404, 409)
  @Post()
  @Roles(...PHARMACY_ROLES)
  release(
    @Param('orderId', ParseIdPipe) orderId: number,
    @Body() body: CreateReleaseDto,
    @CurrentUser() user: AuthUser,
  ): Promise<SyringeReleaseResponse> {
    return this.releases.release(orderId, body, user);
  }
}
