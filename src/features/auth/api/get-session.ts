import { queryOptions, useQuery } from '@tanstack/react-query';
import type { UserView } from '@shared/views/user';
import { api } from '@/lib/api-client';
import { sessionKeys } from './session-keys';

/** The signed-in user, or null when nobody is signed in. */
export async function getSession(): Promise<UserView | null> {
  const { user } = await api.get<{ user: UserView | null }>('/api/session');
  return user;
}

export const sessionQueryOptions = () => queryOptions({ queryKey: sessionKeys.current(), queryFn: getSession, staleTime: 60_000 });

export function useSession() {
  return useQuery(sessionQueryOptions());
}
