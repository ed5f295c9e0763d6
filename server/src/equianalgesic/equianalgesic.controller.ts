import { Body, Controller, Get, Param, Put } from '@nestjs/common';
import { EQUIANALGESIC_ROUTES, PHARMACY_ROLES, type EquianalgesicFactor, type EquianalgesicRoute } from '@lockstep/shared';
import { ApiHeader, ApiOperation, ApiParam } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { ApiErrors } from '../common/openapi/api-errors.decorator.js';
import { ParseIdPipe } from '../common/pipes/parse-id.pipe.js';
import { UpdateEquianalgesicFactorDto } from './dto/update-equianalgesic-factor.dto.js';
import { ParseEquianalgesicRoutePipe } from './equianalgesic-route.pipe.js';
import { EquianalgesicService } from './equianalgesic.service.js';

@Controller('equianalgesic-factors')
export class EquianalgesicController {
  constructor(private readonly factors: EquianalgesicService) {}

  @ApiOperation({ summary: 'Pharmacy’s equianalgesic table: each factor with its source and who changed it when' })
  @Get()
  list(): Promise<EquianalgesicFactor[]> {
    return this.factors.list();
  }

  @ApiOperation({
    summary: 'Set a drug’s factor for a route (signed by a pharmacist); sending what the row holds changes nothing',
  })
  @ApiParam({ name: 'route', enum: EQUIANALGESIC_ROUTES })
  @ApiHeader({
    name: 'Idempotency-Key',
    required: false,
    description: 'Sent by the client with each write; the same change sent again changes and records nothing',
  })
  @ApiErrors(404, 409)
  @Put(':drugId/:route')
  @Roles(...PHARMACY_ROLES)
  update(
    @Param('drugId', ParseIdPipe) drugId: number,
    @Param('route', ParseEquianalgesicRoutePipe) route: EquianalgesicRoute,
    @Body() body: UpdateEquianalgesicFactorDto,
    @CurrentUser() user: AuthUser,
  ): Promise<EquianalgesicFactor> {
    return this.factors.update(drugId, route, body, user);
  }
}
