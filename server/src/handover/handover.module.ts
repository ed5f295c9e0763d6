import { Module } from '@nestjs/common';
import { UsersModule } from '../users/users.module.js';
import { WardEventsModule } from '../ward-events/ward-events.module.js';
import { HandoverBoardService } from './handover-board.service.js';
import { HandoverSignoffsService } from './handover-signoffs.service.js';
import { HandoverController } from './handover.controller.js';

@Module({
  imports: [UsersModule, WardEventsModule],
  controllers: [HandoverController],
  providers: [HandoverBoardService, HandoverSignoffsService],
})
export class HandoverModule {}
