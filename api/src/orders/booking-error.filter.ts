import { type ArgumentsHost, Catch, type ExceptionFilter, HttpStatus } from '@nestjs/common';
import { BookingError } from '@nappe/shared';
import type { Response } from 'express';

/** Bad input → 400; a request the order's state or the calendar refuses → 409 (booking-errors.ts). */
const BAD_INPUT = new Set([
  'invalid_booking_input',
  'guest_count_out_of_range',
  'event_date_passed',
]);

export function statusForBookingError(error: BookingError): number {
  return BAD_INPUT.has(error.code) ? HttpStatus.BAD_REQUEST : HttpStatus.CONFLICT;
}

/** Turns the shared booking rules' errors into Nest's error shape, with the rule's own message. */
@Catch(BookingError)
export class BookingErrorFilter implements ExceptionFilter {
  catch(error: BookingError, host: ArgumentsHost): void {
    const status = statusForBookingError(error);
    host
      .switchToHttp()
      .getResponse<Response>()
      .status(status)
      .json({
        statusCode: status,
        message: error.message,
        error: status === HttpStatus.BAD_REQUEST ? 'Bad Request' : 'Conflict',
        code: error.code,
      });
  }
}
