import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { FilesModule } from '../files/files.module.js';
import { KitchenCatalogueService } from './catalogue/kitchen-catalogue.service.js';
import { DessertsController } from './desserts/desserts.controller.js';
import { DessertsService } from './desserts/desserts.service.js';
import { kitchenEntities } from './entities/kitchen-entities.js';
import { IngredientsController } from './ingredients/ingredients.controller.js';
import { IngredientsService } from './ingredients/ingredients.service.js';
import { MenusController } from './menus/menus.controller.js';
import { MenusService } from './menus/menus.service.js';
import { RecipesController } from './recipes/recipes.controller.js';
import { RecipesService } from './recipes/recipes.service.js';

/** The kitchen catalogue: ingredients, recipes, desserts and menus, and their computed views. */
@Module({
  imports: [TypeOrmModule.forFeature(kitchenEntities), FilesModule],
  controllers: [IngredientsController, RecipesController, DessertsController, MenusController],
  providers: [
    KitchenCatalogueService,
    IngredientsService,
    RecipesService,
    DessertsService,
    MenusService,
  ],
  exports: [KitchenCatalogueService],
})
export class KitchenModule {}
