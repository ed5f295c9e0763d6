import { Body, Controller, Get, Param, Post, Sse, type MessageEvent } from '@nestjs/common';
import type { Observable } from 'rxjs';
import { BEDSIDE_ROLES, CLINICAL_ROLES, type HandoverBoard, type HandoverSignoffResponse } from '@lockstep/shared';
import { ApiOperation, ApiProduces } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { ApiErrors } from '../common/openapi/api-errors.decorator.js';
import { ParseIdPipe } from '../common/pipes/parse-id.pipe.js';
import { CreateSignoffDto } from './dto/create-signoff.dto.js';
import { HandoverBoardService } from './handover-board.service.js';
import { HandoverSignoffsService } from './handover-signoffs.service.js';
import { WardEventsService } from '../ward-events/ward-events.service.js';

@Controller('wards/:wardId/handover')
@Roles(...CLINICAL_ROLES)
export class HandoverController {
  constructor(
    private readonly boards: HandoverBoardService,
    private readonly signoffs: HandoverSignoffsService,
    private readonly events: WardEventsService,
  ) {}

  @ApiOperation({ summary: 'The ward’s handover board, sorted by risk' })
  @ApiErrors(404)
  @Get()
  board(@Param('wardId', ParseIdPipe) wardId: number): Promise<HandoverBoard> {
    return this.boards.board(wardId);
  }

  /** Server-sent events: `ward-change` when anything on the board changes; the client refetches. */
  @ApiOperation({ summary: 'Server-sent events: ward-change when anything on the board changes, and a heartbeat' })
  @ApiProduces('text/event-stream')
  @Sse('stream')
  stream(@Param('wardId', ParseIdPipe) wardId: number): Observable<MessageEvent> {
    return this.events.stream(wardId);
  }

  @ApiOperation({ summary: 'This shift’s handover sign-offs' })
  @ApiErrors(404)
  @Get('signoffs')
  listSignoffs(@Param('wardId', ParseIdPipe) wardId: number): Promise<HandoverSignoffResponse[]> {
    return this.signoffs.list(wardId);
  }

  @ApiOperation({ summary: 'Confirm an active PCA at handover (outgoing or incoming nurse)' })
  @ApiErrors(404, 409)
  @Post('signoffs')
  @Roles(...BEDSIDE_ROLES)
  signOff(
    @Param('wardId', ParseIdPipe) wardId: number,
    @Body() body: CreateSignoffDto,
    @CurrentUser() user: AuthUser,
  ): Promise<HandoverSignoffResponse> {
    return this.signoffs.signOff(wardId, body, user);
  }
}
