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
import { Roles } from '../../auth/decorators/roles.decorator.js';
import { ZodValidationPipe } from '../../common/zod-validation.pipe.js';
import { PhotoUpload } from '../../files/photo-upload.decorator.js';
import { dessertBody, type DessertBody } from '../dto/kitchen-bodies.js';
import { KitchenListQuery } from '../dto/kitchen-queries.js';
import type { DessertResponse } from './dessert.mapper.js';
import {
  DessertsService,
  type DessertAllergenView,
  type DessertSummary,
} from './desserts.service.js';

@ApiTags('kitchen')
@ApiBearerAuth()
@Controller('desserts')
export class DessertsController {
  constructor(private readonly desserts: DessertsService) {}

  @Roles(Role.Chef, Role.Staff)
  @Get()
  list(@Query() query: KitchenListQuery): Promise<Page<DessertResponse>> {
    return this.desserts.list(query);
  }

  @Roles(Role.Chef, Role.Staff)
  @Get(':id')
  get(@Param('id') id: string): Promise<DessertResponse> {
    return this.desserts.get(id);
  }

  @Roles(Role.Chef, Role.Staff)
  @Get(':id/allergens')
  allergens(@Param('id') id: string): Promise<DessertAllergenView> {
    return this.desserts.allergens(id);
  }

  @Roles(Role.Chef)
  @Get(':id/summary')
  summary(@Param('id') id: string): Promise<DessertSummary> {
    return this.desserts.summary(id);
  }

  @Roles(Role.Chef)
  @Post()
  create(@Body(new ZodValidationPipe(dessertBody)) body: DessertBody): Promise<DessertResponse> {
    return this.desserts.create(body);
  }

  @Roles(Role.Chef)
  @Put(':id')
  replace(
    @Param('id') id: string,
    @Body(new ZodValidationPipe(dessertBody)) body: DessertBody,
  ): Promise<DessertResponse> {
    return this.desserts.replace(id, body);
  }

  @Roles(Role.Chef)
  @Delete(':id')
  @HttpCode(HttpStatus.NO_CONTENT)
  remove(@Param('id') id: string): Promise<void> {
    return this.desserts.remove(id);
  }

  @Roles(Role.Chef)
  @Post(':id/photo')
  @PhotoUpload()
  addPhoto(
    @Param('id') id: string,
    @UploadedFile() file: Express.Multer.File | undefined,
  ): Promise<DessertResponse> {
    return this.desserts.addPhoto(id, file);
  }

  @Roles(Role.Chef)
  @Delete(':id/photo/:photoId')
  @HttpCode(HttpStatus.NO_CONTENT)
  removePhoto(@Param('id') id: string, @Param('photoId') photoId: string): Promise<void> {
    return this.desserts.removePhoto(id, photoId);
  }
}
