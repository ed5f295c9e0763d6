import { Global, Module } from '@nestjs/common';
import { HandoverBoardService } from './handover-board.service.js';
import { HandoverSignoffsService } from './handover-signoffs.service.js';
import { HandoverController } from './handover.controller.js';
import { WardEventsService } from './ward-events.service.js';

/** Global so that every clinical service can announce ward changes. */
@Global()
@Module({
  controllers: [HandoverController],
  providers: [HandoverBoardService, HandoverSignoffsService, WardEventsService],
  exports: [WardEventsService],
})
export class HandoverModule {}
