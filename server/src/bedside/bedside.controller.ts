import { Body, Controller, HttpCode, Param, Post } from '@nestjs/common';
import {
  BEDSIDE_ROLES,
  type BolusResponse,
  type DiscontinueResponse,
  type FirstCheckResponse,
  type SecondCheckResponse,
  type SyringeChangeResponse,
} from '@lockstep/shared';
import { ApiOperation } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { ApiErrors } from '../common/openapi/api-errors.decorator.js';
import { ParseIdPipe } from '../common/pipes/parse-id.pipe.js';
import { BedsideChecksService } from './bedside-checks.service.js';
import { BolusesService } from './boluses.service.js';
import { BolusDto, DiscontinueDto, SyringeChangeDto } from './dto/bedside-actions.dto.js';
import { FirstCheckDto, SecondCheckDto } from './dto/bedside-check.dto.js';
import { SyringeEndService } from './syringe-end.service.js';

/** What nurses do at the bedside. Every route needs a second nurse's signature in the body. */
@Controller('orders/:orderId')
@Roles(...BEDSIDE_ROLES)
export class BedsideController {
  constructor(
    private readonly checks: BedsideChecksService,
    private readonly boluses: BolusesService,
    private readonly syringeEnds: SyringeEndService,
  ) {}

  @ApiOperation({ summary: 'First check: the patient’s wristband, the syringe’s release code and the pump settings' })
  @ApiErrors(404, 409)
  @Post('bedside-checks')
  first(
    @Param('orderId', ParseIdPipe) orderId: number,
    @Body() body: FirstCheckDto,
    @CurrentUser() user: AuthUser,
  ): Promise<FirstCheckResponse> {
    return this.checks.first(orderId, body, user);
  }

  @ApiOperation({ summary: 'Second check by a second nurse on the same screen; a full match starts the PCA' })
  @ApiErrors(404, 409)
  @Post('bedside-checks/:checkId/second')
  @HttpCode(200)
  second(
    @Param('orderId', ParseIdPipe) orderId: number,
    @Param('checkId', ParseIdPipe) checkId: number,
    @Body() body: SecondCheckDto,
  ): Promise<SecondCheckResponse> {
    return this.checks.second(orderId, checkId, body);
  }

  @ApiOperation({
    summary: 'Give a clinician bolus, with a witness',
    description:
      "Refused (409, \"contact the prescriber\") when the latest observation shows sedation 3 or 4, an urgent sedation or breathing flag is open, or the bolus would take the hour's or 4 hours' total over the order's limit (shared bolus checks).",
  })
  @ApiErrors(404, 409)
  @Post('boluses')
  bolus(@Param('orderId', ParseIdPipe) orderId: number, @Body() body: BolusDto, @CurrentUser() user: AuthUser): Promise<BolusResponse> {
    return this.boluses.give(orderId, body, user);
  }

  @ApiOperation({ summary: 'Change the syringe, with witnessed waste and reconciliation' })
  @ApiErrors(404, 409)
  @Post('syringe-changes')
  syringeChange(
    @Param('orderId', ParseIdPipe) orderId: number,
    @Body() body: SyringeChangeDto,
    @CurrentUser() user: AuthUser,
  ): Promise<SyringeChangeResponse> {
    return this.syringeEnds.change(orderId, body, user);
  }

  /** A nurse acting on the prescriber's decision; the reason records it. */
  @ApiOperation({ summary: 'Discontinue the PCA, with witnessed waste and reconciliation' })
  @ApiErrors(404, 409)
  @Post('discontinue')
  @HttpCode(200)
  discontinue(
    @Param('orderId', ParseIdPipe) orderId: number,
    @Body() body: DiscontinueDto,
    @CurrentUser() user: AuthUser,
  ): Promise<DiscontinueResponse> {
    return this.syringeEnds.discontinue(orderId, body, user);
  }
}
