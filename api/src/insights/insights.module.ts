import { Module } from '@nestjs/common';
import { KitchenModule } from '../kitchen/kitchen.module.js';
import { InsightsController } from './insights.controller.js';
import { InsightsService } from './insights.service.js';

/** The chef's dashboard: upcoming events, requests, revenue, plates, food cost and alerts. */
@Module({
  imports: [KitchenModule],
  controllers: [InsightsController],
  providers: [InsightsService],
})
export class InsightsModule {}
