import { Module } from '@nestjs/common';
import { FilesController } from './files.controller.js';
import { PhotoStorage } from './photo-storage.service.js';

/** Photo storage for desserts and menus, and the public route that serves the stored files. */
@Module({
  controllers: [FilesController],
  providers: [PhotoStorage],
  exports: [PhotoStorage],
})
export class FilesModule {}
