import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Page } from '@shared/views/page';
import type { UserView } from '@shared/views/user';
import { api } from '@/lib/api-client';
import { teamKeys } from './team-keys';

export const usersQueryOptions = () =>
  queryOptions({ queryKey: teamKeys.users(), queryFn: () => api.get<Page<UserView>>('/api/users?pageSize=200') });

export const useUsers = () => useQuery(usersQueryOptions());
