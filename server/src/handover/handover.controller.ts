import { Body, Controller, Get, Param, Post, Sse, type MessageEvent } from '@nestjs/common';
import type { Observable } from 'rxjs';
import type { HandoverBoard, HandoverSignoffResponse } from '@lockstep/shared';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { ParseIdPipe } from '../common/pipes/parse-id.pipe.js';
import { CreateSignoffDto } from './dto/create-signoff.dto.js';
import { HandoverBoardService } from './handover-board.service.js';
import { HandoverSignoffsService } from './handover-signoffs.service.js';
import { WardEventsService } from './ward-events.service.js';

@Controller('wards/:wardId/handover')
@Roles('nurse', 'charge_nurse', 'prescriber', 'pharmacist')
export class HandoverController {
  constructor(
    private readonly boards: HandoverBoardService,
    private readonly signoffs: HandoverSignoffsService,
    private readonly events: WardEventsService,
  ) {}

  @Get()
  board(@Param('wardId', ParseIdPipe) wardId: number): Promise<HandoverBoard> {
    return this.boards.board(wardId);
  }

  /** Server-sent events: `ward-change` when anything on the board changes; the client refetches. */
  @Sse('stream')
  stream(@Param('wardId', ParseIdPipe) wardId: number): Observable<MessageEvent> {
    return this.events.stream(wardId);
  }

  @Get('signoffs')
  listSignoffs(@Param('wardId', ParseIdPipe) wardId: number): Promise<HandoverSignoffResponse[]> {
    return this.signoffs.list(wardId);
  }

  @Post('signoffs')
  @Roles('nurse', 'charge_nurse')
  signOff(@Param('wardId', ParseIdPipe) wardId: number, @Body() body: CreateSignoffDto, @CurrentUser() user: AuthUser): Promise<HandoverSignoffResponse> {
    return this.signoffs.signOff(wardId, body, user);
  }
}
