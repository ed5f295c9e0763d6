import { Module } from '@nestjs/common';
import { OrdersModule } from '../orders/orders.module.js';
import { UsersModule } from '../users/users.module.js';
import { WardEventsModule } from '../ward-events/ward-events.module.js';
import { BedsideChecksService } from './bedside-checks.service.js';
import { BedsideController } from './bedside.controller.js';
import { BolusesService } from './boluses.service.js';
import { PausesController } from './pauses.controller.js';
import { PausesService } from './pauses.service.js';
import { SyringeEndService } from './syringe-end.service.js';

@Module({
  imports: [OrdersModule, UsersModule, WardEventsModule],
  controllers: [BedsideController, PausesController],
  providers: [BedsideChecksService, BolusesService, SyringeEndService, PausesService],
})
export class BedsideModule {}
