import { Body, Controller, Get, HttpCode, HttpStatus, Post, Query } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { Throttle } from '@nestjs/throttler';
import {
  createQuoteSchema,
  type AvailabilityResponse,
  type BookingTerms,
  type CreateQuoteRequest,
  type Quote,
} from '@nappe/shared';
import { Public } from '../auth/decorators/public.decorator.js';
import { ZodValidationPipe } from '../common/zod-validation.pipe.js';
import { AvailabilityQuery } from './dto/order-queries.js';
import { OrdersService } from './orders.service.js';

/** Quotes per minute per address: a quote is cheap, but it reads the whole settings row and menu. */
const quoteLimit = {
  default: { limit: () => Number(process.env.QUOTE_THROTTLE_LIMIT ?? 60), ttl: 60_000 },
};

/** What anyone may ask before booking: the terms, the open dates and a quote. */
@ApiTags('booking')
@Controller()
export class BookingController {
  constructor(private readonly orders: OrdersService) {}

  @Public()
  @Get('booking-terms')
  terms(): Promise<BookingTerms> {
    return this.orders.bookingTerms();
  }

  @Public()
  @Get('availability')
  availability(@Query() query: AvailabilityQuery): Promise<AvailabilityResponse> {
    return this.orders.availability(query);
  }

  @Public()
  @Throttle(quoteLimit)
  @Post('quotes')
  @HttpCode(HttpStatus.OK)
  quote(@Body(new ZodValidationPipe(createQuoteSchema)) body: CreateQuoteRequest): Promise<Quote> {
    return this.orders.quote(body);
  }
}
