import { ApiPropertyOptional } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import {
  IsBoolean,
  IsInt,
  IsNumber,
  IsOptional,
  IsString,
  Max,
  MaxLength,
  Min,
} from 'class-validator';

export const KITCHEN_MAX_PAGE_SIZE = 100;

/** `?page=&pageSize=&q=` on every kitchen list. Lists are capped at 100 per page. */
export class KitchenListQuery {
  @ApiPropertyOptional({ minimum: 1, default: 1 })
  @IsOptional()
  @Type(() => Number)
  @IsInt()
  @Min(1)
  @Max(100_000)
  page = 1;

  @ApiPropertyOptional({ minimum: 1, maximum: KITCHEN_MAX_PAGE_SIZE, default: 20 })
  @IsOptional()
  @Type(() => Number)
  @IsInt()
  @Min(1)
  @Max(KITCHEN_MAX_PAGE_SIZE)
  pageSize = 20;

  /** Part of the name, any case; blank means no filter. */
  @ApiPropertyOptional({ maxLength: 120 })
  @IsOptional()
  @IsString()
  @MaxLength(120)
  q?: string;
}

/** `GET /api/recipes/:id/scaled`: either `grams`, or `plates` of the dessert `dessertId`. */
export class ScaleQuery {
  @ApiPropertyOptional({ description: 'Grams of the recipe to make', minimum: 0.1 })
  @IsOptional()
  @Type(() => Number)
  @IsNumber({ allowNaN: false, allowInfinity: false })
  @Min(0.1)
  @Max(1_000_000)
  grams?: number;

  @ApiPropertyOptional({ description: 'Plates of the dessert given by dessertId', minimum: 1 })
  @IsOptional()
  @Type(() => Number)
  @IsInt()
  @Min(1)
  @Max(10_000)
  plates?: number;

  @ApiPropertyOptional()
  @IsOptional()
  @IsString()
  @MaxLength(64)
  dessertId?: string;
}

/** `GET /api/recipes/:id/mix-balance`. */
export class MixBalanceQuery {
  @ApiPropertyOptional({ description: 'Measured overrun, per cent (30 assumed when absent)' })
  @IsOptional()
  @Type(() => Number)
  @IsNumber({ allowNaN: false, allowInfinity: false })
  @Min(0)
  @Max(300)
  overrunPercent?: number;

  @ApiPropertyOptional({
    description: 'Nuts, fruit or chocolate pieces (21 CFR 135.110 yolk threshold 1.12 %)',
  })
  @IsOptional()
  @Transform(({ value }: { value: unknown }) =>
    value === 'true' ? true : value === 'false' ? false : value,
  )
  @IsBoolean()
  bulkyFlavours?: boolean;
}

/** `GET /api/menus/:id/costing`. */
export class MenuCostingQuery {
  @ApiPropertyOptional({ description: 'Target food cost, per cent of the price per guest' })
  @IsOptional()
  @Type(() => Number)
  @IsNumber({ allowNaN: false, allowInfinity: false })
  @Min(1)
  @Max(99)
  targetPercent?: number;

  @ApiPropertyOptional({
    description: 'Round the suggested price up to this many minor units',
    default: 1,
  })
  @IsOptional()
  @Type(() => Number)
  @IsInt()
  @Min(1)
  @Max(100_000)
  stepMinor = 1;
}
