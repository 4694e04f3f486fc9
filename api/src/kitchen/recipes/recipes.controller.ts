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
import { Role, type MixBalance, type Page, type RecipeCost } from '@nappe/shared';
import { Roles } from '../../auth/decorators/roles.decorator.js';
import { ZodValidationPipe } from '../../common/zod-validation.pipe.js';
import { recipeBody, type RecipeBody } from '../dto/kitchen-bodies.js';
import { KitchenListQuery, MixBalanceQuery, ScaleQuery } from '../dto/kitchen-queries.js';
import type { RecipeResponse } from './recipe.mapper.js';
import {
  RecipesService,
  type RecipeAllergenView,
  type ScaledRecipeView,
} from './recipes.service.js';

@ApiTags('kitchen')
@ApiBearerAuth()
@Controller('recipes')
export class RecipesController {
  constructor(private readonly recipes: RecipesService) {}

  @Roles(Role.Chef, Role.Staff)
  @Get()
  list(@Query() query: KitchenListQuery): Promise<Page<RecipeResponse>> {
    return this.recipes.list(query);
  }

  @Roles(Role.Chef, Role.Staff)
  @Get(':id')
  get(@Param('id') id: string): Promise<RecipeResponse> {
    return this.recipes.get(id);
  }

  @Roles(Role.Chef, Role.Staff)
  @Get(':id/scaled')
  scaled(@Param('id') id: string, @Query() query: ScaleQuery): Promise<ScaledRecipeView> {
    return this.recipes.scaled(id, query);
  }

  @Roles(Role.Chef, Role.Staff)
  @Get(':id/allergens')
  allergens(@Param('id') id: string): Promise<RecipeAllergenView> {
    return this.recipes.allergens(id);
  }

  @Roles(Role.Chef)
  @Get(':id/cost')
  cost(@Param('id') id: string): Promise<RecipeCost> {
    return this.recipes.cost(id);
  }

  @Roles(Role.Chef, Role.Staff)
  @Get(':id/mix-balance')
  mixBalance(@Param('id') id: string, @Query() query: MixBalanceQuery): Promise<MixBalance> {
    return this.recipes.mixBalance(id, query);
  }

  @Roles(Role.Chef)
  @Post()
  create(@Body(new ZodValidationPipe(recipeBody)) body: RecipeBody): Promise<RecipeResponse> {
    return this.recipes.create(body);
  }

  @Roles(Role.Chef)
  @Put(':id')
  replace(
    @Param('id') id: string,
    @Body(new ZodValidationPipe(recipeBody)) body: RecipeBody,
  ): Promise<RecipeResponse> {
    return this.recipes.replace(id, body);
  }

  @Roles(Role.Chef)
  @Delete(':id')
  @HttpCode(HttpStatus.NO_CONTENT)
  remove(@Param('id') id: string): Promise<void> {
    return this.recipes.remove(id);
  }
}
