import { Controller, Get } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { InjectRepository } from '@nestjs/typeorm';
import { Repository } from 'typeorm';
import { Public } from '../auth/decorators/public.decorator.js';
import { StudioSettings } from './entities/studio-settings.entity.js';

export interface StudioCard {
  name: string;
  tagline: string;
  city: string;
  currency: string;
  timeZone: string;
}

@ApiTags('studio')
@Controller('studio')
export class StudioController {
  constructor(
    @InjectRepository(StudioSettings) private readonly settings: Repository<StudioSettings>,
  ) {}

  /** The studio's public card for the storefront. */
  @Public()
  @Get()
  async card(): Promise<StudioCard> {
    const s = await this.settings.findOneByOrFail({ id: 1 });
    return {
      name: s.name,
      tagline: s.tagline,
      city: s.city,
      currency: s.currency,
      timeZone: s.timeZone,
    };
  }
}
