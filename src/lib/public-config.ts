import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from './api-client';
import { publicConfigKeys } from './query-keys';

export interface PublicConfig {
  /** The first APP_ORIGIN, or null when the server was given none. */
  publicOrigin: string | null;
}

export const publicConfigQueryOptions = () =>
  queryOptions({
    queryKey: publicConfigKeys.config,
    queryFn: () => api.get<PublicConfig>('/config'),
    staleTime: Infinity,
  });

export const usePublicConfig = () => useQuery(publicConfigQueryOptions());
