import type { AuthUser } from '@nappe/shared';
import type { User } from './entities/user.entity.js';

export function toAuthUser(user: User): AuthUser {
  return { id: user.id, email: user.email, name: user.name, role: user.role };
}

export interface UserListItem extends AuthUser {
  createdAt: string;
}

export function toUserListItem(user: User): UserListItem {
  return { ...toAuthUser(user), createdAt: user.createdAt.toISOString() };
}
