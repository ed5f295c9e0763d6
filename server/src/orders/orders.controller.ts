import { Body, Controller, Get, HttpCode, Param, Post, Query } from '@nestjs/common';
import { type OrderDetail, type OrderListEntry, type OrderPreview, PHARMACY_ROLES, PRESCRIBING_ROLES } from '@lockstep/shared';
import { ApiOperation } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { SignedRequestDto } from '../common/dto/signature.dto.js';
import { ApiErrors } from '../common/openapi/api-errors.decorator.js';
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
  @ApiOperation({ summary: 'Derived values and findings for order fields; writes nothing' })
  @Post('preview')
  @HttpCode(200)
  preview(@Body() body: OrderFieldsDto): Promise<OrderPreview> {
    return this.previews.preview(body);
  }

  @ApiOperation({ summary: 'Sign a new order: hard findings refuse it, each soft finding needs a reason' })
  @Post()
  @Roles(...PRESCRIBING_ROLES)
  create(@Body() body: CreateOrderDto, @CurrentUser() user: AuthUser): Promise<OrderDetail> {
    return this.orders.create(body, user);
  }

  @ApiOperation({ summary: 'Orders, newest first' })
  @Get()
  list(@Query() query: OrderQueryDto, @CurrentUser() user: AuthUser): Promise<OrderListEntry[]> {
    return this.orders.list(query, user);
  }

  @ApiOperation({ summary: 'One order with its events, syringe releases and flags' })
  @ApiErrors(404)
  @Get(':id')
  get(@Param('id', ParseIdPipe) id: number): Promise<OrderDetail> {
    return this.orders.get(id);
  }

  /** A returned order is revised as a new version, signed again; the old one is superseded. */
  @ApiOperation({ summary: 'Revise a returned order as a new signed version; the old one is superseded' })
  @ApiErrors(404, 409)
  @Post(':id/revise')
  @Roles(...PRESCRIBING_ROLES)
  revise(@Param('id', ParseIdPipe) id: number, @Body() body: CreateOrderDto, @CurrentUser() user: AuthUser): Promise<OrderDetail> {
    return this.orders.create(body, user, id);
  }

  @ApiOperation({ summary: 'Cancel an order before it starts' })
  @ApiErrors(404, 409)
  @Post(':id/cancel')
  @HttpCode(200)
  @Roles(...PRESCRIBING_ROLES)
  cancel(@Param('id', ParseIdPipe) id: number, @Body() body: ReasonDto, @CurrentUser() user: AuthUser): Promise<OrderDetail> {
    return this.orders.cancel(id, body.reason, user);
  }

  @ApiOperation({ summary: 'Verify an order (signed; not by its own prescriber)' })
  @ApiErrors(404, 409)
  @Post(':id/verify')
  @HttpCode(200)
  @Roles(...PHARMACY_ROLES)
  verify(@Param('id', ParseIdPipe) id: number, @Body() body: SignedRequestDto, @CurrentUser() user: AuthUser): Promise<OrderDetail> {
    return this.review.verify(id, user, body.signature.password);
  }

  @ApiOperation({ summary: 'Return an order to its prescriber with a query' })
  @ApiErrors(404, 409)
  @Post(':id/return')
  @HttpCode(200)
  @Roles(...PHARMACY_ROLES)
  returnWithQuery(@Param('id', ParseIdPipe) id: number, @Body() body: ReasonDto, @CurrentUser() user: AuthUser): Promise<OrderDetail> {
    return this.review.return(id, user, body.reason);
  }

  @ApiOperation({ summary: 'Reject an order' })
  @ApiErrors(404, 409)
  @Post(':id/reject')
  @HttpCode(200)
  @Roles(...PHARMACY_ROLES)
  reject(@Param('id', ParseIdPipe) id: number, @Body() body: ReasonDto, @CurrentUser() user: AuthUser): Promise<OrderDetail> {
    return this.review.reject(id, user, body.reason);
  }
}
