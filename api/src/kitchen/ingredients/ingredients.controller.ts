import {
  Body,
  Controller,
  Delete,
  Get,
  HttpCode,
  HttpStatus,
  Param,
  Post,
  Put,
  Query,
} from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { Role, type Page } from '@nappe/shared';
import { CurrentUser } from '../../auth/decorators/current-user.decorator.js';
import { Roles } from '../../auth/decorators/roles.decorator.js';
import type { Principal } from '../../auth/principal.js';
import { ZodValidationPipe } from '../../common/zod-validation.pipe.js';
import { ingredientBody, type IngredientBody } from '../dto/kitchen-bodies.js';
import { KitchenListQuery } from '../dto/kitchen-queries.js';
import type { IngredientResponse } from './ingredient.mapper.js';
import { IngredientsService } from './ingredients.service.js';

@ApiTags('kitchen')
@ApiBearerAuth()
@Controller('ingredients')
export class IngredientsController {
  constructor(private readonly ingredients: IngredientsService) {}

  @Roles(Role.Chef, Role.Staff)
  @Get()
  list(
    @Query() query: KitchenListQuery,
    @CurrentUser() user: Principal,
  ): Promise<Page<IngredientResponse>> {
    return this.ingredients.list(query, user.role);
  }

  @Roles(Role.Chef, Role.Staff)
  @Get(':id')
  get(@Param('id') id: string, @CurrentUser() user: Principal): Promise<IngredientResponse> {
    return this.ingredients.get(id, user.role);
  }

  @Roles(Role.Chef)
  @Post()
  create(
    @Body(new ZodValidationPipe(ingredientBody)) body: IngredientBody,
  ): Promise<IngredientResponse> {
    return this.ingredients.create(body);
  }

  @Roles(Role.Chef)
  @Put(':id')
  replace(
    @Param('id') id: string,
    @Body(new ZodValidationPipe(ingredientBody)) body: IngredientBody,
  ): Promise<IngredientResponse> {
    return this.ingredients.replace(id, body);
  }

  @Roles(Role.Chef)
  @Delete(':id')
  @HttpCode(HttpStatus.NO_CONTENT)
  remove(@Param('id') id: string): Promise<void> {
    return this.ingredients.remove(id);
  }
}
