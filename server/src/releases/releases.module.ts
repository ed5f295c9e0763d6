import { Module } from '@nestjs/common';
import { OrdersModule } from '../orders/orders.module.js';
import { WardEventsModule } from '../ward-events/ward-events.module.js';
import { ReleasesController } from './releases.controller.js';
import { ReleasesService } from './releases.service.js';

@Module({
  imports: [OrdersModule, WardEventsModule],
  controllers: [ReleasesController],
  providers: [ReleasesService],
})
export class ReleasesModule {}
