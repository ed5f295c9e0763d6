import { Body, Controller, Get, HttpCode, Param, Post, Query } from '@nestjs/common';
import type { OrderDetail, OrderPreview, OrderSummary } from '@lockstep/shared';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { SignedRequestDto } from '../common/dto/signature.dto.js';
import { ParseIdPipe } from '../common/pipes/parse-id.pipe.js';
import { CreateOrderDto } from './dto/create-order.dto.js';
import { OrderFieldsDto } from './dto/order-fields.dto.js';
import { OrderQueryDto } from './dto/order-query.dto.js';
import { ReasonDto } from './dto/reason.dto.js';
import { OrderPreviewService } from './order-preview.service.js';
import { OrderReviewService } from './order-review.service.js';
import { OrdersService } from './orders.service.js';

@Controller('orders')
export class OrdersController {
  constructor(
    private readonly previews: OrderPreviewService,
    private readonly orders: OrdersService,
    private readonly review: OrderReviewService,
  ) {}

  /** Any signed-in role may preview; nothing is written. */
  @Post('preview')
  @HttpCode(200)
  preview(@Body() body: OrderFieldsDto): Promise<OrderPreview> {
    return this.previews.preview(body);
  }

  @Post()
  @Roles('prescriber')
  create(@Body() body: CreateOrderDto, @CurrentUser() user: AuthUser): Promise<OrderDetail> {
    return this.orders.create(body, user);
  }

  @Get()
  list(@Query() query: OrderQueryDto, @CurrentUser() user: AuthUser): Promise<OrderSummary[]> {
    return this.orders.list(query, user);
  }

  @Get(':id')
  get(@Param('id', ParseIdPipe) id: number): Promise<OrderDetail> {
    return this.orders.get(id);
  }

  /** A returned order is revised as a new version, signed again; the old one is superseded. */
  @Post(':id/revise')
  @Roles('prescriber')
  revise(@Param('id', ParseIdPipe) id: number, @Body() body: CreateOrderDto, @CurrentUser() user: AuthUser): Promise<OrderDetail> {
    return this.orders.create(body, user, id);
  }

  @Post(':id/cancel')
  @HttpCode(200)
  @Roles('prescriber')
  cancel(@Param('id', ParseIdPipe) id: number, @Body() body: ReasonDto, @CurrentUser() user: AuthUser): Promise<OrderDetail> {
    return this.orders.cancel(id, body.reason, user);
  }

  @Post(':id/verify')
  @HttpCode(200)
  @Roles('pharmacist')
  verify(@Param('id', ParseIdPipe) id: number, @Body() body: SignedRequestDto, @CurrentUser() user: AuthUser): Promise<OrderDetail> {
    return this.review.verify(id, user, body.signature.password);
  }

  @Post(':id/return')
  @HttpCode(200)
  @Roles('pharmacist')
  returnWithQuery(@Param('id', ParseIdPipe) id: number, @Body() body: ReasonDto, @CurrentUser() user: AuthUser): Promise<OrderDetail> {
    return this.review.return(id, user, body.reason);
  }

  @Post(':id/reject')
  @HttpCode(200)
  @Roles('pharmacist')
  reject(@Param('id', ParseIdPipe) id: number, @Body() body: ReasonDto, @CurrentUser() user: AuthUser): Promise<OrderDetail> {
    return this.review.reject(id, user, body.reason);
  }
}
