import { Module } from '@nestjs/common';
import { LibraryModule } from '../library/library.module.js';
import { UsersModule } from '../users/users.module.js';
import { WardEventsModule } from '../ward-events/ward-events.module.js';
import { OrderPreviewService } from './order-preview.service.js';
import { OrderReviewService } from './order-review.service.js';
import { OrdersController } from './orders.controller.js';
import { OrdersService } from './orders.service.js';

@Module({
  imports: [LibraryModule, UsersModule, WardEventsModule],
  controllers: [OrdersController],
  providers: [OrderPreviewService, OrdersService, OrderReviewService],
  exports: [OrdersService],
})
export class OrdersModule {}
