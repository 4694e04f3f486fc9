import { Module } from '@nestjs/common';
import { KitchenCatalogueService } from '../kitchen/catalogue/kitchen-catalogue.service.js';
import { AllergyNotesCountsController } from './allergy-notes-counts.controller.js';
import { AllergyNotesController } from './allergy-notes.controller.js';
import { AllergyNotesService } from './allergy-notes.service.js';

/** Allergy notes, substitutions, the staff briefing and the guest-data access log. */
@Module({
  controllers: [AllergyNotesController, AllergyNotesCountsController],
  // The catalogue service only reads rows (no cache), so its own instance here is safe.
  providers: [AllergyNotesService, KitchenCatalogueService],
  exports: [AllergyNotesService],
})
export class AllergyNotesModule {}
