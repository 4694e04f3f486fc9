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
  UploadedFile,
} from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { Role, type Page } from '@nappe/shared';
import { Public } from '../../auth/decorators/public.decorator.js';
import { Roles } from '../../auth/decorators/roles.decorator.js';
import { ZodValidationPipe } from '../../common/zod-validation.pipe.js';
import { PhotoUpload } from '../../files/photo-upload.decorator.js';
import { menuBody, type MenuBody } from '../dto/kitchen-bodies.js';
import { KitchenListQuery, MenuCostingQuery } from '../dto/kitchen-queries.js';
import type { MenuResponse } from './menu.mapper.js';
import { MenusService, type MenuCosting } from './menus.service.js';
import type { PublicMenu } from './public-menu.mapper.js';

/**
 * `GET /api/menus` and `GET /api/menus/:id` are public and show active menus only, in their
 * public shape. The kitchen's own view of every menu (inactive ones too) is under
 * `/api/menus/admin`. The `admin` routes are declared before `:id` so Express matches them first.
 */
@ApiTags('menus')
@Controller('menus')
export class MenusController {
  constructor(private readonly menus: MenusService) {}

  @Public()
  @Get()
  listPublic(@Query() query: KitchenListQuery): Promise<Page<PublicMenu>> {
    return this.menus.listPublic(query);
  }

  @ApiBearerAuth()
  @Roles(Role.Chef, Role.Staff)
  @Get('admin')
  list(@Query() query: KitchenListQuery): Promise<Page<MenuResponse>> {
    return this.menus.list(query);
  }

  @ApiBearerAuth()
  @Roles(Role.Chef, Role.Staff)
  @Get('admin/:id')
  get(@Param('id') id: string): Promise<MenuResponse> {
    return this.menus.get(id);
  }

  @Public()
  @Get(':id')
  getPublic(@Param('id') id: string): Promise<PublicMenu> {
    return this.menus.getPublic(id);
  }

  @ApiBearerAuth()
  @Roles(Role.Chef)
  @Get(':id/costing')
  costing(@Param('id') id: string, @Query() query: MenuCostingQuery): Promise<MenuCosting> {
    return this.menus.costing(id, query);
  }

  @ApiBearerAuth()
  @Roles(Role.Chef)
  @Post()
  create(@Body(new ZodValidationPipe(menuBody)) body: MenuBody): Promise<MenuResponse> {
    return this.menus.create(body);
  }

  @ApiBearerAuth()
  @Roles(Role.Chef)
  @Put(':id')
  replace(
    @Param('id') id: string,
    @Body(new ZodValidationPipe(menuBody)) body: MenuBody,
  ): Promise<MenuResponse> {
    return this.menus.replace(id, body);
  }

  @ApiBearerAuth()
  @Roles(Role.Chef)
  @Delete(':id')
  @HttpCode(HttpStatus.NO_CONTENT)
  remove(@Param('id') id: string): Promise<void> {
    return this.menus.remove(id);
  }

  @ApiBearerAuth()
  @Roles(Role.Chef)
  @Post(':id/photo')
  @PhotoUpload()
  addPhoto(
    @Param('id') id: string,
    @UploadedFile() file: Express.Multer.File | undefined,
  ): Promise<MenuResponse> {
    return this.menus.addPhoto(id, file);
  }

  @ApiBearerAuth()
  @Roles(Role.Chef)
  @Delete(':id/photo/:photoId')
  @HttpCode(HttpStatus.NO_CONTENT)
  removePhoto(@Param('id') id: string, @Param('photoId') photoId: string): Promise<void> {
    return this.menus.removePhoto(id, photoId);
  }
}
