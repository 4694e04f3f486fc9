import type { AuthUser } from '@nappe/shared';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export interface UserListItem extends AuthUser {
  /** ISO 8601 timestamp. */
  createdAt: string;
}

export interface UserPage {
  items: UserListItem[];
  total: number;
  page: number;
  pageSize: number;
}

export interface UserListParams {
  page: number;
  pageSize: number;
}

export const USERS_PAGE_SIZE = 20;

export const usersKeys = {
  all: ['users'] as const,
  lists: () => [...usersKeys.all, 'list'] as const,
  list: (params: UserListParams) => [...usersKeys.lists(), params] as const,
};

/** `GET /api/users` (chef only): team members and client accounts, newest pages first. */
export function getUsers({ page, pageSize }: UserListParams, signal?: AbortSignal) {
  const query = new URLSearchParams({ page: String(page), pageSize: String(pageSize) });
  return api.get<UserPage>(`/users?${query}`, { signal });
}

export const usersQueryOptions = (params: UserListParams) =>
  queryOptions({
    queryKey: usersKeys.list(params),
    queryFn: ({ signal }) => getUsers(params, signal),
    // Keep the current page on screen while the next one loads.
    placeholderData: keepPreviousData,
  });

export const useUsers = (params: UserListParams) => useQuery(usersQueryOptions(params));
