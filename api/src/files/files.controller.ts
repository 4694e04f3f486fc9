import { createReadStream } from 'node:fs';
import { Controller, Get, NotFoundException, Param, Res, StreamableFile } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { Public } from '../auth/decorators/public.decorator.js';
import { PhotoStorage } from './photo-storage.service.js';

@ApiTags('files')
@Controller('files')
export class FilesController {
  constructor(private readonly photos: PhotoStorage) {}

  /**
   * A stored photo. Public (menus and their photos are public); names are server-made and
   * immutable, so they cache for a year. `nosniff` and `default-src 'none'` keep a browser from
   * treating the bytes as anything but an image (QUALITY.md Uploads).
   */
  @Public()
  @Get(':name')
  async serve(
    @Param('name') name: string,
    @Res({ passthrough: true }) res: Response,
  ): Promise<StreamableFile> {
    const file = await this.photos.find(name);
    if (!file) throw new NotFoundException('There is no such file.');
    res.set({
      'X-Content-Type-Options': 'nosniff',
      'Content-Security-Policy': "default-src 'none'; frame-ancestors 'none'; sandbox",
      'Cache-Control': 'public, max-age=31536000, immutable',
      'Cross-Origin-Resource-Policy': 'same-site',
    });
    return new StreamableFile(createReadStream(file.path), {
      type: 'image/webp',
      length: file.size,
    });
  }
}
