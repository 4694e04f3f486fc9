import { Module } from '@nestjs/common';
import { KitchenCatalogueService } from '../kitchen/catalogue/kitchen-catalogue.service.js';
import { PrepController } from './prep.controller.js';
import { PrepService } from './prep.service.js';

/** Prep: the plan over confirmed orders, the day's schedule with ticks, component labels. */
@Module({
  controllers: [PrepController],
  // The catalogue service only reads rows (no cache), so its own instance here is safe.
  providers: [PrepService, KitchenCatalogueService],
})
export class PrepModule {}
