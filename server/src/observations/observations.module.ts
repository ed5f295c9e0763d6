import { Module } from '@nestjs/common';
import { EquianalgesicModule } from '../equianalgesic/equianalgesic.module.js';
import { OrdersModule } from '../orders/orders.module.js';
import { WardEventsModule } from '../ward-events/ward-events.module.js';
import { ObservationsController } from './observations.controller.js';
import { ObservationsService } from './observations.service.js';
import { UsageService } from './usage.service.js';

@Module({
  imports: [OrdersModule, WardEventsModule, EquianalgesicModule],
  controllers: [ObservationsController],
  providers: [ObservationsService, UsageService],
})
export class ObservationsModule {}
