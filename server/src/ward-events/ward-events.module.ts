import { Module } from '@nestjs/common';
import { WardEventsService } from './ward-events.service.js';

/** One shared stream of ward changes: imported by every module that announces them or serves them. */
@Module({ providers: [WardEventsService], exports: [WardEventsService] })
export class WardEventsModule {}
