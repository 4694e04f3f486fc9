import {
  Body,
  Controller,
  Get,
  Headers,
  HttpCode,
  HttpStatus,
  Param,
  Post,
  Put,
  Query,
  Res,
  StreamableFile,
} from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import {
  changeGuestCountSchema,
  createOrderSchema,
  orderReasonSchema,
  Role,
  type CancellationPreview,
  type ChangeGuestCountRequest,
  type CheckoutResponse,
  type CreateOrderRequest,
  type GuestChangePreview,
  type GuestChangeResult,
  type OrderDetail,
  type OrderReasonRequest,
  type OrderSummary,
  type Page,
} from '@nappe/shared';
import type { Response } from 'express';
import { confirmBodySchema, type ConfirmBody } from '../allergy-notes/allergy-notes.dto.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import type { Principal } from '../auth/principal.js';
import { ZodValidationPipe } from '../common/zod-validation.pipe.js';
import { CheckoutService } from '../payments/checkout.service.js';
import {
  cancelOrderBody,
  checkoutBody,
  checkoutReturnBody,
  idempotencyKeySchema,
  type CancelOrderBody,
  type CheckoutBody,
  type CheckoutReturnBody,
} from './dto/order-bodies.js';
import { ListOrdersQuery } from './dto/order-queries.js';
import { OrdersService } from './orders.service.js';

/**
 * Orders. A client sees and acts on their own orders only (another's id → 404); the chef and
 * staff see all; the chef confirms, declines and completes. Routes: shared/src/orders/order-api.ts.
 */
const idempotencyKey = new ZodValidationPipe(idempotencyKeySchema);

@ApiTags('orders')
@ApiBearerAuth()
@Controller('orders')
export class OrdersController {
  constructor(
    private readonly orders: OrdersService,
    private readonly checkouts: CheckoutService,
  ) {}

  @Roles(Role.Client)
  @Post()
  async create(
    @CurrentUser() user: Principal,
    @Headers('idempotency-key') rawKey: string | undefined,
    @Body(new ZodValidationPipe(createOrderSchema)) body: CreateOrderRequest,
    @Res({ passthrough: true }) res: Response,
  ): Promise<OrderDetail> {
    const key = idempotencyKey.transform(rawKey);
    const { order, created } = await this.orders.create(user, key, body);
    res.status(created ? HttpStatus.CREATED : HttpStatus.OK);
    return order;
  }

  @Roles(Role.Client, Role.Chef, Role.Staff)
  @Get()
  list(
    @CurrentUser() user: Principal,
    @Query() query: ListOrdersQuery,
  ): Promise<Page<OrderSummary>> {
    return this.orders.list(user, query);
  }

  @Roles(Role.Client, Role.Chef, Role.Staff)
  @Get(':id')
  get(@CurrentUser() user: Principal, @Param('id') id: string): Promise<OrderDetail> {
    return this.orders.get(user, id);
  }

  @Roles(Role.Client)
  @Post(':id/checkout')
  @HttpCode(HttpStatus.OK)
  checkout(
    @CurrentUser() user: Principal,
    @Param('id') id: string,
    @Body(new ZodValidationPipe(checkoutBody)) body: CheckoutBody,
  ): Promise<CheckoutResponse> {
    return this.checkouts.start(user, id, body.plan);
  }

  @Roles(Role.Client)
  @Post(':id/checkout/return')
  @HttpCode(HttpStatus.OK)
  checkoutReturn(
    @CurrentUser() user: Principal,
    @Param('id') id: string,
    @Body(new ZodValidationPipe(checkoutReturnBody)) body: CheckoutReturnBody,
  ): Promise<OrderDetail> {
    return this.checkouts.returnFromCheckout(user, id, body.sessionId);
  }

  @Roles(Role.Client, Role.Chef)
  @Post(':id/cancellation-preview')
  @HttpCode(HttpStatus.OK)
  cancellationPreview(
    @CurrentUser() user: Principal,
    @Param('id') id: string,
  ): Promise<CancellationPreview> {
    return this.orders.cancellationPreview(user, id);
  }

  @Roles(Role.Client, Role.Chef)
  @Post(':id/cancel')
  @HttpCode(HttpStatus.OK)
  cancel(
    @CurrentUser() user: Principal,
    @Param('id') id: string,
    @Body(new ZodValidationPipe(cancelOrderBody)) body: CancelOrderBody,
  ): Promise<OrderDetail> {
    return this.orders.cancel(user, id, body.reason, body.refund);
  }

  @Roles(Role.Client, Role.Chef)
  @Post(':id/guest-change-preview')
  @HttpCode(HttpStatus.OK)
  guestChangePreview(
    @CurrentUser() user: Principal,
    @Param('id') id: string,
    @Body(new ZodValidationPipe(changeGuestCountSchema)) body: ChangeGuestCountRequest,
  ): Promise<GuestChangePreview> {
    return this.orders.guestChangePreview(user, id, body);
  }

  @Roles(Role.Client, Role.Chef)
  @Put(':id/guests')
  changeGuests(
    @CurrentUser() user: Principal,
    @Param('id') id: string,
    @Body(new ZodValidationPipe(changeGuestCountSchema)) body: ChangeGuestCountRequest,
  ): Promise<GuestChangeResult> {
    return this.orders.changeGuests(user, id, body);
  }

  @Roles(Role.Chef)
  @Post(':id/confirm')
  @HttpCode(HttpStatus.OK)
  confirm(
    @CurrentUser() user: Principal,
    @Param('id') id: string,
    @Body(new ZodValidationPipe(confirmBodySchema)) body: ConfirmBody,
  ): Promise<OrderDetail> {
    return this.orders.confirm(user, id, body.reason, body.overrideReason);
  }

  @Roles(Role.Chef)
  @Post(':id/decline')
  @HttpCode(HttpStatus.OK)
  decline(
    @CurrentUser() user: Principal,
    @Param('id') id: string,
    @Body(new ZodValidationPipe(orderReasonSchema)) body: OrderReasonRequest,
  ): Promise<OrderDetail> {
    return this.orders.decline(user, id, body.reason);
  }

  @Roles(Role.Chef)
  @Post(':id/complete')
  @HttpCode(HttpStatus.OK)
  complete(
    @CurrentUser() user: Principal,
    @Param('id') id: string,
    @Body(new ZodValidationPipe(orderReasonSchema)) body: OrderReasonRequest,
  ): Promise<OrderDetail> {
    return this.orders.complete(user, id, body.reason);
  }

  @Roles(Role.Client, Role.Chef)
  @Get(':id/receipts/:paymentId.pdf')
  async receipt(
    @CurrentUser() user: Principal,
    @Param('id') id: string,
    @Param('paymentId') paymentId: string,
  ): Promise<StreamableFile> {
    const doc = await this.orders.receipt(user, id, paymentId);
    return new StreamableFile(doc.content, {
      type: 'application/pdf',
      disposition: `inline; filename="${doc.filename}"`,
    });
  }

  @Roles(Role.Client, Role.Chef, Role.Staff)
  @Get(':id/event.ics')
  async eventFile(
    @CurrentUser() user: Principal,
    @Param('id') id: string,
  ): Promise<StreamableFile> {
    const doc = await this.orders.eventFile(user, id);
    return new StreamableFile(Buffer.from(doc.content, 'utf8'), {
      type: 'text/calendar; charset=utf-8',
      disposition: `attachment; filename="${doc.filename}"`,
    });
  }
}
