import { Module } from '@nestjs/common';
import { LibraryModule } from '../library/library.module.js';
import { OrderPreviewService } from './order-preview.service.js';
import { OrdersController } from './orders.controller.js';

@Module({
  imports: [LibraryModule],
  controllers: [OrdersController],
  providers: [OrderPreviewService],
})
export class OrdersModule {}
