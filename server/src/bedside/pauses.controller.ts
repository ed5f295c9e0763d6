import { Body, Controller, Get, HttpCode, Param, Post } from '@nestjs/common';
import { BEDSIDE_ROLES, type PcaPauseState } from '@lockstep/shared';
import { ApiHeader, ApiOperation } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { ApiErrors } from '../common/openapi/api-errors.decorator.js';
import { ParseIdPipe } from '../common/pipes/parse-id.pipe.js';
import { NaloxoneDto, PauseDto, ResumeDto } from './dto/pause.dto.js';
import { PausesService } from './pauses.service.js';

/** The `Idempotency-Key` header every write takes: on a POST the same key replays the first answer (common/idempotency/); each route says what a repeat without it does. */
const idempotencyKey = (repeat: string) => ({
  name: 'Idempotency-Key',
  required: false,
  description: `Sent by the client with each write; ${repeat}`,
});

/** Pausing a running PCA, naloxone given (which pauses it), and the two-nurse resume. */
@Controller('orders/:orderId')
export class PausesController {
  constructor(private readonly pauses: PausesService) {}

  @ApiOperation({ summary: 'Whether the PCA is paused, its pauses and naloxone given, newest first' })
  @Get('pause')
  state(@Param('orderId', ParseIdPipe) orderId: number): Promise<PcaPauseState> {
    return this.pauses.state(orderId);
  }

  @ApiOperation({
    summary: 'Record naloxone given, signed with the nurse’s password: pauses the PCA, raises an urgent flag, e-mails the prescriber',
  })
  @ApiHeader(idempotencyKey('a repeat records a second dose: check the pauses list before retrying'))
  @ApiErrors(404, 409)
  @Roles(...BEDSIDE_ROLES)
  @Post('naloxone')
  naloxone(
    @Param('orderId', ParseIdPipe) orderId: number,
    @Body() body: NaloxoneDto,
    @CurrentUser() user: AuthUser,
  ): Promise<PcaPauseState> {
    return this.pauses.naloxone(orderId, body, user);
  }

  @ApiOperation({ summary: 'Pause the running PCA, with a reason' })
  @ApiHeader(idempotencyKey('a repeat after it succeeded is 409 (already paused), and nothing changes'))
  @ApiErrors(404, 409)
  @Roles(...BEDSIDE_ROLES)
  @Post('pause')
  @HttpCode(200)
  pause(@Param('orderId', ParseIdPipe) orderId: number, @Body() body: PauseDto, @CurrentUser() user: AuthUser): Promise<PcaPauseState> {
    return this.pauses.pause(orderId, body, user);
  }

  @ApiOperation({ summary: 'Resume a paused PCA: both nurses re-enter the pump settings, which must equal the order' })
  @ApiHeader(idempotencyKey('a repeat after it succeeded is 409 (not paused), and nothing changes'))
  @ApiErrors(404, 409)
  @Roles(...BEDSIDE_ROLES)
  @Post('resume')
  @HttpCode(200)
  resume(@Param('orderId', ParseIdPipe) orderId: number, @Body() body: ResumeDto, @CurrentUser() user: AuthUser): Promise<PcaPauseState> {
    return this.pauses.resume(orderId, body, user);
  }
}
