import { Body, Controller, HttpCode, Post } from '@nestjs/common';
import type { OrderPreview } from '@lockstep/shared';
import { OrderFieldsDto } from './dto/order-fields.dto.js';
import { OrderPreviewService } from './order-preview.service.js';

@Controller('orders')
export class OrdersController {
  constructor(private readonly previews: OrderPreviewService) {}

  /** Any signed-in role may preview; nothing is written. */
  @Post('preview')
  @HttpCode(200)
  preview(@Body() body: OrderFieldsDto): Promise<OrderPreview> {
    return this.previews.preview(body);
  }
}
