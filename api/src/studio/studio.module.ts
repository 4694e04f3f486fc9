import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { StudioSettings } from './entities/studio-settings.entity.js';
import { StudioController } from './studio.controller.js';

@Module({
  imports: [TypeOrmModule.forFeature([StudioSettings])],
  controllers: [StudioController],
})
export class StudioModule {}
