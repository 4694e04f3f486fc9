import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { ORDER_STATUSES, OrderStatus } from '@nappe/shared';
import { Type } from 'class-transformer';
import { IsIn, IsInt, IsOptional, IsString, Matches, Max, Min, MaxLength } from 'class-validator';

export const ORDERS_MAX_PAGE_SIZE = 100;
const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/;

/** `GET /api/orders?page&pageSize&status`. */
export class ListOrdersQuery {
  @ApiPropertyOptional({ minimum: 1, default: 1 })
  @IsOptional()
  @Type(() => Number)
  @IsInt()
  @Min(1)
  @Max(100_000)
  page = 1;

  @ApiPropertyOptional({ minimum: 1, maximum: ORDERS_MAX_PAGE_SIZE, default: 20 })
  @IsOptional()
  @Type(() => Number)
  @IsInt()
  @Min(1)
  @Max(ORDERS_MAX_PAGE_SIZE)
  pageSize = 20;

  @ApiPropertyOptional({ enum: ORDER_STATUSES })
  @IsOptional()
  @IsIn(ORDER_STATUSES, { message: `status must be one of: ${ORDER_STATUSES.join(', ')}` })
  status?: OrderStatus;

  /** Events on or after this date (`YYYY-MM-DD`, the studio's calendar). */
  @ApiPropertyOptional({ example: '2026-06-01' })
  @IsOptional()
  @IsString()
  @Matches(ISO_DATE, { message: 'from must be a date written YYYY-MM-DD' })
  from?: string;

  /** Events on or before this date. */
  @ApiPropertyOptional({ example: '2026-06-30' })
  @IsOptional()
  @IsString()
  @Matches(ISO_DATE, { message: 'to must be a date written YYYY-MM-DD' })
  to?: string;

  /** Part of the reference or of the client's name, any case. */
  @ApiPropertyOptional({ maxLength: 100 })
  @IsOptional()
  @IsString()
  @MaxLength(100, { message: 'Search with at most 100 characters.' })
  q?: string;
}

/** `GET /api/availability?menuId&from&to[&guests]` (dates checked as real dates by the service). */
export class AvailabilityQuery {
  @ApiProperty()
  @IsString()
  @MaxLength(64)
  menuId: string;

  @ApiProperty({ example: '2026-06-01' })
  @IsString()
  @Matches(ISO_DATE, { message: 'from must be a date written YYYY-MM-DD' })
  from: string;

  @ApiProperty({ example: '2026-06-30' })
  @IsString()
  @Matches(ISO_DATE, { message: 'to must be a date written YYYY-MM-DD' })
  to: string;

  @ApiPropertyOptional({ minimum: 1, maximum: 5000 })
  @IsOptional()
  @Type(() => Number)
  @IsInt()
  @Min(1)
  @Max(5000)
  guests?: number;
}
