import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MeResponse } from '@shared/schemas/auth';
import { api, ApiError } from '@/lib/api-client';
import { authKeys } from '@/lib/query-keys';

/** The signed-in person and their households; null when signed out. */
export async function getMe(): Promise<MeResponse | null> {
  try {
    return await api.get<MeResponse>('/auth/me');
  } catch (error) {
    if (error instanceof ApiError && error.status === 401) return null;
    throw error;
  }
}

export const meQueryOptions = () => queryOptions({ queryKey: authKeys.me, queryFn: getMe, staleTime: 5 * 60_000 });

export const useMe = () => useQuery(meQueryOptions());
