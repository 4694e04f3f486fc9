import { Controller, Get, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { Role, type Page } from '@nappe/shared';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { ListUsersQuery } from './dto/list-users.query.js';
import type { UserListItem } from './user.mapper.js';
import { UsersService } from './users.service.js';

@ApiTags('users')
@ApiBearerAuth()
@Controller('users')
export class UsersController {
  constructor(private readonly users: UsersService) {}

  @Roles(Role.Chef)
  @Get()
  list(@Query() query: ListUsersQuery): Promise<Page<UserListItem>> {
    return this.users.list(query);
  }
}
