import { Body, Controller, Get, Param, Post, Query } from '@nestjs/common';
import { ApiOperation } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { ApiErrors } from '../common/openapi/api-errors.decorator.js';
import { ParseIdPipe } from '../common/pipes/parse-id.pipe.js';
import { CreateObservationDto } from './dto/create-observation.dto.js';
import { UsageQueryDto } from './dto/usage-query.dto.js';
import { ObservationsService } from './observations.service.js';
import { UsageService } from './usage.service.js';
import { BEDSIDE_ROLES, type ObservationResponse, type RecordedObservation, type UsageResponse } from '@lockstep/shared';

@Controller('orders/:orderId')
export class ObservationsController {
  constructor(
    private readonly observations: ObservationsService,
    private readonly usageService: UsageService,
  ) {}

  @ApiOperation({ summary: 'Record an observation; the answer lists the flags it raised' })
  @ApiErrors(404, 409)
  @Post('observations')
  @Roles(...BEDSIDE_ROLES)
  record(
    @Param('orderId', ParseIdPipe) orderId: number,
    @Body() body: CreateObservationDto,
    @CurrentUser() user: AuthUser,
  ): Promise<RecordedObservation> {
    return this.observations.record(orderId, body, user);
  }

  @ApiOperation({ summary: 'An order’s observations, oldest first' })
  @ApiErrors(404)
  @Get('observations')
  list(@Param('orderId', ParseIdPipe) orderId: number): Promise<ObservationResponse[]> {
    return this.observations.list(orderId);
  }

  @ApiOperation({ summary: 'Attempts, doses delivered and volume over the last hours' })
  @ApiErrors(404)
  @Get('usage')
  usage(@Param('orderId', ParseIdPipe) orderId: number, @Query() query: UsageQueryDto): Promise<UsageResponse> {
    return this.usageService.usage(orderId, query.hours ?? 24);
  }
}
