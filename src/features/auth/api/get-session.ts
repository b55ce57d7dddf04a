import { queryOptions, useQuery } from '@tanstack/react-query';
import type { UserView } from '@shared/views/user';
import { api, ApiError } from '@/lib/api-client';
import { sessionKeys } from './session-keys';

/** The signed-in user, or null when nobody is signed in (the API answers 401). */
export async function getSession(): Promise<UserView | null> {
  try {
    const { user } = await api.get<{ user: UserView }>('/api/session');
    return user;
  } catch (error) {
    if (error instanceof ApiError && error.status === 401) return null;
    throw error;
  }
}

export const sessionQueryOptions = () => queryOptions({ queryKey: sessionKeys.current(), queryFn: getSession, staleTime: 60_000 });

export function useSession() {
  return useQuery(sessionQueryOptions());
}
