import type { Page } from '@nappe/shared';
import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { IsNull, Repository } from 'typeorm';
import type { ListUsersQuery } from './dto/list-users.query.js';
import { User } from './entities/user.entity.js';
import { toUserListItem, type UserListItem } from './user.mapper.js';

@Injectable()
export class UsersService {
  constructor(@InjectRepository(User) private readonly users: Repository<User>) {}

  async list(query: ListUsersQuery): Promise<Page<UserListItem>> {
    const [rows, total] = await this.users.findAndCount({
      where: { removedAt: IsNull() },
      order: { role: 'ASC', name: 'ASC', id: 'ASC' },
      skip: (query.page - 1) * query.pageSize,
      take: query.pageSize,
    });
    return { items: rows.map(toUserListItem), total, page: query.page, pageSize: query.pageSize };
  }
}
